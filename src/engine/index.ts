/** Ebb's forecasting engine: the only place with mathematics. Everything else calls this. */
export * from "./types";
export { modelShape, shapeConstants, parameterCount, estimatedQuantities, requiredLength, seasonPosition, type ModelShape } from "./shape";
export * from "./errors";
export * from "./options";
export { cleanHistory, countPresent, allPositive, requirePositive } from "./series";
export { centeredMovingAverage, classicalIndices, leastSquaresLine } from "./decompose";
export { decompositionStart } from "./start/decompositionStart";
export { classicStart } from "./start/classicStart";
export { optimizedStart } from "./start/optimizedStart";
export { runRecursion, projectState, trendMultipliers, sumSquaredErrors, RecursionWorkspace } from "./recursion";
export { fitConstants, PHI_LOWER, PHI_UPPER } from "./fit";
export { aic, aicc } from "./aicc";
export { fitModel, fitOne, modelStates, forecastModel, resolvePeriod, checkHorizon, type ModelOptions } from "./model";
export { predictionInterval, additiveIntervalWeights, varianceDivisor, checkCoverage, type Interval } from "./intervals";
export { holdoutScore, rollingBacktest, seasonalNaiveScale, type HoldoutResult, type BacktestRow } from "./backtest";
export { detectPeriod } from "./period";
export { acf, seasonalityTest90 } from "./acf";
export * from "./accuracy";
