import { describeLedger } from "./describe/describeLedger";
import type { LedgerAnchor, LedgerCell, LedgerDescription } from "./describe/types";
import { readLedger } from "./verify/readLedger";
import type { LedgerReader } from "./verify/reader";

export interface LedgerFit {
  sheet: string;
  /** Settings cells to write ("In use" and "When written" for alpha, beta, gamma, phi) and refreshed engine numbers. */
  cells: LedgerCell[];
  constants: { alpha: number; beta: number; gamma: number; phi: number };
  description: LedgerDescription;
}

/**
 * Fit the smoothing constants of a ledger to the history it was written from and return the
 * cells to write: the constants into both settings columns, and (multiplicative ledgers) the
 * simulated interval gaps at the new constants. `keep` holds constants to leave as they are.
 */
export function fitLedgerConstants(read: LedgerReader, anchor: LedgerAnchor, keep: Partial<Record<"alpha" | "beta" | "gamma" | "phi", boolean>> = {}): LedgerFit {
  const { input } = readLedger(read, anchor);
  const settings = { ...input.settings };
  for (const k of ["alpha", "beta", "gamma", "phi"] as const) if (!keep[k]) delete settings[k];
  const fitted = describeLedger({ ...input, settings });
  const L = fitted.layout;
  const wanted = new Set<string>();
  for (const k of ["alpha", "beta", "gamma", "phi"] as const) {
    wanted.add(L.settings[k]);
    wanted.add(L.written[k]);
  }
  const cells = fitted.cells.filter((c) => wanted.has(c.address) || c.kind === "engine");
  return { sheet: fitted.sheet, cells, constants: fitted.constants, description: fitted };
}

/** The engine numbers (simulated gaps) at the settings in use, for a "refresh" action. */
export function refreshEngineCells(read: LedgerReader, anchor: LedgerAnchor): LedgerCell[] {
  const { input } = readLedger(read, anchor);
  return describeLedger(input).cells.filter((c) => c.kind === "engine");
}
