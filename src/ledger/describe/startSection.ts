import { cellAddress } from "./addresses";
import { abs, nm, type SectionContext } from "./context";
import { INDEX_TABLE, LINE_ROWS, SECTION, START_COLUMNS } from "./labels";
import { FORMAT } from "./sheet";
import { putPeriodFigures } from "./periodCells";

/**
 * Section 2: the start table (period, position, actual, moving average, ratio or difference,
 * seasonally adjusted value, line x or average rank), the index table (mean ratios and
 * normalised start indices) and the line block (slope, intercept, start level and trend).
 * Every figure is a formula on the actuals above it, so the start recomputes too.
 */
export function startSection(ctx: SectionContext): void {
  const { g, cells, f } = ctx;
  const s = g.start;
  const cols = s.cols;
  const p = f.p;
  const W = f.window;
  const mult = f.mult;
  const classic = f.model.spec.start === "classic";
  const hasTrend = f.model.spec.trend !== "none";
  const detail = f.model.start.detail;
  const season = nm(ctx, "season");
  const row = (t: number) => s.first + t;
  const at = (t: number, key: keyof typeof cols) => cellAddress(row(t), cols[key]!);
  // What the start reads: the value used on a corrected ledger, else the actual.
  const Y: keyof typeof cols = cols.used !== undefined ? "used" : "actual";

  cells.text(s.heading, g.c0, SECTION.start, "heading");
  // Column headers.
  const header = (key: keyof typeof cols, label: string, note: string) => cells.text(s.header, cols[key]!, label, "header", note);
  header("period", START_COLUMNS.period.label, START_COLUMNS.period.note);
  if (cols.position !== undefined) header("position", START_COLUMNS.position.label, START_COLUMNS.position.note);
  header("actual", START_COLUMNS.actual.label, START_COLUMNS.actual.note);
  for (const k of ["correction", "reason", "used"] as const) if (cols[k] !== undefined) header(k, START_COLUMNS[k].label, START_COLUMNS[k].note);
  if (cols.average !== undefined) header("average", START_COLUMNS.average.label, p % 2 === 0 ? START_COLUMNS.average.noteEven : START_COLUMNS.average.noteOdd);
  if (cols.detrended !== undefined) {
    header("detrended", mult ? START_COLUMNS.detrended.labelMult : START_COLUMNS.detrended.labelAdd, mult ? START_COLUMNS.detrended.noteMult : START_COLUMNS.detrended.noteAdd);
  }
  if (cols.adjusted !== undefined) header("adjusted", START_COLUMNS.adjusted.label, mult ? START_COLUMNS.adjusted.noteMult : START_COLUMNS.adjusted.noteAdd);
  if (cols.lineX !== undefined) header("lineX", START_COLUMNS.lineX.label, f.seasonal ? START_COLUMNS.lineX.note : START_COLUMNS.lineXNone.note);
  if (cols.rank !== undefined) header("rank", START_COLUMNS.rank.label, START_COLUMNS.rank.note);
  header("written", START_COLUMNS.written.label, START_COLUMNS.written.note);
  if (cols.correctionWritten !== undefined) header("correctionWritten", START_COLUMNS.correctionWritten.label, START_COLUMNS.correctionWritten.note);

  // Period, position, actual (correction, reason, value used) and the written copies.
  for (let t = 0; t < W; t++) {
    cells.put(row(t), cols.period!, "constant", "label", t + 1, { format: FORMAT.period });
    if (cols.position !== undefined) cells.put(row(t), cols.position, "constant", "label", (t % p) + 1, { format: FORMAT.period });
    ctx.refs.startPeriods.push(putPeriodFigures(ctx, row(t), cols, t));
  }

  // Moving average and ratio (or difference) where a whole centred season fits in the table.
  const half = Math.floor(p / 2);
  const maRows: number[] = [];
  if (f.seasonal && detail) {
    for (let t = half; t + half <= W - 1; t++) {
      maRows.push(t);
      const first = at(t - half, Y);
      const last = at(t + half, Y);
      const span = `${first}:${last}`;
      let formula: string;
      if (p % 2 === 0) {
        const inner = `${at(t - half + 1, Y)}:${at(t + half - 1, Y)}`;
        formula = `=IF(COUNT(${span})=ROWS(${span}),(0.5*${first}+0.5*${last}+SUM(${inner}))/${season},"")`;
      } else {
        formula = `=IF(COUNT(${span})=ROWS(${span}),SUM(${span})/${season},"")`;
      }
      const ma = detail.movingAverage[t];
      cells.formula(row(t), cols.average!, formula, Number.isNaN(ma) ? "" : ma, FORMAT.units);
      const ratio = detail.detrended[t];
      const op = mult ? "/" : "-";
      cells.formula(row(t), cols.detrended!, `=IF(ISNUMBER(${at(t, "average")}),${at(t, Y)}${op}${at(t, "average")},"")`, Number.isNaN(ratio) ? "" : ratio, mult ? FORMAT.ratio : FORMAT.units);
    }
  }

  // Index table: mean ratio per position, then normalised.
  const side = s.sideCol;
  if (f.seasonal && detail) {
    cells.text(s.indexHeader, side, INDEX_TABLE.position.label, "header", INDEX_TABLE.position.note);
    cells.text(s.indexHeader, side + 1, mult ? INDEX_TABLE.raw.labelMult : INDEX_TABLE.raw.labelAdd, "header", INDEX_TABLE.raw.note);
    cells.text(s.indexHeader, side + 2, INDEX_TABLE.normal.label, "header", mult ? INDEX_TABLE.normal.noteMult : INDEX_TABLE.normal.noteAdd);
    const rawRange = `${abs(s.indexFirst, side + 1)}:${abs(s.indexFirst + p - 1, side + 1)}`;
    for (let j = 0; j < p; j++) {
      const r = s.indexFirst + j;
      cells.put(r, side, "constant", "label", j + 1, { format: FORMAT.period });
      const members = maRows.filter((t) => t % p === j).map((t) => at(t, "detrended"));
      cells.formula(r, side + 1, `=AVERAGE(${members.join(",")})`, detail.rawIndices[j], mult ? FORMAT.ratio : FORMAT.units);
      const rawCell = cellAddress(r, side + 1);
      cells.formula(r, side + 2, mult ? `=${rawCell}/AVERAGE(${rawRange})` : `=${rawCell}-AVERAGE(${rawRange})`, detail.normalIndices[j], mult ? FORMAT.ratio : FORMAT.units, "result");
      ctx.refs.startIndex.push(abs(r, side + 2));
    }
  }

  // Seasonally adjusted values and the line's x (decomposition start).
  const adjusted = f.model.spec.start === "decomposition" && detail?.adjusted ? Array.from(detail.adjusted, (v) => (Number.isNaN(v) ? null : v)) : [];
  if (cols.adjusted !== undefined) {
    for (let t = 0; t < W; t++) {
      const op = mult ? "/" : "-";
      const v = adjusted[t];
      cells.formula(row(t), cols.adjusted, `=IF(ISNUMBER(${at(t, Y)}),${at(t, Y)}${op}${ctx.refs.startIndex[t % p]},"")`, v === null ? "" : v, FORMAT.units);
    }
  }
  const yCol: keyof typeof cols = cols.adjusted !== undefined ? "adjusted" : Y;
  if (cols.lineX !== undefined) {
    for (let t = 0; t < W; t++) {
      const present = !Number.isNaN(f.y[t]);
      cells.formula(row(t), cols.lineX, `=IF(ISNUMBER(${at(t, yCol)}),${at(t, "period")},"")`, present ? t + 1 : "", FORMAT.period);
    }
  }
  if (cols.rank !== undefined) maRows.forEach((t, i) => cells.put(row(t), cols.rank!, "constant", "label", i + 1, { format: FORMAT.period }));

  // Line block: slope, intercept, start level, start trend.
  const lineRow = (i: number) => s.lineFirst + i;
  const valueCol = f.seasonal ? side + 2 : side + 1;
  const state = f.model.start.state;
  const label = (i: number, text: string, note: string) => cells.text(lineRow(i), side, text, "label", note);
  const yRange = (key: keyof typeof cols) => `${abs(row(0), cols[key]!)}:${abs(row(W - 1), cols[key]!)}`;
  let levelFormula: string;
  let levelNote: string;
  let trendFormula: string | null = null;
  let trendNote: string;
  if (classic && f.seasonal) {
    const maRange = `${abs(row(maRows[0]), cols.average!)}:${abs(row(maRows[maRows.length - 1]), cols.average!)}`;
    const rankRange = `${abs(row(maRows[0]), cols.rank!)}:${abs(row(maRows[maRows.length - 1]), cols.rank!)}`;
    label(0, LINE_ROWS.slope.label, LINE_ROWS.slope.noteClassic);
    cells.formula(lineRow(0), valueCol, `=SLOPE(${maRange},${rankRange})`, detail!.slope, FORMAT.trend);
    label(1, LINE_ROWS.intercept.label, LINE_ROWS.intercept.noteClassic);
    const slope = cellAddress(lineRow(0), valueCol);
    cells.formula(lineRow(1), valueCol, `=AVERAGE(${maRange})-${slope}*AVERAGE(${rankRange})`, detail!.intercept, FORMAT.units);
    levelFormula = `=${cellAddress(lineRow(1), valueCol)}`;
    levelNote = LINE_ROWS.level.noteClassic;
    trendFormula = hasTrend ? `=${slope}` : null;
    trendNote = hasTrend ? LINE_ROWS.trend.noteLine : LINE_ROWS.trend.noteNone;
  } else if (classic) {
    levelFormula = `=${cellAddress(row(1), cols[Y]!)}`;
    levelNote = LINE_ROWS.level.noteClassicNone;
    trendFormula = hasTrend ? `=${cellAddress(row(1), cols[Y]!)}-${cellAddress(row(0), cols[Y]!)}` : null;
    trendNote = hasTrend ? LINE_ROWS.trend.noteClassicNone : LINE_ROWS.trend.noteNone;
  } else if (hasTrend) {
    const xs = yRange("lineX");
    const ys = yRange(yCol);
    label(0, LINE_ROWS.slope.label, f.seasonal ? LINE_ROWS.slope.noteDecomp : LINE_ROWS.slope.noteNone);
    cells.formula(lineRow(0), valueCol, `=SLOPE(${ys},${xs})`, detail!.slope, FORMAT.trend);
    label(1, LINE_ROWS.intercept.label, LINE_ROWS.intercept.noteDecomp);
    const slope = cellAddress(lineRow(0), valueCol);
    cells.formula(lineRow(1), valueCol, `=AVERAGE(${ys})-${slope}*AVERAGE(${xs})`, detail!.intercept, FORMAT.units);
    levelFormula = `=${cellAddress(lineRow(1), valueCol)}+${slope}*${W}`;
    levelNote = LINE_ROWS.level.noteDecomp;
    trendFormula = `=${slope}`;
    trendNote = LINE_ROWS.trend.noteLine;
  } else {
    levelFormula = `=AVERAGE(${yRange(yCol)})`;
    levelNote = f.seasonal ? LINE_ROWS.level.noteFlat : LINE_ROWS.level.noteFlatNone;
    trendNote = LINE_ROWS.trend.noteNone;
  }
  label(2, LINE_ROWS.level.label, levelNote);
  cells.formula(lineRow(2), valueCol, levelFormula, state.level, FORMAT.units, "result");
  label(3, LINE_ROWS.trend.label, trendNote);
  if (trendFormula) cells.formula(lineRow(3), valueCol, trendFormula, state.trend, FORMAT.trend, "result");
  else cells.put(lineRow(3), valueCol, "constant", "result", 0, { format: FORMAT.trend });
  ctx.refs.startLevel = abs(lineRow(2), valueCol);
  ctx.refs.startTrend = abs(lineRow(3), valueCol);
}
