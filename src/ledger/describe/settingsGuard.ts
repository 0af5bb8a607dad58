/**
 * In-sheet guards of the settings block: the explanation beside each setting is a formula that
 * shows the explanation while the setting is one the ledger can use, and says what is wrong
 * the moment it is not (alpha typed as 1.5, a seasonality word typed over the one the layout
 * was built for). The ranges are the engine's own (CONSTANT_BOUNDS, COVERAGE_RANGES), so the
 * sheet, the check and the functions agree. Plain IF/AND/OR/ISNUMBER/EXACT formulas, which
 * every host and LibreOffice compute.
 */
import { CONSTANT_BOUNDS, COVERAGE_RANGES } from "../../engine";
import { CONSTANT_SETTINGS } from "./layout";
import type { SettingKey, TextFlag } from "./types";

export const GUARD_TEXT = {
  // Short enough to read in the explanation column without widening it.
  constant: `Out of range: type a number from ${CONSTANT_BOUNDS.low} to ${CONSTANT_BOUNDS.high}.`,
  coverage: "Out of range: type a fraction (0.95) or a percent (95).",
  /** Followed by the value when written, then fixedTail. */
  fixedHead: "Changed: the layout is built for ",
  fixedTail: ". Type that back.",
} as const;

/** The phrases every warning begins with: the sheet shades a cell holding one (see guardFlags). */
const WARNING_PHRASES = [GUARD_TEXT.constant.slice(0, GUARD_TEXT.constant.indexOf(":") + 1), GUARD_TEXT.fixedHead.trim()];

export const GUARD_FLAG_NOTE = "This setting cannot be used as typed: the explanation says what to type instead.";

/** Rose shading on the explanation cells while they show a warning, so a warning stands out from the explanations. */
export function guardFlags(explainRange: string): TextFlag[] {
  return WARNING_PHRASES.map((phrase) => ({ range: explainRange, containsText: phrase, note: GUARD_FLAG_NOTE }));
}

/** A text constant inside a formula (quotes doubled). */
function literal(text: string): string {
  return `"${text.replace(/"/g, '""')}"`;
}

/**
 * The guard formula for one setting row, or undefined for rows with nothing to guard.
 * `editable`: the planner may type a new value here (a constant in use, or the coverage);
 * otherwise the row is fixed by the layout and must keep the value when written.
 */
export function settingGuardFormula(key: SettingKey, editable: boolean, inUse: string, written: string, explain: string): string | undefined {
  if (key === "name") return undefined;
  const ok = literal(explain);
  if (editable && CONSTANT_SETTINGS.includes(key)) {
    return `=IF(AND(ISNUMBER(${inUse}),${inUse}>=${CONSTANT_BOUNDS.low},${inUse}<=${CONSTANT_BOUNDS.high}),${ok},${literal(GUARD_TEXT.constant)})`;
  }
  if (editable && key === "coverage") {
    const { fraction: f, percent: p } = COVERAGE_RANGES;
    return `=IF(AND(ISNUMBER(${inUse}),OR(AND(${inUse}>${f.low},${inUse}<${f.high}),AND(${inUse}>${p.low},${inUse}<${p.high}))),${ok},${literal(GUARD_TEXT.coverage)})`;
  }
  // Fixed by the layout: the cell must hold exactly what was written (EXACT compares text and numbers alike).
  return `=IF(EXACT(TRIM(${inUse}),${written}),${ok},${literal(GUARD_TEXT.fixedHead)}&${written}&${literal(GUARD_TEXT.fixedTail)})`;
}
