import { checkConstant, COVERAGE_FORMS, EbbError, parseCoverage } from "../../engine";
import { cellAddress } from "../describe/addresses";
import { describeLedger } from "../describe/describeLedger";
import { CONSTANT_SETTINGS } from "../describe/layout";
import type { LedgerAnchor, LedgerCell, LedgerDescription } from "../describe/types";
import { normaliseFormula, sameComputed, sameConstant } from "./compare";
import { LEDGER_WORDS, readLedger } from "./readLedger";
import type { LedgerReader, ReadCell } from "./reader";
import { downstreamOf, key, nameSpans } from "./references";
import { ACTIONS } from "../actions";

export type ProblemKind =
  | "formula-replaced"
  | "formula-changed"
  | "actual-changed"
  | "source-changed"
  | "value-differs"
  | "setting-invalid"
  | "setting-changed"
  | "text-changed"
  | "unexpected-content";

export interface VerifyProblem {
  address: string;
  row: number;
  col: number;
  kind: ProblemKind;
  /** What the ledger should hold there: a formula, or the engine's value. */
  expected: string | number | null;
  found: string | number | null;
  message: string;
}

/** Values no formula can redo that differ from the engine now: listed in one line after the problems. */
export interface VerifyNotice {
  kind: "simulated-interval";
  addresses: string[];
  message: string;
}

export interface VerifyReport {
  /** True when nothing was changed (notices aside). */
  ok: boolean;
  sheet: string;
  /** Tampering and differences, each at its cell, in sheet order. */
  problems: VerifyProblem[];
  notices: VerifyNotice[];
  /** Cells checked. */
  checked: number;
  /** Formula cells whose value differs only because a cell they read is reported above. */
  downstream: string[];
  /** The description rebuilt from the settings and the written history (for the panel). */
  expected?: LedgerDescription;
}


/**
 * Verify a ledger: rebuild it from the history it was written from (the "Actual when
 * written" column) and the settings in use, recompute with the engine, and list every cell
 * whose formula was replaced by a constant or changed, every actual that differs from the
 * written one, every setting out of range or changed where the layout depends on it, and
 * every formula whose value differs from the engine while the cells it reads are right.
 * Cells that differ only because a cell they read is already listed are not listed again.
 */
