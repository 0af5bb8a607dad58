import { badInput, type ModelShape } from "../../engine";
import { MAX_COLS, MAX_ROWS } from "./addresses";
import type { SettingKey, StartColumnKey, UpdateColumnKey } from "./types";

/**
 * Where each part of a ledger goes, relative to its top-left cell. A pure function of the
 * engine's model shape (src/engine/shape.ts), so verify and extend can rebuild it from the
 * settings block alone.
 *
 *   title, subtitle
 *   1 Settings (left)            5 Scorecard (right)
 *   4 Outlook (basis row, then one row per step)
 *   2 Start (start table left, index table and line block right)
 *   3 Updates (grows downward as actuals arrive; the last section, so rows can be added)
 */

export const SETTING_KEYS: SettingKey[] = [
  "name",
  "alpha",
  "beta",
  "gamma",
  "phi",
  "season",
  "seasonality",
  "trend",
  "start",
  "cycles",
  "horizon",
  "coverage",
  "tag",
];

/** The settings rows that hold a smoothing constant (the engine's CONSTANT_BOUNDS apply). */
export const CONSTANT_SETTINGS: readonly SettingKey[] = ["alpha", "beta", "gamma", "phi"];

/** What the layout depends on: the engine's model shape, the outlook's length and the table's rows. */
export interface LayoutShape {
  model: ModelShape;
  horizon: number;
  /** Rows in the update table, start rows included. */
  updateRows: number;
  /** Correction, reason and value-used columns after the actual (and a written copy of the correction). */
  corrections?: boolean;
}

/** Start rows of the update table: the last season of the start window (one row without seasons). */
export function startRowCount(model: ModelShape): number {
  return model.period;
}

/** Rows of the update table for a history of n periods: the start rows, then one per updated period. */
export function updateRowCount(model: ModelShape, n: number): number {
  return startRowCount(model) + (n - model.firstUpdate);
}

export type OutlookColumnKey = "period" | "steps" | "position" | "multiplier" | "index" | "forecast" | "weight" | "sumSquares" | "half" | "gapBelow" | "gapAbove" | "low" | "high";

export interface Geometry {
  r0: number;
  c0: number;
  width: number;
  settings: { heading: number; header: number; rows: Record<SettingKey, number> };
  score: { labelCol: number; valueCol: number; header: number; first: number };
  outlook: { heading: number; basisLabelRow: number; basisValueRow: number; header: number; first: number; cols: Partial<Record<OutlookColumnKey, number>> };
  start: {
    heading: number;
    header: number;
    first: number;
    cols: Partial<Record<StartColumnKey, number>>;
    sideCol: number;
    indexHeader: number;
    indexFirst: number;
    lineFirst: number;
  };
  updates: { heading: number; header: number; first: number; firstUpdate: number; cols: Partial<Record<UpdateColumnKey, number>>; reachLast: number };
  chart: { row: number; col: number; lastRow: number; lastCol: number };
}

/** Rows the update table's names reach: room to add actuals without touching the rest. */
export function reachRows(updateRows: number): number {
  return Math.max(3000, Math.ceil((updateRows * 2) / 1000) * 1000);
}

function columns<K extends string>(keys: (K | false)[], c0: number): Partial<Record<K, number>> {
  const out: Partial<Record<K, number>> = {};
  let c = c0;
  for (const k of keys) if (k) out[k] = c++;
  return out;
}

/** The columns a corrected ledger puts after its actual: the correction, its reason, the value the updates use. */
const CORRECTION_KEYS = ["correction", "reason", "used"] as const;

export function startColumnKeys(m: ModelShape, corrections = false): StartColumnKey[] {
  const s = { seasonal: m.seasonal, start: m.start, trend: m.trend };
  const keys: (StartColumnKey | false)[] = ["period", s.seasonal && "position", "actual", ...(corrections ? CORRECTION_KEYS : [])];
  if (s.seasonal) {
    keys.push("average", "detrended");
    if (s.start === "decomposition") keys.push("adjusted", s.trend !== "none" && "lineX");
    else keys.push("rank");
  } else if (s.start === "decomposition" && s.trend !== "none") {
    keys.push("lineX");
  }
  keys.push("written");
  if (corrections) keys.push("correctionWritten");
  return keys.filter((k): k is StartColumnKey => k !== false);
}

