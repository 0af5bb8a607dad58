import { abs, type SectionContext } from "./context";
import { FORMAT } from "./sheet";
import { putActual, putCorrection, putReason } from "./sourceCells";

/** The columns of one period's figures, in the start table or the update table. */
export interface PeriodColumns {
  actual?: number;
  correction?: number;
  reason?: number;
  used?: number;
  written?: number;
  correctionWritten?: number;
}

/** Absolute addresses of one period's figures, for the rows that link to them. */
export interface PeriodRefs {
  actual: string;
  used: string;
  correction?: string;
  reason?: string;
}

/**
 * A period's figures where they are first written: the actual, and on a corrected ledger the
 * correction, its reason and the value used (the engine's applyCorrections rule as a formula:
 * the correction where it is a number, else the actual), then the written copies the check
 * rebuilds from. Returns the cells later rows link to.
 */
export function putPeriodFigures(ctx: SectionContext, row: number, cols: PeriodColumns, t: number): PeriodRefs {
  const { cells } = ctx;
  putActual(ctx, row, cols.actual!, t);
  cells.put(row, cols.written!, "constant", "written", ctx.actuals[t] ?? null, { format: FORMAT.actual });
  const refs: PeriodRefs = { actual: abs(row, cols.actual!), used: abs(row, cols.actual!) };
  if (!ctx.corrections || cols.used === undefined) return refs;
  putCorrection(ctx, row, cols.correction!, t);
  putReason(ctx, row, cols.reason!, t);
  const corr = abs(row, cols.correction!).replace(/\$/g, "");
  const actual = refs.actual.replace(/\$/g, "");
  const y = ctx.f.y[t];
  cells.formula(row, cols.used, `=IF(ISNUMBER(${corr}),${corr},${actual})`, Number.isNaN(y) ? "" : y, FORMAT.actual, "result");
  cells.put(row, cols.correctionWritten!, "constant", "written", ctx.corrections.values[t] ?? null, { format: FORMAT.actual });
  return { ...refs, used: abs(row, cols.used), correction: abs(row, cols.correction!), reason: abs(row, cols.reason!) };
}

/** A period's figures on a row that repeats a start-table period: formulas linking to it. */
export function linkPeriodFigures(ctx: SectionContext, row: number, cols: PeriodColumns, t: number, from: PeriodRefs): void {
  const { cells } = ctx;
  const y = ctx.actuals[t];
  const link = (src: string) => `=IF(ISNUMBER(${src}),${src},"")`;
  cells.formula(row, cols.actual!, link(from.actual), y ?? "", FORMAT.actual, "linked");
  if (!ctx.corrections || cols.used === undefined) return;
  const c = ctx.corrections.values[t];
  cells.formula(row, cols.correction!, link(from.correction!), c ?? "", FORMAT.actual, "linked");
  cells.formula(row, cols.reason!, `=T(${from.reason})`, ctx.corrections.reasons[t] ?? "", FORMAT.actual, "linked");
  const used = ctx.f.y[t];
  cells.formula(row, cols.used, link(from.used), Number.isNaN(used) ? "" : used, FORMAT.actual, "linked");
}