export function verifyLedger(read: LedgerReader, anchor: LedgerAnchor): VerifyReport {
  const problems: VerifyProblem[] = [];
  let ledger;
  try {
    ledger = readLedger(read, anchor);
  } catch (e) {
    if (e instanceof EbbError) {
      return { ok: false, sheet: anchor.sheet, problems: [problemAt(anchor.cell, "setting-invalid", null, null, e.message)], notices: [], checked: 0, downstream: [] };
    }
    throw e;
  }
  const { input, inUse, written, settingCells } = ledger;
  // Settings the user may change: numbers the engine accepts, else recompute with the written value.
  for (const k of [...CONSTANT_SETTINGS, "coverage" as const]) {
    const v = inUse[k];
    let complaint: string | undefined;
    try {
      if (typeof v !== "number") throw new EbbError("value", "bad-constant", `${k} must be ${k === "coverage" ? COVERAGE_FORMS : "a number from 0 to 1"}; the cell holds ${show(v)}.`);
      // Coverage typed as 95 or as 0.95 is the same interval (the engine's parseCoverage rule).
      if (k === "coverage") input.coverage = parseCoverage(v);
      else checkConstant(k, v);
    } catch (e) {
      if (!(e instanceof EbbError)) throw e;
      complaint = e.message.replace(/ Leave it blank to fit it\.$/, " Type a value in range; every formula below uses this cell.");
    }
    if (complaint) {
      const at = settingCells[k];
      problems.push(problem(at.row, at.col, "setting-invalid", written[k], v, complaint));
      if (k === "coverage") input.coverage = written.coverage as number;
      else input.settings[k as "alpha" | "beta" | "gamma" | "phi"] = written[k] as number;
    }
  }
  // Option words the layout was built for: one of the words, and the one written.
  for (const k of ["seasonality", "trend", "start"] as const) {
    const v = inUse[k];
    const words: readonly string[] = LEDGER_WORDS[k];
    if (typeof v !== "string" || !words.includes(v.trim())) {
      const at = settingCells[k];
      problems.push(problem(at.row, at.col, "setting-invalid", written[k], v, `${show(v)} is not a ${k} word of a ledger (${words.join(", ")}); the layout was built for ${show(written[k])}. Type that back, or write a new ledger.`));
    }
  }
  let expected: LedgerDescription;
  try {
    expected = describeLedger(input);
  } catch (e) {
    if (e instanceof EbbError) {
      problems.push(problemAt(anchor.cell, "setting-invalid", null, null, `The ledger cannot be recomputed: ${e.message}`));
      return { ok: false, sheet: anchor.sheet, problems, notices: [], checked: 0, downstream: [] };
    }
    throw e;
  }
  const scale = expected.dataScale;
  const reported = new Set(problems.map((p) => key(p.row, p.col)));
  const names = nameSpans(expected.names);
  const differing: { cell: LedgerCell; found: ReadCell }[] = [];
  const simulated: string[] = [];
  const simulatedKeys = new Set<string>();
  // The "When written" column is the record verify rebuilds from; nothing to compare it with.
  const writtenCells = new Set(Object.values(expected.layout.written));
  let checked = 0;
  for (const cell of expected.cells) {
    const found = read(cell.row, cell.col);
    checked++;
    const k = key(cell.row, cell.col);
    if (reported.has(k) || writtenCells.has(cell.address)) continue;
    const add = (kind: ProblemKind, exp: string | number | null, message: string) => {
      problems.push(problem(cell.row, cell.col, kind, exp, found.formula ?? found.value, message));
      reported.add(k);
    };
    switch (cell.kind) {
      case "formula":
        if (found.formula === undefined) add("formula-replaced", cell.formula!, `The formula was replaced by ${show(found.value)}; it should be ${cell.formula} (value ${show(cell.value)}). Type the formula back (the cells above and below hold the same formula, one row apart).`);
        else if (normaliseFormula(found.formula) !== normaliseFormula(cell.formula!)) add("formula-changed", cell.formula!, `The formula was changed; Ebb wrote ${cell.formula}.`);
        else if (!sameComputed(found.value, cell, scale)) differing.push({ cell, found });
        break;
      case "actual":
        if (found.formula !== undefined || !sameConstant(found.value, cell.value)) {
          add("actual-changed", cell.value, `This actual is now ${show(found.formula ?? found.value)}; the ledger was written from ${show(cell.value)}. Type that back, or write a new ledger from the corrected history.`);
        }
        break;
      case "source": {
        // An actual refers to its history cell; on a corrected ledger a correction to its corrections cell.
        const correction = cell.col === expected.layout.updates.columns.correction;
        const what = correction ? "correction" : "actual";
        const home = correction ? "corrections cell" : "history cell";
        if (found.formula === undefined) {
          add("actual-changed", cell.formula!, `This ${what} should refer to its ${home} ${cell.source} (${cell.formula}); it now holds ${show(found.value)}. Write the reference back, or write a new ledger.`);
        } else if (normaliseFormula(found.formula) !== normaliseFormula(cell.formula!)) {
          add("formula-changed", cell.formula!, `This ${what} should refer to its ${home} ${cell.source}; Ebb wrote ${cell.formula}.`);
        } else if (!sameConstant(found.value, cell.value)) {
          // The reference reads only numbers: a blank or text in the source cell reaches the ledger as a missing period.
          const now = typeof found.value === "number"
            ? `now holds ${show(found.value)}; the ledger was written from ${show(cell.value)} and now computes with the new figure`
            : `no longer holds a number (it is blank or text), so the ledger now treats the period as missing; it was written from ${show(cell.value)}`;
          add("source-changed", cell.value, `The ${home} ${cell.source} ${now}. If the change is right, write the ledger again so its record and check follow it; if not, type the figure back there.`);
        }
        break;
      }
      case "reason":
        // The words are the planner's; a reason that refers to the reasons column must keep referring to it.
        if (cell.formula !== undefined && (found.formula === undefined || normaliseFormula(found.formula) !== normaliseFormula(cell.formula))) {
          add("formula-changed", cell.formula, `This reason should refer to its cell ${cell.source} (${cell.formula}); it now holds ${show(found.formula ?? found.value)}. Write the reference back, or type the reason beside the correction.`);
        }
        break;
      case "setting":
        break;
      case "fixed-setting":
        if (!sameConstant(found.value, cell.value)) add("setting-changed", cell.value, `Now ${show(found.value)}; the ledger's layout was built for ${show(cell.value)}. Type that back, or write a new ledger to change this setting.`);
        break;
      case "engine":
        // No formula can redo these; a difference after a setting changed is a notice, not tampering.
        if (found.formula !== undefined) add("formula-changed", cell.value, `Ebb wrote the engine's number ${show(cell.value)} here, not a formula.`);
        else if (typeof found.value !== "number") add("text-changed", cell.value, `Ebb wrote the engine's number ${show(cell.value)} here.`);
        else if (!sameComputed(found.value, cell, scale)) {
          simulated.push(cell.address);
          simulatedKeys.add(k);
        }
        break;
      default:
        if (found.formula !== undefined || !sameConstant(found.value, cell.value)) add("text-changed", cell.value, `Ebb wrote ${show(cell.value)} here.`);
    }
  }
  // Anything typed below the update table, where the table's names reach.
  const u = expected.layout.updates;
  const lastRow = u.rows[u.rows.length - 1].row;
  for (let r = lastRow + 1; r <= u.lastReachRow; r++) {
    for (const c of Object.values(u.columns)) {
      const found = read(r, c!);
      if (found.formula !== undefined || (found.value !== null && found.value !== "")) {
        problems.push(problem(r, c!, "unexpected-content", null, found.formula ?? found.value, `This cell lies inside the update table's reach and is read by the outlook and scorecard. Clear it, or add periods with "${ACTIONS.extend}".`));
        reported.add(key(r, c!));
      }
    }
  }
  // Anything typed into a cell of the ledger's block that Ebb left empty.
  const described = new Set(expected.cells.map((c) => key(c.row, c.col)));
  let top = Infinity, bottom = -Infinity, left = Infinity, right = -Infinity;
  for (const c of expected.cells) {
    top = Math.min(top, c.row);
    bottom = Math.max(bottom, c.row);
    left = Math.min(left, c.col);
    right = Math.max(right, c.col);
  }
  for (let r = top; r <= bottom; r++) {
    for (let c = left; c <= right; c++) {
      if (described.has(key(r, c)) || reported.has(key(r, c))) continue;
      const found = read(r, c);
      if (found.formula !== undefined || (found.value !== null && found.value !== "")) {
        problems.push(problem(r, c, "unexpected-content", null, found.formula ?? found.value, "Ebb left this cell of the ledger empty. Clear it, so that nobody reads it as part of the ledger."));
        reported.add(key(r, c));
      }
    }
  }
  // A differing formula is reported only when nothing upstream of it is already reported.
  const tainted = differing.length > 0 ? downstreamOf(expected.cells, names, new Set([...reported, ...simulatedKeys])) : new Set<string>();
  const downstream: string[] = [];
  for (const { cell, found } of differing) {
    if (tainted.has(key(cell.row, cell.col))) downstream.push(cell.address);
    else problems.push(problem(cell.row, cell.col, "value-differs", cell.value, found.value, `The value ${show(found.value)} differs from the engine's ${show(cell.value)} although the cells it reads are right. Recalculate the workbook, or write the ledger again.`));
  }
  problems.sort((a, b) => a.row - b.row || a.col - b.col);
  const notices: VerifyNotice[] = simulated.length
    ? [
        {
          kind: "simulated-interval",
          addresses: simulated,
          message: `${simulated.length} simulated interval number${simulated.length > 1 ? "s" : ""} (${simulated.slice(0, 3).join(", ")}${simulated.length > 3 ? ", ..." : ""}) no longer match the engine's simulation at the settings in use; no formula can redo them. Press "${ACTIONS.refreshInterval}" to update them.`,
        },
      ]
    : [];
  return { ok: problems.length === 0, sheet: anchor.sheet, problems, notices, checked, downstream, expected };
}

function problem(row: number, col: number, kind: ProblemKind, expected: string | number | null, found: string | number | null, message: string): VerifyProblem {
  return { address: cellAddress(row, col), row, col, kind, expected, found, message };
}

function problemAt(address: string, kind: ProblemKind, expected: string | number | null, found: string | number | null, message: string): VerifyProblem {
  const m = /^\$?([A-Z]+)\$?(\d+)$/i.exec(address);
  let col = 0;
  for (const ch of (m?.[1] ?? "A").toUpperCase()) col = col * 26 + ch.charCodeAt(0) - 64;
  return problem(Number(m?.[2] ?? 1) - 1, col - 1, kind, expected, found, message);
}

function show(v: string | number | null): string {
  if (v === null || v === "") return "blank";
  return typeof v === "number" ? String(Number(v.toPrecision(12))) : `"${v}"`;
}
