import { absolute } from "./addresses";
import type { EngineFigures } from "./engineFigures";
import type { Geometry } from "./layout";
import { ledgerName } from "./names";
import type { SheetCells } from "./sheet";
import type { HistorySource, LedgerName } from "./types";

/** What every section builder needs: the engine's figures, the geometry and the cell collector. */
export interface SectionContext {
  f: EngineFigures;
  g: Geometry;
  cells: SheetCells;
  sheet: string;
  tag: string;
  name: string;
  horizon: number;
  coverage: number;
  names: LedgerName[];
  /** The history's cells, when the actuals refer to them. */
  source?: HistorySource;
  /** Cells other sections refer to, filled in as sections are built. */
  refs: {
    startLevel?: string;
    startTrend?: string;
    /** Absolute address of the start index for each season position (0-based). */
    startIndex: string[];
    /** Absolute address of the start-table actual for each period 0..window-1. */
    startActual: string[];
    outlookRows?: string;
  };
}

/** Defined name of this ledger, e.g. ebb_SeedTrays_alpha. */
export function nm(ctx: SectionContext, key: string): string {
  return ledgerName(ctx.tag, key);
}

export function abs(row: number, col: number): string {
  return absolute(row, col);
}
