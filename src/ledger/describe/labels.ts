import { TRACKING_BASELINE as BASE, TRACKING_LIMIT as LIM, TRACKING_WINDOW as W } from "../../engine";
import { ACTIONS } from "../actions";

/**
 * Every word the ledger shows: section titles, column labels and the notes that give each
 * column's formula in words. Labels are plain English chosen for Ebb (see docs/ledger).
 */

export const SECTION = {
  settings: "1  Settings",
  start: "2  Start from the first seasons",
  updates: "3  Period-by-period updates",
  outlook: "4  Outlook",
  scorecard: "5  Scorecard",
  chart: "6  Chart",
} as const;

export const SUBTITLE =
  "Every number below is an ordinary spreadsheet formula on the actuals and the settings: change a setting in the yellow cells and the whole ledger recomputes, with or without Ebb.";

export function title(name: string): string {
  return `Ebb ledger: ${name}`;
}

export const SETTINGS_HEADER = {
  label: "Setting",
  inUse: "In use",
  written: "When written",
  explain: "What it does",
};

export const SETTINGS_NOTES = {
  inUse: "The values every formula below uses (named cells). Alpha, beta, gamma, phi and the coverage may be changed here.",
  written: `The values when the ledger was written or last fitted. "${ACTIONS.verify}" rebuilds the layout from this column; no formula uses it.`,
};

export interface SettingRowText {
  label: string;
  explain: string;
}

export const SETTING_ROWS = {
  name: { label: "Series", explain: "The history this ledger follows." },
  alpha: { label: "Alpha (level)", explain: "Weight of the newest actual in the level, 0 to 1." },
  beta: { label: "Beta (trend)", explain: "Weight of the newest change of level in the trend, 0 to 1." },
  gamma: { label: "Gamma (season)", explain: "Weight of the newest actual in its seasonal index, 0 to 1." },
  phi: { label: "Phi (damping)", explain: "Share of the trend carried one period on; 1 means no damping." },
  season: { label: "Season length", explain: "Periods in one season; the layout is built for it." },
  seasonality: { label: "Seasonality", explain: "How the index acts: multiplies or adds to the level." },
  trend: { label: "Trend", explain: "Linear, damped or none; the layout is built for it." },
  start: { label: "Start method", explain: "How the first level, trend and indices come from history." },
  cycles: { label: "Start seasons", explain: "Whole seasons in the start table." },
  horizon: { label: "Outlook periods", explain: "Periods forecast after the last actual." },
  coverage: { label: "Interval coverage", explain: "Share of future actuals the low-high range should hold." },
  tag: { label: "Name prefix", explain: "Start of every defined name this ledger uses." },
} as const;

export const UNUSED = {
  beta: "Not used: this ledger has no trend.",
  gamma: "Not used: this ledger has no seasonality.",
  phi: "Fixed at 1: only a damped-trend ledger uses phi.",
};

/** Update table: label and formula in words. */
export const UPDATE_COLUMNS = {
  period: { label: "Period", note: "Number of the period, counting from 1 at the first value of the history." },
  position: { label: "Position in season", note: "Which period of the season this is, 1 to the season length." },
  actual: {
    label: "Actual",
    note: "The recorded value. A blank means missing: nothing is updated and the state carries forward on its own forecast.",
  },
  forecast: {
    label: "One-step forecast",
    noteMult: "Made one period earlier: (level above + phi x trend above) x seasonal index one season back.",
    noteAdd: "Made one period earlier: level above + phi x trend above + seasonal index one season back.",
    noteNone: "Made one period earlier: level above + phi x trend above.",
  },
  error: { label: "Error", note: "Actual minus one-step forecast; positive means the forecast was too low." },
  absError: { label: "Absolute error", note: "Size of the error, without its sign." },
  pctError: { label: "Error % of actual", note: "100 x absolute error / actual (not defined when the actual is 0)." },
  level: {
    label: "Level",
    noteMult: "alpha x actual / index one season back + (1 - alpha) x (level above + phi x trend above). Missing actual: level above + phi x trend above.",
    noteAdd: "alpha x (actual - index one season back) + (1 - alpha) x (level above + phi x trend above). Missing actual: level above + phi x trend above.",
    noteNone: "alpha x actual + (1 - alpha) x (level above + phi x trend above). Missing actual: level above + phi x trend above.",
  },
  trend: {
    label: "Trend",
    note: "beta x (level - level above) + (1 - beta) x phi x trend above. Missing actual: phi x trend above.",
    noteNone: "This ledger has no trend: 0 throughout.",
  },
  index: {
    label: "Seasonal index",
    noteMult: "gamma x actual / level + (1 - gamma) x index one season back. Missing actual: index one season back.",
    noteAdd: "gamma x (actual - level) + (1 - gamma) x index one season back. Missing actual: index one season back.",
  },
  errorSum: { label: `Sum of errors, last ${W}`, note: `Sum of the errors in this row and the ${W - 1} above it (the signal's window; blanks add nothing).` },
  mad: {
    label: "MAD before them",
    note: `Mean of the absolute errors above the window, from the first update on: the errors' usual size before the latest ${W}. Blank until ${BASE} errors precede the window.`,
  },
  tracking: {
    label: "Tracking signal",
    note: `Sum of errors, last ${W} / (sqrt(pi/2) x MAD before them x sqrt(errors in the window)): about a standard normal figure when the forecasts are unbiased. Beyond -${LIM} or +${LIM} (about 3 rows in 100 by chance) it is flagged: the latest forecasts lean one way.`,
  },
  correction: {
    label: "Correction",
    note: "The planner's figure for this period (a promotion, stock-out or one-off order taken out). Blank: the actual is used. It refers to the corrections column the ledger was written from.",
  },
  reason: { label: "Reason", note: "Why the period was corrected, as typed beside the correction." },
  used: {
    label: "Value used",
    note: "What every update on this row reads: the correction where there is one, else the actual.",
  },
  correctionWritten: {
    label: "Correction when written",
    note: `Copy of the correction as it was when the ledger was written or extended. No formula uses it; "${ACTIONS.verify}" compares the Correction column with it.`,
  },
  written: {
    label: "Actual when written",
    note: `Copy of the actual as it was when the ledger was written or extended. No formula uses it; "${ACTIONS.verify}" compares the Actual column with it.`,
  },
} as const;

