import { cellAddress } from "./addresses";
import { abs, nm, type SectionContext } from "./context";
import { OUTLOOK_BASIS, OUTLOOK_COLUMNS, SECTION } from "./labels";
import { updateRowCount, type OutlookColumnKey } from "./layout";
import { FORMAT } from "./sheet";
import { RELATIVE_TOLERANCE } from "./tolerance";
import type { OutlookRowCells } from "./types";
import { additiveIntervalWeights, estimatedQuantities, estimatedQuantityWords, forecastVariance, intervalQuantile, parseCoverage, trendMultipliers } from "../../engine";

/**
 * Section 4: the next `horizon` periods from the last row of the update table, found with
 * INDEX and COUNT so the outlook follows when rows are added. Additive (or no) seasonality:
 * the interval is the engine's analytic formula written out. Multiplicative: the engine's
 * seeded simulation has no formula, so its gaps are written as numbers, with a note.
 */
export function outlookSection(ctx: SectionContext): OutlookRowCells[] {
  const { g, cells, f } = ctx;
  const o = g.outlook;
  const cols = o.cols;
  const c0 = g.c0;
  const p = f.p;
  const n = f.y.length;
  const H = ctx.horizon;
  const mult = f.mult;
  const model = f.model;
  cells.text(o.heading, c0, SECTION.outlook, "heading");

  // Basis: the last row's period, level and trend; the error variance and z.
  const basis: [keyof typeof OUTLOOK_BASIS, string, number, string][] = [
    ["rows", `=COUNT(${nm(ctx, "periods")})`, updateRowCount(model.shape, n), FORMAT.count],
  ];
  const rowsCell = abs(o.basisValueRow, c0 + 3);
  basis.unshift(
    ["period", `=INDEX(${nm(ctx, "periods")},${rowsCell})`, n, FORMAT.period],
    ["level", `=INDEX(${nm(ctx, "levels")},${rowsCell})`, model.final.level, FORMAT.units],
    ["trend", `=INDEX(${nm(ctx, "trends")},${rowsCell})`, model.final.trend, FORMAT.trend],
  );
  const sigma2 = forecastVariance(model);
  // The count of estimated quantities sits in its own labelled cell after z, read by both formulas.
  const quantitiesCol = c0 + 6;
  if (!mult) {
    // The quantile from the coverage setting, as the cell's T.INV computes it (never recovered from the interval).
    const z = intervalQuantile(model, parseCoverage(ctx.coverage));
    const lost = abs(o.basisValueRow, quantitiesCol);
    const errors = nm(ctx, "errors");
    // The engine's forecastVariance: SSE / (n - k), widened by 1 + k/n for the estimated quantities.
    basis.push(["variance", `=SUMSQ(${errors})/MAX(1,COUNT(${errors})-${lost})*(1+${lost}/MAX(1,COUNT(${errors})))`, sigma2, FORMAT.units]);
    // Coverage typed as 95 or as 0.95 is the same interval (the engine's parseCoverage rule).
    const coverage = nm(ctx, "coverage");
    // A coverage the engine refuses (0, blank, 1, 100 or more, text) gives #N/A, so no interval shows as if it were one.
    const valid = `AND(ISNUMBER(${coverage}),${coverage}>0,${coverage}<100,${coverage}<>1)`;
    basis.push(["z", `=IF(${valid},T.INV(0.5+IF(${coverage}>1,${coverage}/100,${coverage})/2,MAX(1,COUNT(${errors})-${lost})),NA())`, z, FORMAT.constant]);
  }
  basis.forEach(([key, formula, value, format], i) => {
    cells.text(o.basisLabelRow, c0 + i, OUTLOOK_BASIS[key].label, "header", OUTLOOK_BASIS[key].note);
    const cell = cells.formula(o.basisValueRow, c0 + i, formula, value, format, "result");
    // A variance is in squared units: errors off by delta move it by about 2 sigma delta.
    if (key === "variance") cell.tolerance = 2 * Math.sqrt(sigma2) * RELATIVE_TOLERANCE * f.scale + (RELATIVE_TOLERANCE * f.scale) ** 2;
  });
  if (!mult) {
    const q = OUTLOOK_BASIS.quantities;
    cells.text(o.basisLabelRow, quantitiesCol, q.label, "header", `${q.note}${estimatedQuantityWords(model.shape)}.`);
    cells.put(o.basisValueRow, quantitiesCol, "constant", "label", estimatedQuantities(model.shape), { format: FORMAT.count });
  }
  const lastPeriod = abs(o.basisValueRow, c0);
  const level = abs(o.basisValueRow, c0 + 1);
  const trend = abs(o.basisValueRow, c0 + 2);
  const variance = abs(o.basisValueRow, c0 + 4);
  const zCell = abs(o.basisValueRow, c0 + 5);
  ctx.refs.outlookRows = rowsCell;

  // Column headers.
  const headers: Partial<Record<OutlookColumnKey, { label: string; note: string }>> = {
    period: OUTLOOK_COLUMNS.period,
    steps: OUTLOOK_COLUMNS.steps,
    position: OUTLOOK_COLUMNS.position,
    multiplier: { label: OUTLOOK_COLUMNS.multiplier.label, note: model.spec.trend === "none" ? OUTLOOK_COLUMNS.multiplier.noteNoTrend : OUTLOOK_COLUMNS.multiplier.note },
    index: OUTLOOK_COLUMNS.index,
    forecast: {
      label: OUTLOOK_COLUMNS.forecast.label,
      note: f.seasonal ? (mult ? OUTLOOK_COLUMNS.forecast.noteMult : OUTLOOK_COLUMNS.forecast.noteAdd) : OUTLOOK_COLUMNS.forecast.noteNone,
    },
    weight: OUTLOOK_COLUMNS.weight,
    sumSquares: OUTLOOK_COLUMNS.sumSquares,
    half: OUTLOOK_COLUMNS.half,
    gapBelow: OUTLOOK_COLUMNS.gapBelow,
    gapAbove: OUTLOOK_COLUMNS.gapAbove,
    low: mult ? OUTLOOK_COLUMNS.lowMult : OUTLOOK_COLUMNS.lowAdd,
    high: mult ? OUTLOOK_COLUMNS.highMult : OUTLOOK_COLUMNS.highAdd,
  };
  for (const key of Object.keys(cols) as OutlookColumnKey[]) cells.text(o.header, cols[key]!, headers[key]!.label, "header", headers[key]!.note);

  // The multiplier column is written as phi + phi^2 + ... for every trend (phi is 1 unless damped).
  const multipliers = trendMultipliers("damped", model.constants.phi, H);
  const weights = mult ? undefined : additiveIntervalWeights(model, H);
  const season = nm(ctx, "season");
  const [alpha, beta, gamma, phi] = ["alpha", "beta", "gamma", "phi"].map((k) => nm(ctx, k));
  const out: OutlookRowCells[] = [];
  for (let h = 1; h <= H; h++) {
    const r = o.first + h - 1;
    const c = (key: OutlookColumnKey, row = r) => cellAddress(row, cols[key]!);
    cells.put(r, cols.steps!, "constant", "label", h, { format: FORMAT.count });
    cells.formula(r, cols.period!, `=${lastPeriod}+${c("steps")}`, n + h, FORMAT.period);
    if (cols.position !== undefined) cells.formula(r, cols.position, `=MOD(${c("period")}-1,${season})+1`, ((n + h - 1) % p) + 1, FORMAT.period);
    cells.formula(r, cols.multiplier!, h === 1 ? `=${phi}` : `=${c("multiplier", r - 1)}+${phi}^${c("steps")}`, multipliers[h - 1], FORMAT.constant);
    if (cols.index !== undefined) {
      cells.formula(r, cols.index, `=INDEX(${nm(ctx, "indices")},${rowsCell}-${season}+MOD(${c("steps")}-1,${season})+1)`, model.final.indices[(h - 1) % p], mult ? FORMAT.ratio : FORMAT.units);
    }
    const base = `${level}+${c("multiplier")}*${trend}`;
    const fc = !f.seasonal ? `=${base}` : mult ? `=(${base})*${c("index")}` : `=${base}+${c("index")}`;
    cells.formula(r, cols.forecast!, fc, f.forecast[h - 1], FORMAT.units, "result");
    const F = c("forecast");
    if (weights) {
      if (h === 1) {
        cells.put(r, cols.weight!, "constant", "label", 0, { format: FORMAT.constant });
        cells.put(r, cols.sumSquares!, "constant", "label", 0, { format: FORMAT.constant });
      } else {
        let w = `=${alpha}`;
        if (model.spec.trend !== "none") w += `+${alpha}*${beta}*${c("multiplier", r - 1)}`;
        if (f.seasonal && (h - 1) % p === 0) w += `+${gamma}*(1-${alpha})`;
        cells.formula(r, cols.weight!, w, weights.weight[h - 1], FORMAT.constant);
        cells.formula(r, cols.sumSquares!, `=${c("sumSquares", r - 1)}+${c("weight")}^2`, weights.sumSquares[h - 1], FORMAT.constant);
      }
      cells.formula(r, cols.half!, `=${zCell}*SQRT(${variance}*(1+${c("sumSquares")}))`, f.interval.high[h - 1] - f.forecast[h - 1], FORMAT.units);
      cells.formula(r, cols.low!, `=${F}-${c("half")}`, f.interval.low[h - 1], FORMAT.units, "result");
      cells.formula(r, cols.high!, `=${F}+${c("half")}`, f.interval.high[h - 1], FORMAT.units, "result");
    } else {
      cells.put(r, cols.gapBelow!, "engine", "engine", f.forecast[h - 1] - f.interval.low[h - 1], { format: FORMAT.units });
      cells.put(r, cols.gapAbove!, "engine", "engine", f.interval.high[h - 1] - f.forecast[h - 1], { format: FORMAT.units });
      cells.formula(r, cols.low!, `=${F}-${c("gapBelow")}`, f.interval.low[h - 1], FORMAT.units, "result");
      cells.formula(r, cols.high!, `=${F}+${c("gapAbove")}`, f.interval.high[h - 1], FORMAT.units, "result");
    }
    out.push({ h, period: c("period"), forecast: F, index: cols.index !== undefined ? c("index") : undefined, low: c("low"), high: c("high") });
  }
  return out;
}
