/**
 * The ledger description: everything an adapter needs to write an Ebb ledger (cells,
 * formulas, formats, names, notes, conditional formats, merges, chart), and nothing about
 * how a particular host writes it. Built by `describeLedger`, written by the adapters.
 */
import type { CorrectionFigures } from "./correctedInput";

/** Settings as the panel or the CLI gives them; constants left out are fitted by the engine. */
export interface LedgerSettings {
  /** Season length; 0 or undefined detects it. */
  period?: number;
  seasonality?: string;
  trend?: string;
  /** "decomposition" (default) or "classic": the two starts that can be written as formulas. */
  start?: string;
  cycles?: number;
  alpha?: number;
  beta?: number;
  gamma?: number;
  phi?: number;
}

/** What the .xlsx writer of `ebb ledger` takes: the settings plus the outlook's length and coverage. */
export interface LedgerWorkbookSettings extends LedgerSettings {
  horizon: number;
  coverage: number;
}

/** Where the ledger goes: a sheet and the top-left cell of its block. */
export interface LedgerAnchor {
  sheet: string;
  /** A1-style cell, e.g. "A1" or "C5". */
  cell: string;
}

/** Where a history came from: the sheet, its column and the row of period 1 (0-based). */
export interface HistorySource {
  sheet: string;
  col: number;
  firstRow: number;
}

export interface LedgerInput {
  /** Actuals oldest first; null (or undefined) for a blank cell. Trailing blanks are dropped. */
  history: ArrayLike<number | null | undefined>;
  /** Header of the history column, shown in the title. */
  name?: string;
  settings: LedgerSettings;
  horizon: number;
  coverage: number;
  anchor: LedgerAnchor;
  /**
   * Letters and digits put into every defined name (ebb_<tag>_alpha, ...), so ledgers on
   * different sheets or in different areas do not clash. Default: from the sheet name and cell.
   */
  tag?: string;
  /**
   * The history's cells: the ledger's actuals then refer to them (a corrected history
   * recomputes the ledger and the check names the cells that changed). Left out, the actuals
   * are typed in as numbers.
   */
  source?: HistorySource;
  /**
   * Planner corrections kept beside the actuals (the engine's applyCorrections rule): the
   * ledger shows the actual, the correction, its reason and the value used, and the updates use
   * the value used. Left out, the ledger has no correction columns.
   */
  corrections?: LedgerCorrections;
}

/** Corrections of a ledger: per period, a figure (null = none) and a reason. */
export interface LedgerCorrections {
  /** One per period of the history, oldest first; null (or undefined) keeps the actual. */
  values: ArrayLike<number | null | undefined>;
  /** One per period; blank where there is none. */
  reasons?: ArrayLike<string | null | undefined>;
  /** The corrections' cells: the ledger's corrections then refer to them, like the actuals to the history. */
  source?: HistorySource;
  /** The reasons' cells, referred to the same way. */
  reasonSource?: HistorySource;
}

/** How a cell looks; adapters map roles to fonts and fills (see styles.ts). */
export type StyleRole =
  | "title"
  | "subtitle"
  | "heading"
  | "header"
  | "label"
  | "input"
  | "written"
  | "actual"
  | "linked"
  | "start"
  | "formula"
  | "result"
  | "engine"
  | "explain";

/**
 * What a cell holds, as far as verify is concerned:
 * - formula: must stay a formula whose value matches the engine;
 * - actual: a typed actual, compared with the copy kept in "Actual when written";
 * - source: an actual that refers to its history cell: must stay that reference, and its value
 *   must equal the copy kept in "Actual when written" (else the history changed since);
 * - setting: a setting the user may change (alpha, beta, gamma, phi, coverage);
 * - fixed-setting: a setting the layout was built for (season length, seasonality, ...);
 * - engine: a number the engine produced that no formula can reproduce (simulated gaps);
 * - reason: the reason for a correction: free text (or a reference to the reasons column, which
 *   must stay that reference); its words are not compared;
 * - constant: labels, period numbers, positions, the written record.
 */
export type CellKind = "formula" | "actual" | "source" | "setting" | "fixed-setting" | "engine" | "reason" | "constant";

export type CellValue = number | string | null;

export interface LedgerCell {
  /** A1 address on the ledger sheet, e.g. "H42". */
  address: string;
  /** 0-based row and column on the sheet. */
  row: number;
  col: number;
  kind: CellKind;
  /** Formula text starting with "=", for kind "formula". */
  formula?: string;
  /** The constant, or for a formula the value the engine gives (its cached result). */
  value: CellValue;
  /** Number format code (en-US style), e.g. "#,##0.00". */
  format?: string;
  role: StyleRole;
  /** Short note shown on the cell (header notes give the formula in words). */
  note?: string;
  /**
   * For a formula: the absolute rounding its value may carry beyond 1e-9 of its own size, where
   * that is not set by its format (percent errors, tracking signals, the error variance).
   */
  tolerance?: number;
  /** For a source actual: the history cell it refers to, as messages name it (Sales!B50). */
  source?: string;
}