export const START_ROW_NOTE =
  "Start rows: the last season of the start window, holding the start level and trend (last row) and the start indices, so that every update row can refer to the row above and to the index one season back.";

/** Start table. */
export const START_COLUMNS = {
  period: { label: "Period", note: "Number of the period, counting from 1 at the first value of the history." },
  position: { label: "Position in season", note: "Which period of the season this is, 1 to the season length." },
  actual: { label: "Actual", note: "The recorded value; a blank means missing." },
  average: {
    label: "Moving average",
    noteEven: "Centred average over one season: half the values at both ends plus the values between, divided by the season length. Blank where it runs past the table or covers a missing actual.",
    noteOdd: "Centred average over one season: the sum of the season around this period divided by the season length. Blank where it runs past the table or covers a missing actual.",
  },
  detrended: {
    labelMult: "Actual / average",
    labelAdd: "Actual - average",
    noteMult: "Actual divided by the moving average: how far this period sits above or below its season's average.",
    noteAdd: "Actual minus the moving average: how far this period sits above or below its season's average.",
  },
  adjusted: {
    label: "Seasonally adjusted",
    noteMult: "Actual / start index of its position.",
    noteAdd: "Actual - start index of its position.",
  },
  lineX: { label: "Period in line", note: "The period number where there is a seasonally adjusted value; the straight line is fitted through these points." },
  lineXNone: { label: "Period in line", note: "The period number where there is an actual; the straight line is fitted through these points." },
  rank: { label: "Average rank", note: "1, 2, 3, ... down the moving averages; the classic start fits its straight line to the moving averages against this rank." },
  correction: UPDATE_COLUMNS.correction,
  reason: UPDATE_COLUMNS.reason,
  used: UPDATE_COLUMNS.used,
  correctionWritten: UPDATE_COLUMNS.correctionWritten,
  written: UPDATE_COLUMNS.written,
} as const;

export const INDEX_TABLE = {
  position: { label: "Position in season", note: "1 to the season length." },
  raw: {
    labelMult: "Mean ratio",
    labelAdd: "Mean difference",
    note: "Average of the start table's actual-to-average column over the periods at this position.",
  },
  normal: {
    label: "Start index",
    noteMult: "Mean ratio / mean of all mean ratios, so the start indices average 1.",
    noteAdd: "Mean difference - mean of all mean differences, so the start indices add up to 0.",
  },
} as const;

export const LINE_ROWS = {
  slope: { label: "Line slope", noteDecomp: "Slope of the least-squares line of the seasonally adjusted values on the period.", noteNone: "Slope of the least-squares line of the actuals on the period.", noteClassic: "Slope of the least-squares line of the moving averages on their rank." },
  intercept: { label: "Line intercept", noteDecomp: "Mean of the values in the line - slope x mean of their periods: the line's value at period 0.", noteClassic: "Mean of the moving averages - slope x mean rank: the line's value at rank 0." },
  level: {
    label: "Start level",
    noteDecomp: "Value of the line at the last period of the start table: intercept + slope x that period.",
    noteFlat: "Mean of the seasonally adjusted values (no trend).",
    noteFlatNone: "Mean of the actuals in the start table (no trend).",
    noteClassic: "The line's value at rank 0 (its intercept), used as the level at the end of the first season.",
    noteClassicNone: "The actual of period 2.",
  },
  trend: {
    label: "Start trend",
    noteLine: "The line's slope: change of level per period.",
    noteNone: "No trend: 0.",
    noteClassicNone: "Actual of period 2 - actual of period 1.",
  },
} as const;

