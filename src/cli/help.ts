/** Help text shown after each command's option list: what it writes, and an example. */

const RUN = "npm run --silent ebb --";

const INPUT = `
Input: a CSV file (or - for standard input), one series per column, the first row the series
names, one row per period, oldest first. Blank cells are missing values; trailing blanks are
ignored. A first column of labels (such as 2019-01) is recognised and skipped.`;

const MODEL_FIELDS = `name, period, seasonality, trend, start, alpha, beta, gamma, phi, sse, rmse, aicc`;

const MODEL_NOTES = `beta and phi are null without a trend, gamma without seasonality. A series that fails carries
"error" (the reason) instead, the others still run, and a warning names it on standard error.`;

export const PROGRAM_HELP = `
Commands read one CSV file of series and write JSON (default) or CSV to standard output or --out.
Examples:
  ${RUN} fit sales.csv --period 12
  ${RUN} ahead sales.csv --horizon 6 --coverage 0.9 --format csv
  ${RUN} demo
Run "${RUN} <command> --help" for a command's options, output and an example.
`;

export const FIT_HELP = `${INPUT}

Output, --format json: {"series": [{...}, ...]}, one entry per column, with
  ${MODEL_FIELDS}
${MODEL_NOTES}
Output, --format csv: one row per series with columns
  series, period, seasonality, trend, start, alpha, beta, gamma, phi, sse, rmse, aicc, message
  (message holds the reason when the series failed; the other cells are then empty).

Example:
  ${RUN} fit sales.csv --period 12 --seasonality auto --trend auto
`;

export const STATES_HELP = `${INPUT}

Output, --format json: {"series": [{...}, ...]}, one entry per column, with
  ${MODEL_FIELDS},
  states: [{t, actual, level, trend, index, forecast, error}, ...]
one state row per period, t = 1 at the first data row. level, trend and index are the values after that period's update; forecast
is the one-step forecast made for the period before its update; error = actual - forecast.
Values that do not exist (the start window, blank cells) are null.
${MODEL_NOTES}
Output, --format csv: one row per series and period with columns
  series, t, actual, level, trend, index, forecast, error, message

Example (constants fixed, so nothing is fitted):
  ${RUN} states sales.csv --period 12 --start classic --alpha 0.3 --beta 0.1 --gamma 0.2
`;

export const AHEAD_HELP = `${INPUT}

Output, --format json: {"series": [{...}, ...]}, one entry per column, with
  ${MODEL_FIELDS},
  ahead: [{h, forecast, low, high}, ...]
for h = 1..horizon; low and high only with --coverage.
${MODEL_NOTES}
Output, --format csv: one row per series and step ahead with columns
  series, h, forecast, low, high, message

Example:
  ${RUN} ahead sales.csv --horizon 12 --coverage 0.95
`;

export const BACKTEST_HELP = `${INPUT}

Each series is fitted on all but its last --holdout values, which are then forecast and scored.
Output, --format json: {"series": [{...}, ...], "overall": {...}}, one series entry per column, with
  ${MODEL_FIELDS},
  backtest: {holdout, forecast, actual, mad, mape, smape, mase, rmse, bias, coverage}
The model fields describe the model fitted without the held-out values. forecast and actual are
arrays over the held-out periods; mape and smape are in percent; coverage is the share of
held-out actuals inside the --coverage interval (null without --coverage).
"overall": {series, failed, mape, smape, mase, coverage}: the number of series scored and failed,
and the mean of each scale-free measure over the series where it is defined.
${MODEL_NOTES}
Output, --format csv: one row per series and held-out period with columns
  series, h, actual, forecast, mad, mape, smape, mase, rmse, bias, coverage, message
  (the scores repeat on every row of their series).

Example:
  ${RUN} backtest sales.csv --period 12 --holdout 12 --coverage 0.9
`;

export const BUFFER_HELP = `${INPUT}

Safety stock from the model's own error growth. Per series: the demand forecast over the lead
time plus the review period, the standard deviation of its error (every h-step variance and
covariance over those periods, as the prediction intervals compute them), the safety stock
z x sd for the cycle service level, and the reorder point (demand + safety stock; with a
review period, the order-up-to level). shortcut_sd, the one-step sd x sqrt(periods), is shown
for comparison only; it understates the spread whenever the model learns from new errors.
Output, --format json: {"series": [{...}, ...], "caution": "..."}, one entry per column, with
  ${MODEL_FIELDS},
  buffer: {lead_time, review_period, service_level, periods, demand, sd, shortcut_sd, method,
           z, safety_stock, reorder_point}
method is "analytic" (additive or no seasonality) or "simulated" (multiplicative, seeded).
${MODEL_NOTES}
Output, --format csv: one row per series with columns
  series, lead_time, review_period, service_level, demand, sd, shortcut_sd, safety_stock,
  reorder_point, method, message
The caution below is also written to standard error on every run: stock levels must be
reviewed against supplier terms, shelf life and your organisation's own policy.

Example:
  ${RUN} buffer sales.csv --period 12 --seasonality auto --trend auto --lead-time 3 --service-level 0.95
`;

export const WATCH_HELP = `${INPUT}

Which forecasts to look at this period: the review list of EBB.WATCH. Per series, the first
status that applies:
  too short                  the model cannot be fitted, or fewer than 6 one-step errors precede
                             the signal's 6-period window
  forecast too low / high    the windowed tracking signal is above +2.2 / below -2.2
  worse than seasonal naive  refitted before each of its last seasons (up to 3), the model's
                             forecasts of them miss by more than 1.1 x the seasonal naive
                             forecast's from the same origins (same month a season back)
  ok                         none of these
Output, --format json: {"series": [{...}, ...], "statuses": {status: count, ...}}, one entry per
column, with name and
  watch: {status, tracking_signal, bias_percent, mase, naive_ratio, outside_band}
tracking_signal: the sum of the last 6 one-step errors over sqrt(pi/2) x the MAD of the errors
before them x sqrt(6) (a backward CUSUM; about 3% false alarms on an unbiased forecast).
bias_percent: mean error of the last 6 periods as a percent of their mean actual. mase: the
last season's forecasts from the history before it. naive_ratio: the same for up to the last 3
seasons, over the seasonal naive forecast's. outside_band: how many of
the last 6 actuals fell outside the one-step 95% band. Undefined values are null.
${MODEL_NOTES}
Output, --format csv: one row per series with columns
  series, status, tracking_signal, bias_percent, mase, naive_ratio, outside_band, message

Example:
  ${RUN} watch sales.csv --period 12 --seasonality auto --trend auto --format csv
`;

export const LEDGER_HELP = `${INPUT}

Writes an .xlsx workbook (--out, required) with the data and one update ledger per series:
plain formulas that recompute every step without the add-in. Constants left out are fitted;
--coverage defaults to 0.95 for the outlook's interval.

Example:
  ${RUN} ledger sales.csv --period 12 --horizon 12 --out ledger.xlsx
`;

export const DEMO_HELP = `
Forecasts the invented Larkmere Garden Supply demo data (src/preview/demo/larkmere-demo.csv)
with prediction intervals and prints a table per product. Defaults: --seasonality auto,
--trend auto, --horizon 12, --coverage 0.95.

Example:
  ${RUN} demo --horizon 6 --coverage 0.8
`;
