import { COVERAGE_FORMS, EbbError, parseCoverage } from "../../engine";
import { cellAddress } from "../describe/addresses";
import { describeLedger } from "../describe/describeLedger";
import type { LedgerAnchor, LedgerCell, LedgerDescription, SettingKey } from "../describe/types";
import { normaliseFormula, valuesMatch } from "./compare";
import { readLedger } from "./readLedger";
import type { LedgerReader, ReadCell } from "./reader";
import { downstreamOf, key, nameSpans } from "./references";

export type ProblemKind =
  | "formula-replaced"
  | "formula-changed"
  | "actual-changed"
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

export interface VerifyReport {
  ok: boolean;
  sheet: string;
  problems: VerifyProblem[];
  /** Cells checked. */
  checked: number;
  /** Formula cells whose value differs only because a cell they read is reported above. */
  downstream: string[];
  /** The description rebuilt from the settings and the written history (for the panel). */
  expected?: LedgerDescription;
}

const CONSTANTS: SettingKey[] = ["alpha", "beta", "gamma", "phi"];

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
      return { ok: false, sheet: anchor.sheet, problems: [problemAt(anchor.cell, "setting-invalid", null, null, e.message)], checked: 0, downstream: [] };
    }
    throw e;
  }
  const { input, inUse, written, settingCells } = ledger;
  // Settings the user may change: must be numbers in range, else recompute with the written value.
  for (const k of [...CONSTANTS, "coverage" as const]) {
    const v = inUse[k];
    const ok = typeof v === "number" && (k === "coverage" ? coverageFraction(v) !== undefined : v >= 0 && v <= 1);
    if (ok && k === "coverage") input.coverage = coverageFraction(v as number)!;
    if (!ok) {
      const at = settingCells[k];
      problems.push(
        problem(at.row, at.col, "setting-invalid", written[k], v, k === "coverage" ? `Coverage must be ${COVERAGE_FORMS}.` : `${k} must be a number from 0 to 1.`),
      );
      if (k === "coverage") input.coverage = written.coverage as number;
      else input.settings[k as "alpha" | "beta" | "gamma" | "phi"] = written[k] as number;
    }
  }
  let expected: LedgerDescription;
  try {
    expected = describeLedger(input);
  } catch (e) {
    if (e instanceof EbbError) {
      problems.push(problemAt(anchor.cell, "setting-invalid", null, null, `The ledger cannot be recomputed: ${e.message}`));
      return { ok: false, sheet: anchor.sheet, problems, checked: 0, downstream: [] };
    }
    throw e;
  }
  const scale = dataScale(expected.history);
  const reported = new Set(problems.map((p) => key(p.row, p.col)));
  const names = nameSpans(expected.names);
  const differing: { cell: LedgerCell; found: ReadCell }[] = [];
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
        if (found.formula === undefined) add("formula-replaced", cell.formula!, `The formula was replaced by a constant; it should be ${cell.formula} (value ${show(cell.value)}).`);
        else if (normaliseFormula(found.formula) !== normaliseFormula(cell.formula!)) add("formula-changed", cell.formula!, `The formula was changed; Ebb wrote ${cell.formula}.`);
        else if (!valuesMatch(found.value, cell.value, scale)) differing.push({ cell, found });
        break;
      case "actual":
        if (found.formula !== undefined || !valuesMatch(found.value, cell.value, scale)) {
          add("actual-changed", cell.value, `This actual differs from the one the ledger was written from (${show(cell.value)}). Correct it, or write a new ledger from the corrected history.`);
        }
        break;
      case "setting":
        break;
      case "fixed-setting":
        if (!valuesMatch(found.value, cell.value, scale)) add("setting-changed", cell.value, `The ledger's layout was built for ${show(cell.value)}; to change this setting, write a new ledger.`);
        break;
      case "engine":
        if (found.formula !== undefined || !valuesMatch(found.value, cell.value, scale)) {
          add("value-differs", cell.value, `The engine now gives ${show(cell.value)} here (its seeded simulation at the settings in use). Fit or refresh the ledger to update it.`);
        }
        break;
      default:
        if (found.formula !== undefined || !valuesMatch(found.value, cell.value, scale)) add("text-changed", cell.value, `Ebb wrote ${show(cell.value)} here.`);
    }
  }
  // A differing formula is reported only when nothing upstream of it is already reported.
  const tainted = downstreamOf(expected.cells, names, reported);
  const downstream: string[] = [];
  for (const { cell, found } of differing) {
    if (tainted.has(key(cell.row, cell.col))) downstream.push(cell.address);
    else problems.push(problem(cell.row, cell.col, "value-differs", cell.value, found.value, `The value differs from the engine's ${show(cell.value)} although the cells it reads are right. Recalculate the workbook, or write the ledger again.`));
  }
  // Anything typed below the update table, where the table's names reach.
  const u = expected.layout.updates;
  const lastRow = u.rows[u.rows.length - 1].row;
  for (let r = lastRow + 1; r <= Math.min(u.lastReachRow, lastRow + 200); r++) {
    for (const c of Object.values(u.columns)) {
      const found = read(r, c!);
      if (found.formula !== undefined || (found.value !== null && found.value !== "")) {
        problems.push(problem(r, c!, "unexpected-content", null, found.formula ?? found.value, "This cell lies inside the update table's reach and is read by the outlook and scorecard. Clear it, or add periods with Extend."));
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
  problems.sort((a, b) => a.row - b.row || a.col - b.col);
  return { ok: problems.length === 0, sheet: anchor.sheet, problems, checked, downstream, expected };
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

/** Typical size of the data: the floor of the numeric tolerance scales with it. */
function dataScale(history: (number | null)[]): number {
  let s = 0;
  let c = 0;
  for (const v of history) if (v !== null) { s += Math.abs(v); c++; }
  return c > 0 ? s / c : 1;
}

/** The coverage cell as a fraction (typed as 95 or 0.95), or undefined when it is neither. */
function coverageFraction(v: number): number | undefined {
  try {
    return parseCoverage(v);
  } catch {
    return undefined;
  }
}
