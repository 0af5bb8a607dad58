import { cellAddress, rangeAddress, sheetReference } from "./addresses";
import { abs, nm, type SectionContext } from "./context";
import { FLAG_NOTE, SECTION, START_ROW_NOTE, UPDATE_COLUMNS } from "./labels";
import { startRowCount } from "./layout";
import { FORMAT } from "./sheet";
import { linkPeriodFigures, putPeriodFigures } from "./periodCells";
import type { ConditionalFlag, UpdateColumnKey } from "./types";
import { TRACKING_LIMIT, trackingCells } from "./trackingColumns";
import { RELATIVE_TOLERANCE } from "./tolerance";

/** Defined names over the update table's columns, reaching below the last row. */
export const COLUMN_NAMES: Partial<Record<UpdateColumnKey, string>> = {
  period: "periods",
  actual: "actuals",
  forecast: "forecasts",
  error: "errors",
  absError: "abserrors",
  pctError: "pcterrors",
  level: "levels",
  trend: "trends",
  index: "indices",
  tracking: "tracking",
};

/**
 * Section 3: one row per period. First come the start rows (the last season of the start
 * window, holding the start level, trend and indices), then one update row per period after
 * the window. Each update refers to the row above and to the index one season back.
 */
export function updatesSection(ctx: SectionContext): { rows: { period: number; row: number; start: boolean }[]; flags: ConditionalFlag[] } {
  const { g, cells, f } = ctx;
  const u = g.updates;
  const cols = u.cols;
  const p = f.p;
  const n = f.y.length;
  const fu = f.firstUpdate;
  const mult = f.mult;
  const hasTrend = f.model.spec.trend !== "none";
  const rowOf = (t: number) => u.firstUpdate + (t - fu);

  cells.text(u.heading, g.c0, SECTION.updates, "heading");
  const pick = (c: { noteMult?: string; noteAdd?: string; noteNone?: string; note?: string }) =>
    (f.seasonal ? (mult ? c.noteMult : c.noteAdd) : c.noteNone) ?? c.note ?? "";
  const headerNotes: Record<UpdateColumnKey, [string, string]> = {
    period: [UPDATE_COLUMNS.period.label, UPDATE_COLUMNS.period.note],
    position: [UPDATE_COLUMNS.position.label, UPDATE_COLUMNS.position.note],
    actual: [UPDATE_COLUMNS.actual.label, UPDATE_COLUMNS.actual.note],
    forecast: [UPDATE_COLUMNS.forecast.label, pick(UPDATE_COLUMNS.forecast)],
    error: [UPDATE_COLUMNS.error.label, UPDATE_COLUMNS.error.note],
    absError: [UPDATE_COLUMNS.absError.label, UPDATE_COLUMNS.absError.note],
    pctError: [UPDATE_COLUMNS.pctError.label, UPDATE_COLUMNS.pctError.note],
    level: [UPDATE_COLUMNS.level.label, pick(UPDATE_COLUMNS.level)],
    trend: [UPDATE_COLUMNS.trend.label, hasTrend ? UPDATE_COLUMNS.trend.note : UPDATE_COLUMNS.trend.noteNone],
    index: [UPDATE_COLUMNS.index.label, mult ? UPDATE_COLUMNS.index.noteMult : UPDATE_COLUMNS.index.noteAdd],
    errorSum: [UPDATE_COLUMNS.errorSum.label, UPDATE_COLUMNS.errorSum.note],
    mad: [UPDATE_COLUMNS.mad.label, UPDATE_COLUMNS.mad.note],
    tracking: [UPDATE_COLUMNS.tracking.label, UPDATE_COLUMNS.tracking.note],
    correction: [UPDATE_COLUMNS.correction.label, UPDATE_COLUMNS.correction.note],
    reason: [UPDATE_COLUMNS.reason.label, UPDATE_COLUMNS.reason.note],
    used: [UPDATE_COLUMNS.used.label, UPDATE_COLUMNS.used.note],
    correctionWritten: [UPDATE_COLUMNS.correctionWritten.label, UPDATE_COLUMNS.correctionWritten.note],
    written: [UPDATE_COLUMNS.written.label, UPDATE_COLUMNS.written.note],
  };
  for (const key of Object.keys(cols) as UpdateColumnKey[]) {
    const [label, note] = headerNotes[key];
    cells.text(u.header, cols[key]!, label, "header", note);
  }

  const rows: { period: number; row: number; start: boolean }[] = [];
  // Start rows: the periods just before the first update.
  const state = f.model.start.state;
  const startRows = startRowCount(f.model.shape);
  for (let i = 0; i < startRows; i++) {
    const t = fu - startRows + i;
    const r = rowOf(t);
    rows.push({ period: t + 1, row: r, start: true });
    cells.put(r, cols.period!, "constant", "start", t + 1, { format: FORMAT.period, ...(i === 0 ? { note: START_ROW_NOTE } : {}) });
    if (cols.position !== undefined) cells.put(r, cols.position, "constant", "start", (t % p) + 1, { format: FORMAT.period });
    linkPeriodFigures(ctx, r, cols, t, ctx.refs.startPeriods[t]);
    if (i === startRows - 1) {
      cells.formula(r, cols.level!, `=${ctx.refs.startLevel}`, state.level, FORMAT.units, "linked");
      if (hasTrend) cells.formula(r, cols.trend!, `=${ctx.refs.startTrend}`, state.trend, FORMAT.trend, "linked");
      else cells.put(r, cols.trend!, "constant", "start", 0, { format: FORMAT.trend });
    }
    if (cols.index !== undefined) cells.formula(r, cols.index, `=${ctx.refs.startIndex[t % p]}`, state.indices[i], mult ? FORMAT.ratio : FORMAT.units, "linked");
  }

  for (let t = fu; t < n; t++) appendUpdateRow(ctx, t, rows);

  // Names over the columns, reaching below the table so added rows are included.
  for (const key of Object.keys(COLUMN_NAMES) as UpdateColumnKey[]) {
    if (cols[key] === undefined) continue;
    const ref = `${abs(u.first, cols[key]!)}:${abs(u.reachLast, cols[key]!)}`;
    ctx.names.push({ name: nm(ctx, COLUMN_NAMES[key]!), refersTo: sheetReference(ctx.sheet, ref), comment: `Ebb ledger column: ${headerNotes[key][0]}` });
  }
  const flags: ConditionalFlag[] = [
    { range: rangeAddress(u.firstUpdate, cols.tracking!, u.reachLast, cols.tracking!), outside: { low: -TRACKING_LIMIT, high: TRACKING_LIMIT }, note: FLAG_NOTE },
  ];
  return { rows, flags };
}

