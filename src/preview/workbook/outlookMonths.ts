/**
 * Month labels for the demo's outlook rows ("2026-01", "2026-02", ...), as formulas so they roll
 * on when a new actual is typed: the month after the latest actual of any product, counted from
 * the first month label (A2) and the last row holding a number. MATCH of a number larger than
 * any actual over a column finds its last number (a common spreadsheet idiom).
 */
import { columnLetters } from "./addresses";

/** Label of the first outlook month: the month after the last actual. */
export function firstOutlookMonth(productCount: number, lastRow: number): string {
  const lasts = Array.from({ length: productCount }, (_, k) => {
    const c = columnLetters(1 + k);
    return `IFERROR(MATCH(10^300,${c}2:${c}${lastRow}),0)`;
  });
  // k: months from January of the first year to the month after the last actual.
  const k = `VALUE(RIGHT($A$2,2))-1+MAX(${lasts.join(",")})`;
  return `=IFERROR((VALUE(LEFT($A$2,4))+INT((${k})/12))&"-"&TEXT(MOD(${k},12)+1,"00"),"")`;
}

/** Label of the month after the one in `above` (a "YYYY-MM" label cell). */
export function nextMonth(above: string): string {
  return `=IFERROR((VALUE(LEFT(${above},4))+INT(VALUE(RIGHT(${above},2))/12))&"-"&TEXT(MOD(VALUE(RIGHT(${above},2)),12)+1,"00"),"")`;
}
