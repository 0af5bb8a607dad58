import { badInput } from "../../engine";
import { parseCell } from "../describe/addresses";
import { ledgerGeometry, SETTING_KEYS } from "../describe/layout";
import type { LedgerAnchor, LedgerInput, SettingKey } from "../describe/types";
import type { LedgerReader } from "./reader";

/** A ledger read back: the input that rebuilds it, and where its settings were found. */
export interface ReadLedger {
  input: LedgerInput;
  /** Values of the "In use" column, by setting. */
  inUse: Record<SettingKey, number | string | null>;
  /** Values of the "When written" column, by setting. */
  written: Record<SettingKey, number | string | null>;
  /** Sheet rows and columns of each setting's "In use" cell. */
  settingCells: Record<SettingKey, { row: number; col: number }>;
}

/**
 * Read a ledger's settings and the history it was written from. The layout is rebuilt from
 * the "When written" column and the history from the "Actual when written" column, so a
 * changed actual or setting shows up as a difference instead of moving the layout.
 * Constants and coverage come from the "In use" column (the user may change them).
 */
export function readLedger(read: LedgerReader, anchor: LedgerAnchor): ReadLedger {
  const { row: r0, col: c0 } = parseCell(anchor.cell);
  const inUse = {} as Record<SettingKey, number | string | null>;
  const written = {} as Record<SettingKey, number | string | null>;
  const settingCells = {} as Record<SettingKey, { row: number; col: number }>;
  SETTING_KEYS.forEach((k, i) => {
    const row = r0 + 5 + i;
    inUse[k] = read(row, c0 + 1).value;
    written[k] = read(row, c0 + 2).value;
    settingCells[k] = { row, col: c0 + 1 };
  });
  const tagText = typeof written.tag === "string" ? written.tag : "";
  const tagMatch = /^ebb_([A-Za-z0-9]+)_$/.exec(tagText);
  const p = written.season;
  const seasonality = written.seasonality;
  const trend = written.trend;
  const start = written.start;
  const cycles = written.cycles;
  const horizon = written.horizon;
  if (!tagMatch || typeof p !== "number" || typeof seasonality !== "string" || typeof trend !== "string" || (start !== "decomposition" && start !== "classic") || typeof cycles !== "number" || typeof horizon !== "number") {
    throw badInput("not-a-ledger", `No Ebb ledger starts at ${anchor.sheet}!${anchor.cell}: its settings block is missing or damaged. Select the ledger's top-left cell (its title).`);
  }
  const seasonal = seasonality !== "none";
  const window = start === "classic" ? (seasonal ? 2 * p : 2) : seasonal ? cycles * p : cycles;
  const g = ledgerGeometry(r0, c0, {
    seasonal,
    mult: seasonality === "multiplicative",
    trend: trend as "linear" | "damped" | "none",
    start,
    p,
    window,
    horizon,
    updateRows: p,
  });
  const history: (number | null)[] = [];
  const asNumber = (v: number | string | null) => (typeof v === "number" ? v : null);
  for (let t = 0; t < window; t++) history.push(asNumber(read(g.start.first + t, g.start.cols.written!).value));
  const fu = start === "classic" ? p : window;
  for (let r = g.updates.firstUpdate, t = fu; r <= g.updates.reachLast; r++, t++) {
    const period = read(r, g.updates.cols.period!).value;
    if (typeof period !== "number") break;
    if (t >= window) history.push(asNumber(read(r, g.updates.cols.written!).value));
  }
  const num = (v: number | string | null) => (typeof v === "number" ? v : undefined);
  const input: LedgerInput = {
    history,
    name: typeof inUse.name === "string" ? inUse.name : String(inUse.name ?? ""),
    settings: {
      period: p,
      seasonality: seasonal ? seasonality : "additive",
      trend,
      start,
      cycles: seasonal ? cycles : Math.max(2, cycles),
      alpha: num(inUse.alpha),
      beta: num(inUse.beta),
      gamma: num(inUse.gamma),
      phi: num(inUse.phi),
    },
    horizon,
    coverage: typeof inUse.coverage === "number" ? inUse.coverage : NaN,
    anchor: { sheet: anchor.sheet, cell: anchor.cell },
    tag: tagMatch[1],
  };
  return { input, inUse, written, settingCells };
}
