import { EbbError, notEnough } from "../errors";
import { detectPeriod } from "../period";
import { bias } from "./bias";
import { mad } from "./mad";
import { mape } from "./mape";
import { mase } from "./mase";
import { mse } from "./mse";
import { pairs } from "./pairs";
import { rmse } from "./rmse";
import { smape } from "./smape";
import { theilU } from "./theilU";
import { TRACKING_BASELINE, TRACKING_WINDOW, trackingSignal } from "./tracking";

/**
 * One row of the accuracy table: the measure's name and its value, or the EbbError that says why
 * this one measure is undefined for these data (for example MAPE with an actual of 0), so that
 * the other measures still show.
 */
export type AccuracyRow = [name: string, value: number | EbbError];

/**
 * All accuracy measures of a forecast at once, as [name, value] rows for a two-column table
 * (the EBB.ACCURACY worksheet function), in this order:
 *
 * MAD, MSE, RMSE, MAPE (%), sMAPE (%), Bias, Tracking signal (the final value of the windowed
 * signal, an #N/A row until it is defined), Theil's U2, and MASE when a history is given.
 *
 * Errors that concern the whole table (ranges of different length, an infinite value, no
 * period with both an actual and a forecast) are thrown. A measure that is undefined for these
 * particular data (MAPE or Theil's U2 with an actual of 0, Theil's U2 with unchanging actuals or
 * without two consecutive periods, MASE with a flat or too short history) is reported in its own
 * row as an EbbError, which the worksheet layer shows as that cell's error with its message.
 *
 * @param actual actuals, oldest first (NaN = missing)
 * @param forecast forecasts for the same periods (NaN = missing)
 * @param history optional in-sample history, for MASE's scale
 * @param period season length for MASE's seasonal naive scale; 0 or omitted: detected from the history
 * @returns the rows, never holding NaN or Infinity
 * @throws EbbError #VALUE! for ranges of different length or an infinite value; #N/A when no period has both values
 * @example
 * accuracyTable([10, 12, 8], [11, 10, 8])
 * // [["MAD", 1], ["MSE", 1.667], ["RMSE", 1.291], ["MAPE (%)", 8.889], ["sMAPE (%)", 9.235],
 * //  ["Bias", 0.333], ["Tracking signal", #N/A: too few errors], ["Theil's U2", 0.514]]
 */
export function accuracyTable(
  actual: ArrayLike<number>,
  forecast: ArrayLike<number>,
  history?: ArrayLike<number>,
  period?: number,
): AccuracyRow[] {
  // Whole-table checks first: these throw.
  pairs(actual, forecast, "Accuracy");
  const rows: AccuracyRow[] = [];
  const add = (name: string, compute: () => number): void => {
    try {
      rows.push([name, compute()]);
    } catch (e) {
      if (e instanceof EbbError) rows.push([name, e]);
      else throw e;
    }
  };
  add("MAD", () => mad(actual, forecast));
  add("MSE", () => mse(actual, forecast));
  add("RMSE", () => rmse(actual, forecast));
  add("MAPE (%)", () => mape(actual, forecast));
  add("sMAPE (%)", () => smape(actual, forecast));
  add("Bias", () => bias(actual, forecast));
  add("Tracking signal", () => {
    const ts = trackingSignal(actual, forecast);
    // The final value is that of the last period with both values: ranges that reach below the
    // data (a rolling sheet's) end in blanks, whose windows hold no error.
    const p = pairs(actual, forecast, "Accuracy");
    const last = ts[p.position[p.count - 1]];
    if (last !== last) {
      throw notEnough(TRACKING_BASELINE + TRACKING_WINDOW, p.count, "periods with both an actual and a forecast", "The tracking signal needs 6 errors before its 6-period window.");
    }
    return last;
  });
  add("Theil's U2", () => theilU(actual, forecast));
  if (history !== undefined) {
    add("MASE", () => mase(actual, forecast, history, period === undefined || period === 0 ? detectPeriod(history) : period));
  }
  return rows;
}
