import { checkSheetName, parseCell, rangeAddress, sheetReference, absolute } from "./addresses";
import { chartSpec } from "./chartSection";
import type { SectionContext } from "./context";
import { engineFigures, shownCycles } from "./engineFigures";
import { SUBTITLE, title } from "./labels";
import { ledgerFigures, padded } from "./correctedInput";
import { ledgerGeometry, updateRowCount } from "./layout";
import { checkTag, defaultTag, ledgerName } from "./names";
import { outlookSection } from "./outlookSection";
import { scorecardSection } from "./scorecardSection";
import { settingsSection } from "./settingsSection";
import { SheetCells } from "./sheet";
import { startSection } from "./startSection";
import { trackingSummary } from "./trackingColumns";
import { outlookCautions } from "./outlookCautions";
import type { LedgerDescription, LedgerInput } from "./types";
import { updatesSection } from "./updatesSection";

/**
 * Turn a history and its settings into a ledger description: the cells (values, formulas,
 * formats, notes), defined names, conditional flags, merges and chart of an Ebb ledger.
 * Pure: no host, no I/O. Throws EbbError with a message that says what to do on bad input.
 */
export function describeLedger(input: LedgerInput): LedgerDescription {
  const sheet = checkSheetName(input.anchor.sheet);
  const { row: r0, col: c0 } = parseCell(input.anchor.cell);
  const tag = checkTag(input.tag ?? defaultTag(sheet, input.anchor.cell));
  const figures = ledgerFigures(input);
  const f = engineFigures(figures.used, input.settings, input.horizon, input.coverage);
  const spec = f.model.spec;
  const n = f.y.length;
  const actuals = padded(figures.actuals, n, null);
  const corrections = figures.corrections && {
    ...figures.corrections,
    values: padded(figures.corrections.values, n, null),
    reasons: padded(figures.corrections.reasons, n, ""),
  };
  const g = ledgerGeometry(r0, c0, { model: f.model.shape, horizon: input.horizon, updateRows: updateRowCount(f.model.shape, n), corrections: corrections !== undefined });
  const name = (input.name ?? "").trim() || "History";
  const cells = new SheetCells();
  const ctx: SectionContext = {
    f,
    g,
    cells,
    sheet,
    tag,
    name,
    horizon: input.horizon,
    coverage: input.coverage,
    names: [],
    source: input.source,
    actuals,
    ...(corrections ? { corrections } : {}),
    refs: { startIndex: [], startPeriods: [] },
  };

  cells.text(r0, c0, title(name), "title");
  cells.text(r0 + 1, c0, SUBTITLE, "subtitle");
  ctx.names.push({ name: ledgerName(tag, "ledger"), refersTo: sheetReference(sheet, absolute(r0, c0)), comment: "Top-left cell of an Ebb ledger." });
  const settings = settingsSection(ctx);
  startSection(ctx);
  const { rows, flags } = updatesSection(ctx);
  const outlookRows = outlookSection(ctx);
  const scorecard = scorecardSection(ctx);
  const lastRow = rows[rows.length - 1].row;

  const widths: Record<number, number> = {};
  for (let c = c0; c < c0 + g.width; c++) widths[c] = 13;
  widths[c0] = 18;
  // Reasons are sentences: room to read them.
  if (g.updates.cols.reason !== undefined) widths[g.updates.cols.reason] = 34;
  const heights: Record<number, number> = {};
  for (const c of cells.all()) if (c.role === "header" && String(c.value).length > 12) heights[c.row] = 30;
  return {
    sheet,
    anchor: input.anchor.cell.replace(/\$/g, "").toUpperCase(),
    tag,
    spec: {
      period: f.p,
      seasonality: spec.seasonality,
      trend: spec.trend,
      start: spec.start as "decomposition" | "classic",
      cycles: shownCycles(f.model.shape),
      horizon: input.horizon,
      coverage: input.coverage,
    },
    constants: { ...f.model.constants },
    history: actuals,
    ...(corrections ? { corrections: { ...corrections, values: [...corrections.values], reasons: [...corrections.reasons] } } : {}),
    dataScale: f.scale,
    tracking: trackingSummary(f.tracking),
    cautions: outlookCautions(f),
    ...(input.source ? { source: { ...input.source } } : {}),
    name,
    cells: cells.all(),
    names: ctx.names,
    merges: [rangeAddress(r0, c0, r0, c0 + g.width - 1), rangeAddress(r0 + 1, c0, r0 + 1, c0 + g.width - 1)],
    flags: [...flags, ...settings.flags],
    chart: chartSpec(ctx, lastRow),
    columnWidths: widths,
    rowHeights: heights,
    footprint: [rangeAddress(r0, c0, g.updates.reachLast, c0 + g.width - 1)],
    layout: {
      anchorRow: r0,
      anchorCol: c0,
      settings: settings.inUse,
      written: settings.written,
      scorecard,
      outlook: { firstRow: g.outlook.first, rows: outlookRows },
      updates: {
        headerRow: g.updates.header,
        firstRow: g.updates.first,
        firstUpdateRow: g.updates.firstUpdate,
        lastReachRow: g.updates.reachLast,
        columns: g.updates.cols,
        rows,
      },
      start: {
        windowFirstRow: g.start.first,
        window: f.window,
        columns: g.start.cols,
        level: ctx.refs.startLevel!.replace(/\$/g, ""),
        trend: ctx.refs.startTrend!.replace(/\$/g, ""),
        indexCells: ctx.refs.startIndex.map((a) => a.replace(/\$/g, "")),
      },
      width: g.width,
    },
    intervalMethod: f.mult ? "engine-simulation" : "formula",
  };
}
