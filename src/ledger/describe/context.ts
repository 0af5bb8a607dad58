import { absolute } from "./addresses";
import type { EngineFigures } from "./engineFigures";
import type { Geometry } from "./layout";
import { ledgerName } from "./names";
import type { SheetCells } from "./sheet";
import type { CorrectionFigures } from "./correctedInput";
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
  /** The actuals as recorded, one per period (null = blank); the engine ran on the values used. */
  actuals: (number | null)[];
  /** The corrections, when the ledger has correction columns (one per period). */
  corrections?: CorrectionFigures;
  /** Cells other sections refer to, filled in as sections are built. */
  refs: {
    startLevel?: string;
    startTrend?: string;
    /** Absolute address of the start index for each season position (0-based). */
    startIndex: string[];
    /** Start-table cells of each period 0..window-1 (actual, value used, correction, reason). */
    startPeriods: import("./periodCells").PeriodRefs[];
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
