import { holdoutScore, type HoldoutResult } from "../../engine";
import { BACKTEST_HELP } from "../help";
import type { BatchCommand } from "./batch";
import { modelSummary } from "./modelSummary";

/** The holdout scores as the JSON shows them: no interval arrays or model, coverage null when not asked for. */
export type BacktestFields = Omit<HoldoutResult, "low" | "high" | "model" | "coverage"> & { coverage: number | null };

/**
 * `backtest`: fit on all but the last --holdout values, forecast them and score the forecasts
 * (the engine's holdoutScore). The model fields describe the model fitted on the kept part.
 */
export const backtestCommand: BatchCommand = {
  name: "backtest",
  summary: "per series and overall: accuracy on the last --holdout values, fitted on the rest",
  help: BACKTEST_HELP,
  options: ["holdout", "coverage"],
  runSeries(column, run) {
    const { holdout, coverage, model: options } = run.settings;
    const score = holdoutScore(column.values, options, holdout, coverage);
    const backtest: BacktestFields = {
      holdout: score.holdout,
      forecast: score.forecast,
      actual: score.actual,
      mad: score.mad,
      mape: score.mape,
      smape: score.smape,
      mase: score.mase,
      rmse: score.rmse,
      bias: score.bias,
      coverage: score.coverage ?? null,
    };
    return { ...modelSummary(score.model), backtest };
  },
  csvColumns: ["series", "h", "actual", "forecast", "mad", "mape", "smape", "mase", "rmse", "bias", "coverage", "message"],
  csvRows(entry) {
    const b = entry.backtest as BacktestFields;
    return Array.from(b.forecast, (forecast, i) => ({
      h: i + 1,
      actual: b.actual[i],
      forecast,
      mad: b.mad,
      mape: b.mape,
      smape: b.smape,
      mase: b.mase,
      rmse: b.rmse,
      bias: b.bias,
      coverage: b.coverage,
    }));
  },
  digest: (entry) => (entry.error === undefined ? scaleFree(entry.backtest as BacktestFields) : null),
  summarize: (digests) => ({ overall: overallScores(digests as (ScaleFree | null)[]) }),
};

type ScaleFree = Pick<BacktestFields, "mape" | "smape" | "mase" | "coverage">;

function scaleFree(b: BacktestFields): ScaleFree {
  return { mape: b.mape, smape: b.smape, mase: b.mase, coverage: b.coverage };
}

/**
 * Scores over all series: the mean of each scale-free measure over the series where it is
 * defined (as the M3 competition averaged sMAPE over series). MAD, RMSE and bias are in each
 * series' own units and are not averaged. A failed series has a null digest.
 */
function overallScores(digests: (ScaleFree | null)[]): Record<string, number | null> {
  const scored = digests.filter((d): d is ScaleFree => d !== null);
  const mean = (pick: (b: ScaleFree) => number | null): number | null => {
    const values = scored.map(pick).filter((v): v is number => v !== null && Number.isFinite(v));
    return values.length === 0 ? null : values.reduce((a, b) => a + b, 0) / values.length;
  };
  return {
    series: scored.length,
    failed: digests.length - scored.length,
    mape: mean((b) => b.mape),
    smape: mean((b) => b.smape),
    mase: mean((b) => b.mase),
    coverage: mean((b) => b.coverage),
  };
}
