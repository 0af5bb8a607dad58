/**
 * The benchmark's sections after the core report (speed, workbook, accuracy, coverage). Each
 * section measures one part of the product and returns its own markdown, so adding a section
 * touches this table and the section's own file only. `npm run bench -- --only NAME` runs one.
 */
import { batchBenchmark, renderBatchSection } from "./batch";
import { renderDesignBench, runDesignBench } from "./designs";
import { renderLedgerBench, runLedgerBench } from "./ledger";
import type { M3Series } from "./m3";
import { renderOrder, runOrderBench } from "./order";
import type { Progress } from "./progress";
import { renderSignals, runSignalBench } from "./signals";

export interface SectionContext {
  quick: boolean;
  references: boolean;
  /** The monthly and quarterly series of this run (a sample when quick). */
  monthly: M3Series[];
  quarterly: M3Series[];
  /** Every M3 series, for sections that size their own sample. */
  allMonthly: M3Series[];
  allQuarterly: M3Series[];
  progress: Progress;
}

export interface BenchSection {
  /** The word for `--only`. */
  name: string;
  /** Sections that start child processes run last, so they do not disturb in-process timings. */
  last?: boolean;
  run(ctx: SectionContext): Promise<string> | string;
}

export const SECTIONS: BenchSection[] = [
  { name: "order", run: (c) => renderOrder(runOrderBench(c.monthly, c.quarterly, c.quick, c.progress)) },
  { name: "signals", run: (c) => renderSignals(runSignalBench(c.quick ? c.monthly : c.allMonthly, c.allQuarterly, c.quick, c.progress)) },
  { name: "designs", run: (c) => renderDesignBench(runDesignBench(c.monthly, c.quarterly, c.progress)) },
  { name: "ledger", run: async (c) => renderLedgerBench(await runLedgerBench(c.quick, c.progress)) },
  { name: "batch", last: true, run: async (c) => renderBatchSection(await batchBenchmark(c.quick, c.progress)) },
];

/** The core report's own name for `--only`. */
export const CORE = "core";
