import type { FittedModel } from "../../engine";

/**
 * The model fields every series entry carries. A constant the model does not use is null:
 * beta and phi without a trend, gamma without seasonality.
 */
export function modelSummary(model: FittedModel): Record<string, unknown> {
  const { spec, constants } = model;
  const hasTrend = spec.trend !== "none";
  return {
    period: spec.period,
    seasonality: spec.seasonality,
    trend: spec.trend,
    start: spec.start,
    alpha: constants.alpha,
    beta: hasTrend ? constants.beta : null,
    gamma: spec.seasonality === "none" ? null : constants.gamma,
    phi: hasTrend ? constants.phi : null,
    sse: model.sse,
    rmse: model.rmse,
    aicc: model.aicc,
  };
}

export const MODEL_COLUMNS = ["period", "seasonality", "trend", "start", "alpha", "beta", "gamma", "phi", "sse", "rmse", "aicc"] as const;