export function ledgerGeometry(r0: number, c0: number, shape: LayoutShape): Geometry {
  const m = shape.model;
  const s = { seasonal: m.seasonal, mult: m.multiplicative, p: m.period, window: m.startWindow, horizon: shape.horizon, updateRows: shape.updateRows };
  const updateKeys: (UpdateColumnKey | false)[] = [
    "period",
    s.seasonal && "position",
    "actual",
    ...(shape.corrections ? CORRECTION_KEYS : []),
    "forecast",
    "error",
    "absError",
    "pctError",
    "level",
    "trend",
    s.seasonal && "index",
    "errorSum",
    "mad",
    "tracking",
    "written",
    shape.corrections === true && "correctionWritten",
  ];
  const updateCols = columns(updateKeys, c0);
  const width = Object.keys(updateCols).length;

  const settingsHeading = r0 + 3;
  const settingRows = {} as Record<SettingKey, number>;
  SETTING_KEYS.forEach((k, i) => (settingRows[k] = settingsHeading + 2 + i));
  const settingsLast = settingsHeading + 1 + SETTING_KEYS.length;

  const outlookHeading = settingsLast + 2;
  const outlookKeys: (OutlookColumnKey | false)[] = [
    "period",
    "steps",
    s.seasonal && "position",
    "multiplier",
    s.seasonal && "index",
    "forecast",
    !s.mult && "weight",
    !s.mult && "sumSquares",
    !s.mult && "half",
    s.mult && "gapBelow",
    s.mult && "gapAbove",
    "low",
    "high",
  ];
  const outlookHeader = outlookHeading + 3;
  const outlookLast = outlookHeader + s.horizon;

  const startHeading = outlookLast + 2;
  const startKeys = startColumnKeys(m, shape.corrections === true);
  const startCols = columns(startKeys, c0);
  const sideCol = c0 + startKeys.length + 1;
  const startFirst = startHeading + 2;
  const indexHeader = startHeading + 1;
  const indexFirst = startFirst;
  const lineFirst = s.seasonal ? indexFirst + s.p + 1 : startFirst;
  const lineRows = 4;
  const startLast = Math.max(startFirst + s.window - 1, lineFirst + lineRows - 1);

  const updatesHeading = startLast + 2;
  const updatesHeader = updatesHeading + 1;
  const updatesFirst = updatesHeader + 1;
  const reachLast = updatesFirst + reachRows(s.updateRows) - 1;
  if (reachLast >= MAX_ROWS || c0 + width + 12 >= MAX_COLS) {
    throw badInput("bad-anchor", "The ledger does not fit below or right of this cell. Choose a cell nearer the top left, or a new sheet.");
  }
  return {
    r0,
    c0,
    width,
    settings: { heading: settingsHeading, header: settingsHeading + 1, rows: settingRows },
    score: { labelCol: c0 + 8, valueCol: c0 + 10, header: settingsHeading + 1, first: settingsHeading + 2 },
    outlook: {
      heading: outlookHeading,
      basisLabelRow: outlookHeading + 1,
      basisValueRow: outlookHeading + 2,
      header: outlookHeader,
      first: outlookHeader + 1,
      cols: columns(outlookKeys, c0),
    },
    start: { heading: startHeading, header: startHeading + 1, first: startFirst, cols: startCols, sideCol, indexHeader, indexFirst, lineFirst },
    updates: { heading: updatesHeading, header: updatesHeader, first: updatesFirst, firstUpdate: updatesFirst + startRowCount(m), cols: updateCols, reachLast },
    chart: { row: settingsHeading, col: c0 + width + 1, lastRow: settingsHeading + 20, lastCol: c0 + width + 11 },
  };
}
