import { badInput, modelShape, type ModelShape, type Seasonality, type TrendKind } from "../../engine";
import { MAX_ROWS, parseCell } from "../describe/addresses";
import { ledgerGeometry, SETTING_KEYS, startRowCount, type Geometry } from "../describe/layout";
import { START_COLUMNS } from "../describe/labels";
import { parseReasonFormula, parseSourceFormula } from "../describe/sourceCells";
import type { HistorySource, LedgerAnchor, LedgerInput, SettingKey } from "../describe/types";
import type { LedgerReader } from "./reader";

/** A ledger read back: the input that rebuilds it, and where its settings were found. */
export interface ReadLedger {
  input: LedgerInput;
  /** The engine's shape of the model the layout was written for. */
  shape: ModelShape;
  /** Where the parts are (from the settings block; the update table's reach as written). */
  geometry: Geometry;
  /** Values of the "In use" column, by setting. */
  inUse: Record<SettingKey, number | string | null>;
  /** Values of the "When written" column, by setting. */
  written: Record<SettingKey, number | string | null>;
  /** Sheet rows and columns of each setting's "In use" cell. */
  settingCells: Record<SettingKey, { row: number; col: number }>;
  /** Sheet row of the last period in the update table. */
  lastRow: number;
}

/** Option words a ledger's layout can be built for. */
export const LEDGER_WORDS = {
  seasonality: ["multiplicative", "additive", "none"],
  trend: ["linear", "damped", "none"],
  start: ["decomposition", "classic"],
} as const;

/**
 * Read a ledger's settings and the history it was written from. The layout is rebuilt from
 * the "When written" column through the engine's model shape, and the history from the
 * "Actual when written" column, so a changed actual or setting shows up as a difference
 * instead of moving the layout. The update table is read down to the end of its period
 * column, however long. Constants and coverage come from the "In use" column (the user may
 * change them).
 */
