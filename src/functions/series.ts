/**
 * Many series at once: functions that take a history return one group of output columns per
 * series, so one formula serves a whole product table. A series that fails fills its own
 * columns with its error; the others still compute. A single series fails the whole formula,
 * so the host shows its message in the formula's cell.
 */
import { EbbError } from "../engine";
import { type Block, sideBySide } from "./cells";
import type { SeriesInput } from "./coerce";
import { asEbbError } from "./failures";
import { located } from "./places";

/**
 * @param inputs the series of a range (or the error that stopped one of them)
 * @param width output columns per series
 * @param compute one series' output block (`width` columns), given the series and its place in the range
 */
export function eachSeries(inputs: (SeriesInput | EbbError)[], width: number, compute: (s: SeriesInput, index: number) => Block): Block {
  if (inputs.length === 1) {
    const only = inputs[0];
    if (only instanceof EbbError) throw only;
    try {
      return compute(only, 0);
    } catch (e) {
      throw located(asEbbError(e), 0);
    }
  }
  const results: (Block | EbbError)[] = inputs.map((s, i) => {
    if (s instanceof EbbError) return s;
    try {
      return compute(s, i);
    } catch (e) {
      // An error about one cell names it, in this series' column.
      return located(asEbbError(e), i);
    }
  });
  const height = Math.max(1, ...results.map((r) => (r instanceof EbbError ? 1 : r.length)));
  return sideBySide(
    results.map((r) => (r instanceof EbbError ? Array.from({ length: height }, () => new Array(width).fill(r)) : r)),
  );
}
