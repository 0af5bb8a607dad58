import { watchSeries, WATCH_STATUSES } from "../../engine";
import { WATCH_HELP } from "../help";
import type { BatchCommand, SeriesEntry } from "./batch";

/**
 * `watch`: the review list of EBB.WATCH for every column of the file, one entry per series with
 * its status word, the windowed tracking signal, the recent bias as a percent of the mean, the
 * last season's MASE and its ratio to seasonal naive, and the recent actuals outside the 95%
 * band; the summary counts the series per status.
 */
export const watchCommand: BatchCommand = {
  name: "watch",
  summary: "per series: a review status (ok, forecast too low/high, worse than seasonal naive, too short) and its figures",
  help: WATCH_HELP,
  options: [],
  runSeries(column, run) {
    const r = watchSeries(column.values, run.settings.model);
    return {
      watch: {
        status: r.status,
        tracking_signal: r.signal,
        bias_percent: r.biasPercent,
        mase: r.mase,
        naive_ratio: r.naiveRatio,
        outside_band: r.outside,
      },
    };
  },
  csvColumns: ["series", "status", "tracking_signal", "bias_percent", "mase", "naive_ratio", "outside_band", "message"],
  csvRows: (entry) => [entry.watch as Record<string, unknown>],
  digest: (entry: SeriesEntry) => (entry.error !== undefined ? "failed" : (entry.watch as { status: string }).status),
  summarize(digests) {
    const counts: Record<string, number> = {};
    for (const s of [...WATCH_STATUSES, "failed"]) counts[s] = 0;
    for (const d of digests) counts[d as string]++;
    return { statuses: counts };
  },
};