export function readLedger(read: LedgerReader, anchor: LedgerAnchor): ReadLedger {
  const { row: r0, col: c0 } = parseCell(anchor.cell);
  const inUse = {} as Record<SettingKey, number | string | null>;
  const written = {} as Record<SettingKey, number | string | null>;
  const settingCells = {} as Record<SettingKey, { row: number; col: number }>;
  const probe = ledgerGeometry(r0, c0, { model: modelShape({ period: 1, seasonality: "none", trend: "none", start: "decomposition" }), horizon: 1, updateRows: 1 });
  for (const k of SETTING_KEYS) {
    const row = probe.settings.rows[k];
    inUse[k] = read(row, c0 + 1).value;
    written[k] = read(row, c0 + 2).value;
    settingCells[k] = { row, col: c0 + 1 };
  }
  const tagText = typeof written.tag === "string" ? written.tag : "";
  const tagMatch = /^ebb_([A-Za-z0-9]+)_$/.exec(tagText);
  const { season: p, seasonality, trend, start, cycles, horizon } = written;
  const isWord = <T extends string>(v: unknown, words: readonly T[]): v is T => typeof v === "string" && (words as readonly string[]).includes(v);
  const whole = (v: unknown, min: number): v is number => typeof v === "number" && Number.isInteger(v) && v >= min;
  if (!tagMatch || !whole(p, 1) || !isWord(seasonality, LEDGER_WORDS.seasonality) || !isWord(trend, LEDGER_WORDS.trend) || !isWord(start, LEDGER_WORDS.start) || !whole(cycles, 1) || !whole(horizon, 1)) {
    throw badInput("not-a-ledger", `No Ebb ledger starts at ${anchor.sheet}!${anchor.cell}: its settings block is missing or damaged. Select the ledger's top-left cell (its title).`);
  }
  const shape = modelShape({ period: p, seasonality: seasonality as Seasonality, trend: trend as TrendKind, start, cycles });
  const plain = ledgerGeometry(r0, c0, { model: shape, horizon, updateRows: startRowCount(shape) });
  // A corrected ledger has its correction column right after the actual.
  const corrected = read(plain.start.header, plain.start.cols.actual! + 1).value === START_COLUMNS.correction.label;
  const g = corrected ? ledgerGeometry(r0, c0, { model: shape, horizon, updateRows: startRowCount(shape), corrections: true }) : plain;
  refuseEarlierSignal(read, g.updates.header, g.updates.cols.errorSum!, anchor);
  // The history's cells, from the first start-table actual that still refers to one.
  let source: HistorySource | undefined;
  for (let t = 0; t < shape.startWindow && !source; t++) source = parseSourceFormula(read(g.start.first + t, g.start.cols.actual!).formula, t);
  const history: (number | null)[] = [];
  const corrections: (number | null)[] = [];
  const reasons: string[] = [];
  let correctionSource: HistorySource | undefined;
  let reasonSource: HistorySource | undefined;
  const asNumber = (v: number | string | null) => (typeof v === "number" ? v : null);
  // One period's record: its written actual, and on a corrected ledger its written correction and reason.
  const take = (row: number, cols: { written?: number; correction?: number; reason?: number; correctionWritten?: number }, t: number) => {
    history.push(asNumber(read(row, cols.written!).value));
    if (!corrected) return;
    corrections.push(asNumber(read(row, cols.correctionWritten!).value));
    const reason = read(row, cols.reason!);
    reasons.push(typeof reason.value === "string" ? reason.value : reason.value === null ? "" : String(reason.value));
    correctionSource ??= parseSourceFormula(read(row, cols.correction!).formula, t);
    reasonSource ??= parseReasonFormula(reason.formula, t);
  };
  for (let t = 0; t < shape.startWindow; t++) take(g.start.first + t, g.start.cols, t);
  // Down the period column until it ends (or stops counting on).
  let lastRow = g.updates.firstUpdate - 1;
  for (let r = g.updates.firstUpdate, t = shape.firstUpdate; r < MAX_ROWS; r++, t++) {
    if (read(r, g.updates.cols.period!).value !== t + 1) break;
    if (t >= shape.startWindow) take(r, g.updates.cols, t);
    lastRow = r;
  }
  const num = (v: number | string | null) => (typeof v === "number" ? v : undefined);
  const input: LedgerInput = {
    history,
    name: typeof inUse.name === "string" ? inUse.name : String(inUse.name ?? ""),
    settings: {
      period: p,
      seasonality,
      trend,
      start,
      cycles,
      alpha: num(inUse.alpha),
      beta: num(inUse.beta),
      gamma: num(inUse.gamma),
      phi: num(inUse.phi),
    },
    horizon,
    coverage: typeof inUse.coverage === "number" ? inUse.coverage : NaN,
    anchor: { sheet: anchor.sheet, cell: anchor.cell },
    tag: tagMatch[1],
    ...(source ? { source } : {}),
    ...(corrected
      ? { corrections: { values: corrections, reasons, ...(correctionSource ? { source: correctionSource } : {}), ...(reasonSource ? { reasonSource } : {}) } }
      : {}),
  };
  return { input, shape, geometry: g, inUse, written, settingCells, lastRow };
}

/** The first tracking-signal column's heading when the signal was the running sum (ledgers written before the windowed signal). */
const RUNNING_SIGNAL_HEADING = "Errors so far";

/**
 * A ledger written before the windowed tracking signal holds running-sum columns: checking it
 * against today's formulas would report every row. Say so once, with what to do.
 */
function refuseEarlierSignal(read: LedgerReader, row: number, col: number, anchor: LedgerAnchor): void {
  const heading = read(row, col).value;
  if (heading !== RUNNING_SIGNAL_HEADING) return;
  throw badInput(
    "earlier-signal",
    `The ledger at ${anchor.sheet}!${anchor.cell} was written by an earlier Ebb: its tracking signal is the running sum ("${RUNNING_SIGNAL_HEADING}"), which grows with time. Write the ledger again from its history (on a new sheet) to get the windowed signal; this one is left as it is.`,
  );
}