export interface LedgerName {
  name: string;
  /** Absolute reference with the sheet, e.g. "'Ledger'!$B$6" or "'Ledger'!$H$40:$H$5039". */
  refersTo: string;
  comment: string;
}

/** A flagged range: rose shading on the cells that meet the rule, as the host's conditional format. */
export type ConditionalFlag = ValueFlag | TextFlag;

export interface ValueFlag {
  /** A1 range on the ledger sheet. */
  range: string;
  /** Flag numbers outside [low, high]. */
  outside: { low: number; high: number };
  note: string;
}

export interface TextFlag {
  /** A1 range on the ledger sheet. */
  range: string;
  /** Flag text that holds this phrase (as the hosts compare: ignoring case). */
  containsText: string;
  note: string;
}

export interface ChartSeries {
  label: string;
  /** A1 ranges on the ledger sheet (same length). */
  x: string;
  y: string;
}

export interface ChartSpec {
  name: string;
  title: string;
  /** Lines through (x, y) points, each series with its own x range. */
  kind: "scatter-lines";
  series: ChartSeries[];
  /** Cells the chart covers (top-left and bottom-right). */
  from: string;
  to: string;
}

/** Where the parts of a ledger are, for the panel, extend and verify. */
export interface LedgerLayout {
  anchorRow: number;
  anchorCol: number;
  /** Settings "in use" cells (named) and "when written" cells, by key. */
  settings: Record<SettingKey, string>;
  written: Record<SettingKey, string>;
  scorecard: Record<"mad" | "rmse" | "mape" | "bias" | "tracking" | "outside" | "count", string> & { corrected?: string };
  outlook: { firstRow: number; rows: OutlookRowCells[] };
  updates: {
    headerRow: number;
    /** First row of the table (the start rows come first). */
    firstRow: number;
    /** Row of the first updated period. */
    firstUpdateRow: number;
    /** Last row the table may grow to (its defined names reach this far). */
    lastReachRow: number;
    columns: Partial<Record<UpdateColumnKey, number>>;
    /** One entry per row of the table, in order. */
    rows: { period: number; row: number; start: boolean }[];
  };
  start: {
    windowFirstRow: number;
    /** Periods in the start table. */
    window: number;
    columns: Partial<Record<StartColumnKey, number>>;
    level: string;
    trend: string;
    /** The start index cell of each season position (1..p), in order. */
    indexCells: string[];
  };
  /** Width in columns of the block (the update table's width). */
  width: number;
}

export type SettingKey =
  | "name"
  | "alpha"
  | "beta"
  | "gamma"
  | "phi"
  | "season"
  | "seasonality"
  | "trend"
  | "start"
  | "cycles"
  | "horizon"
  | "coverage"
  | "tag";

export type UpdateColumnKey =
  | "period"
  | "position"
  | "actual"
  | "forecast"
  | "error"
  | "absError"
  | "pctError"
  | "level"
  | "trend"
  | "index"
  | "errorSum"
  | "mad"
  | "tracking"
  | "correction"
  | "reason"
  | "used"
  | "correctionWritten"
  | "written";

export type StartColumnKey =
  | "period"
  | "position"
  | "actual"
  | "correction"
  | "reason"
  | "used"
  | "average"
  | "detrended"
  | "adjusted"
  | "lineX"
  | "rank"
  | "written"
  | "correctionWritten";

export interface OutlookRowCells {
  h: number;
  period: string;
  forecast: string;
  index?: string;
  low: string;
  high: string;
}

export interface LedgerDescription {
  sheet: string;
  anchor: string;
  tag: string;
  /** Resolved model: what the formulas were written for. */
  spec: {
    period: number;
    seasonality: "multiplicative" | "additive" | "none";
    trend: "linear" | "damped" | "none";
    start: "decomposition" | "classic";
    cycles: number;
    horizon: number;
    coverage: number;
  };
  constants: { alpha: number; beta: number; gamma: number; phi: number };
  /** The cleaned history the ledger was written from (null = missing). */
  history: (number | null)[];
  /** Typical size of the actuals (mean absolute value): the check's tolerances scale with it. */
  dataScale: number;
  /** The history's cells the actuals refer to (undefined: typed actuals). */
  source?: HistorySource;
  /** The corrections as written (undefined: a ledger without correction columns). */
  corrections?: CorrectionFigures;
  /** Cautions about the outlook a planner should read before it feeds orders (empty when none). */
  cautions: string[];
  /** The tracking signal as written: its latest value (null while not yet defined) and the update rows it flags. */
  tracking: { latest: number | null; flagged: number; limit: number };
  name: string;
  cells: LedgerCell[];
  names: LedgerName[];
  merges: string[];
  flags: ConditionalFlag[];
  chart: ChartSpec;
  /** Column widths in characters, by 0-based sheet column. */
  columnWidths: Record<number, number>;
  /** Row heights in points, by 0-based sheet row (rows of wrapped column headers). */
  rowHeights: Record<number, number>;
  /** Every range the ledger occupies or may grow into (must be empty before writing). */
  footprint: string[];
  layout: LedgerLayout;
  /** How the outlook interval was obtained, in words (also in a note on the sheet). */
  intervalMethod: "formula" | "engine-simulation";
}