export const OUTLOOK_BASIS = {
  period: { label: "From period", note: "The last period of the update table: the outlook starts after it." },
  level: { label: "Level then", note: "Level in the last row of the update table." },
  trend: { label: "Trend then", note: "Trend in the last row of the update table." },
  rows: { label: "Update rows", note: "Rows in the update table, start rows included: finds the last row, so the outlook follows when rows are added." },
  variance: {
    label: "Error variance",
    note: "Sum of squared errors / (number of errors - quantities estimated), Hyndman & Khandakar (2008); times (1 + quantities estimated / number of errors), as those quantities are estimated from the same history (Akaike's final prediction error, 1970).",
  },
  z: { label: "t for coverage", note: "Student t quantile at 0.5 + coverage / 2, on (number of errors - quantities estimated) degrees of freedom: the variance is estimated. Near the normal z for a long history. #N/A while the coverage cell holds no valid coverage, so the interval ends show #N/A too." },
  quantities: { label: "Quantities estimated", note: "What this model estimates from the history: " },
} as const;

export const OUTLOOK_COLUMNS = {
  period: { label: "Period", note: "From period + steps ahead." },
  steps: { label: "Steps ahead", note: "How many periods after the last actual." },
  position: { label: "Position in season", note: "Which period of the season this is." },
  multiplier: {
    label: "Trend multiplier",
    note: "phi + phi^2 + ... + phi^steps (equal to the steps when phi is 1).",
    noteNoTrend: "phi + phi^2 + ... + phi^steps (equal to the steps, as phi is 1). This model has no trend: the trend it multiplies is 0, so it adds nothing to the forecast.",
  },
  index: { label: "Seasonal index used", note: "The latest seasonal index at this position: from the update table's last season." },
  forecast: {
    label: "Forecast",
    noteMult: "(level then + trend multiplier x trend then) x seasonal index used.",
    noteAdd: "level then + trend multiplier x trend then + seasonal index used.",
    noteNone: "level then + trend multiplier x trend then.",
  },
  weight: {
    label: "Spread weight",
    note: "For step h > 1, with j = h - 1: alpha + alpha x beta x (trend multiplier at step j) + gamma x (1 - alpha) when j is a whole number of seasons. 0 at step 1.",
  },
  sumSquares: { label: "Sum of squared weights", note: "Sum of the squared spread weights down to this step." },
  half: { label: "Half width", note: "t for coverage x square root of (error variance x (1 + sum of squared weights)). Hyndman, Koehler, Ord & Snyder (2008), ch. 6." },
  gapBelow: {
    label: "Gap below",
    note: `Forecast minus the low end of the engine's seeded simulation of 2000 futures (multiplicative seasonality has no exact formula). A number, not a formula: "${ACTIONS.refreshInterval}" and "${ACTIONS.fit}" refresh it; "${ACTIONS.verify}" notes when it is due.`,
  },
  gapAbove: { label: "Gap above", note: `High end of the engine's seeded simulation minus the forecast. A number, not a formula: "${ACTIONS.refreshInterval}" and "${ACTIONS.fit}" refresh it; "${ACTIONS.verify}" notes when it is due.` },
  lowAdd: { label: "Low", note: "Forecast - half width." },
  highAdd: { label: "High", note: "Forecast + half width." },
  lowMult: { label: "Low", note: "Forecast - gap below." },
  highMult: { label: "High", note: "Forecast + gap above." },
} as const;

export const SCORE_ROWS = {
  header: { label: "Measure", value: "Value" },
  mad: { label: "MAD", note: "Mean absolute error over the update rows." },
  rmse: { label: "RMSE", note: "Square root of the mean squared error over the update rows." },
  mape: { label: "MAPE (%)", note: "Mean of the error % of actual column." },
  bias: { label: "Bias (mean error)", note: "Mean of the errors; positive means the forecasts ran low." },
  tracking: { label: "Tracking signal, latest", note: "The tracking signal in the last row of the update table (blank while it is not yet defined)." },
  outside: { label: `Rows flagged (beyond +/-${LIM})`, note: `Number of update rows whose tracking signal is above ${LIM} or below -${LIM} (those cells are shaded). Unbiased forecasts give about 3 in 100 by chance.` },
  count: { label: "Errors counted", note: "Update rows with an actual." },
  corrected: { label: "Periods corrected", note: "Periods whose value used is a correction instead of the actual (start table and update rows)." },
} as const;

export const CHART = {
  title: (name: string) => `${name}: actuals, one-step forecasts and outlook`,
  actual: "Actual",
  forecast: "One-step forecast",
  outlook: "Outlook",
  low: "Low",
  high: "High",
};

export const FLAG_NOTE = `Tracking signal beyond -${LIM} or +${LIM}: the latest ${W} forecasts have leaned one way more than chance would explain.`;