/** One update row for period t (0-based), with its formulas and the engine's values. */
export function appendUpdateRow(ctx: SectionContext, t: number, rows: { period: number; row: number; start: boolean }[]): void {
  const { g, cells, f } = ctx;
  const u = g.updates;
  const cols = u.cols;
  const p = f.p;
  const fu = f.firstUpdate;
  const mult = f.mult;
  const hasTrend = f.model.spec.trend !== "none";
  const [alpha, beta, gamma, phi] = ["alpha", "beta", "gamma", "phi"].map((k) => nm(ctx, k));
  const r = u.firstUpdate + (t - fu);
  const c = (key: UpdateColumnKey, row = r) => cellAddress(row, cols[key]!);
  const first = (key: UpdateColumnKey) => cellAddress(u.firstUpdate, cols[key]!, true, false);
  const st = f.states;
  const y = f.y[t];
  const present = !Number.isNaN(y);
  rows.push({ period: t + 1, row: r, start: false });

  cells.put(r, cols.period!, "constant", "label", t + 1, { format: FORMAT.period });
  if (cols.position !== undefined) cells.put(r, cols.position, "constant", "label", (t % p) + 1, { format: FORMAT.period });
  if (t < f.window) linkPeriodFigures(ctx, r, cols, t, ctx.refs.startPeriods[t]);
  else putPeriodFigures(ctx, r, cols, t);
  // Every update reads the value used (the correction where there is one) on a corrected ledger.
  const A = c(cols.used !== undefined ? "used" : "actual");
  const Lp = c("level", r - 1);
  const Tp = c("trend", r - 1);
  const S = cols.index !== undefined ? c("index", r - p) : "";
  const carried = `${Lp}+${phi}*${Tp}`;
  const fcFormula = !f.seasonal ? `=${carried}` : mult ? `=(${carried})*${S}` : `=${carried}+${S}`;
  cells.formula(r, cols.forecast!, fcFormula, st.forecast[t], FORMAT.units);
  const F = c("forecast");
  const e = st.error[t];
  cells.formula(r, cols.error!, `=IF(ISNUMBER(${A}),${A}-${F},"")`, present ? e : "", FORMAT.units);
  const E = c("error");
  cells.formula(r, cols.absError!, `=IF(ISNUMBER(${E}),ABS(${E}),"")`, present ? Math.abs(e) : "", FORMAT.units);
  const pct = !present ? "" : y !== 0 ? 100 * Math.abs(e / y) : "actual is 0";
  const pctCell = cells.formula(r, cols.pctError!, `=IF(ISNUMBER(${E}),IF(${A}<>0,100*ABS(${E}/${A}),"actual is 0"),"")`, pct, FORMAT.percent);
  // The error carries rounding of the data's size; divided by the actual, so does the percent.
  if (present && y !== 0) pctCell.tolerance = (100 * RELATIVE_TOLERANCE * f.scale) / Math.abs(y);

  const L = c("level");
  const levelUpdate = !f.seasonal
    ? `${alpha}*${A}+(1-${alpha})*(${carried})`
    : mult
      ? `${alpha}*(${A}/${S})+(1-${alpha})*(${carried})`
      : `${alpha}*(${A}-${S})+(1-${alpha})*(${carried})`;
  cells.formula(r, cols.level!, `=IF(ISNUMBER(${A}),${levelUpdate},${carried})`, st.level[t], FORMAT.units);
  if (hasTrend) {
    cells.formula(r, cols.trend!, `=IF(ISNUMBER(${A}),${beta}*(${L}-${Lp})+(1-${beta})*${phi}*${Tp},${phi}*${Tp})`, st.trend[t], FORMAT.trend);
  } else {
    cells.put(r, cols.trend!, "constant", "label", 0, { format: FORMAT.trend });
  }
  if (cols.index !== undefined) {
    const indexUpdate = mult ? `${gamma}*(${A}/${L})+(1-${gamma})*${S}` : `${gamma}*(${A}-${L})+(1-${gamma})*${S}`;
    cells.formula(r, cols.index, `=IF(ISNUMBER(${A}),${indexUpdate},${S})`, st.index[t], mult ? FORMAT.ratio : FORMAT.units);
  }
  trackingCells(ctx, r, t);
}
