/*
 * Ebb's worksheet functions for the spreadsheet host (namespace EBB, set in the manifest).
 * Generated from catalog.ts by generateHostFunctions.ts: edit the catalog, not this file.
 * custom-functions-metadata-plugin reads the JSDoc below to write functions.json and adds the
 * CustomFunctions.associate calls when webpack bundles this file.
 */
/* eslint-disable @typescript-eslint/no-explicit-any */
import { callHost } from "./host";

/**
 * Detected season length of each series (1 when no season is found).
 * @customfunction PERIOD
 * @param history Actuals, oldest first: a column (or row), or a block with one product per column. Blank cells are missing; trailing blanks are ignored.
 */
export function period(history: any[][]): any[][] {
  return callHost("PERIOD", [history]);
}

/**
 * Seasonal indices by classical decomposition over all full seasons; the first index belongs to the first row of the history.
 * @customfunction INDICES
 * @param history Actuals, oldest first: a column (or row), or a block with one product per column. Blank cells are missing; trailing blanks are ignored.
 * @param period Season length, for example 12 for monthly data with a yearly pattern; 0 or blank detects it.
 * @param seasonality multiplicative (default) or additive.
 */
export function indices(history: any[][], period: any, seasonality?: string): any[][] {
  return callHost("INDICES", [history, period, seasonality]);
}

/**
 * Start state from the first seasons: start level, start trend, then the p start indices.
 * @customfunction INIT
 * @param history Actuals, oldest first: a column (or row), or a block with one product per column. Blank cells are missing; trailing blanks are ignored.
 * @param period Season length, for example 12 for monthly data with a yearly pattern; 0 or blank detects it.
 * @param seasonality multiplicative (default) or additive.
 * @param cycles Seasons in the start window, 2 or more (default 2).
 */
export function init(history: any[][], period: any, seasonality?: string, cycles?: any): any[][] {
  return callHost("INIT", [history, period, seasonality, cycles]);
}

/**
 * One Holt-Winters update: new level, new trend, new index, the forecast made for this period, and its error.
 * @customfunction STEP
 * @param level Level after the period before (or the start level).
 * @param trend Trend after the period before (or the start trend; 0 for none).
 * @param index Seasonal index of the same season, one season back.
 * @param actual This period's actual; blank skips the update.
 * @param alpha Smoothing constant for the level, 0 to 1.
 * @param beta Smoothing constant for the trend, 0 to 1.
 * @param gamma Smoothing constant for the seasonal indices, 0 to 1.
 * @param seasonality multiplicative (default) or additive.
 * @param phi Trend damping, 0 to 1 (default 1, no damping).
 */
export function step(level: any, trend: any, index: any, actual: any, alpha: any, beta: any, gamma: any, seasonality?: string, phi?: any): any[][] {
  return callHost("STEP", [level, trend, index, actual, alpha, beta, gamma, seasonality, phi]);
}

/**
 * Forecasts for the next periods from a state: level, trend and the last p seasonal indices.
 * @customfunction PROJECT
 * @param level Level at the last period.
 * @param trend Trend at the last period (0 for none).
 * @param indices The last p seasonal indices, oldest first.
 * @param horizon How many periods ahead to forecast (1 to 1000).
 * @param seasonality multiplicative (default) or additive.
 * @param phi Trend damping, 0 to 1 (default 1, no damping).
 */
export function project(level: any, trend: any, indices: any[][], horizon: number, seasonality?: string, phi?: any): any[][] {
  return callHost("PROJECT", [level, trend, indices, horizon, seasonality, phi]);
}

/**
 * Fitted model of each series: seasonality and trend used, alpha, beta, gamma, phi, sum of squared errors, RMSE and AICc (one column per series).
 * @customfunction FIT
 * @param history Actuals, oldest first: a column (or row), or a block with one product per column. Blank cells are missing; trailing blanks are ignored.
 * @param period Season length, for example 12 for monthly data with a yearly pattern; 0 or blank detects it.
 * @param seasonality multiplicative (default), additive, or auto (the better of the two by AICc).
 * @param trend linear (default), damped, none, or auto (the best by AICc).
 * @param start How the start state is found: decomposition (default), classic, or optimized.
 */
export function fit(history: any[][], period: any, seasonality?: string, trend?: string, start?: string): any[][] {
  return callHost("FIT", [history, period, seasonality, trend, start]);
}

/**
 * Level, trend, seasonal index, one-step forecast and error for every period (five columns per series; blank in the start window).
 * @customfunction STATES
 * @param history Actuals, oldest first: a column (or row), or a block with one product per column. Blank cells are missing; trailing blanks are ignored.
 * @param period Season length, for example 12 for monthly data with a yearly pattern; 0 or blank detects it.
 * @param alpha Smoothing constant for the level, 0 to 1; blank fits it.
 * @param beta Smoothing constant for the trend, 0 to 1; blank fits it.
 * @param gamma Smoothing constant for the seasonal indices, 0 to 1; blank fits it.
 * @param seasonality multiplicative (default), additive, or auto (the better of the two by AICc).
 * @param trend linear (default), damped, none, or auto (the best by AICc).
 * @param phi Trend damping, 0 to 1 (typing it asks for a damped trend); blank fits it when the trend is damped.
 * @param start How the start state is found: decomposition (default), classic, or optimized.
 */
export function states(history: any[][], period: any, alpha?: any, beta?: any, gamma?: any, seasonality?: string, trend?: string, phi?: any, start?: string): any[][] {
  return callHost("STATES", [history, period, alpha, beta, gamma, seasonality, trend, phi, start]);
}

/**
 * One-step forecasts aligned with the history (blank in the start window), one column per series.
 * @customfunction FITTED
 * @param history Actuals, oldest first: a column (or row), or a block with one product per column. Blank cells are missing; trailing blanks are ignored.
 * @param period Season length, for example 12 for monthly data with a yearly pattern; 0 or blank detects it.
 * @param alpha Smoothing constant for the level, 0 to 1; blank fits it.
 * @param beta Smoothing constant for the trend, 0 to 1; blank fits it.
 * @param gamma Smoothing constant for the seasonal indices, 0 to 1; blank fits it.
 * @param seasonality multiplicative (default), additive, or auto (the better of the two by AICc).
 * @param trend linear (default), damped, none, or auto (the best by AICc).
 * @param phi Trend damping, 0 to 1 (typing it asks for a damped trend); blank fits it when the trend is damped.
 * @param start How the start state is found: decomposition (default), classic, or optimized.
 */
export function fitted(history: any[][], period: any, alpha?: any, beta?: any, gamma?: any, seasonality?: string, trend?: string, phi?: any, start?: string): any[][] {
  return callHost("FITTED", [history, period, alpha, beta, gamma, seasonality, trend, phi, start]);
}

/**
 * Forecasts for the next periods after the history, one column per series.
 * @customfunction AHEAD
 * @param history Actuals, oldest first: a column (or row), or a block with one product per column. Blank cells are missing; trailing blanks are ignored.
 * @param period Season length, for example 12 for monthly data with a yearly pattern; 0 or blank detects it.
 * @param horizon How many periods ahead to forecast (1 to 1000).
 * @param seasonality multiplicative (default), additive, or auto (the better of the two by AICc).
 * @param trend linear (default), damped, none, or auto (the best by AICc).
 * @param alpha Smoothing constant for the level, 0 to 1; blank fits it.
 * @param beta Smoothing constant for the trend, 0 to 1; blank fits it.
 * @param gamma Smoothing constant for the seasonal indices, 0 to 1; blank fits it.
 * @param phi Trend damping, 0 to 1 (typing it asks for a damped trend); blank fits it when the trend is damped.
 */
export function ahead(history: any[][], period: any, horizon: number, seasonality?: string, trend?: string, alpha?: any, beta?: any, gamma?: any, phi?: any): any[][] {
  return callHost("AHEAD", [history, period, horizon, seasonality, trend, alpha, beta, gamma, phi]);
}

/**
 * Prediction interval for the next periods: low and high, two columns per series.
 * @customfunction BAND
 * @param history Actuals, oldest first: a column (or row), or a block with one product per column. Blank cells are missing; trailing blanks are ignored.
 * @param period Season length, for example 12 for monthly data with a yearly pattern; 0 or blank detects it.
 * @param horizon How many periods ahead to forecast (1 to 1000).
 * @param coverage Share of future actuals the interval should hold, for example 0.95 (default).
 * @param seasonality multiplicative (default), additive, or auto (the better of the two by AICc).
 * @param trend linear (default), damped, none, or auto (the best by AICc).
 */
export function band(history: any[][], period: any, horizon: number, coverage?: any, seasonality?: string, trend?: string): any[][] {
  return callHost("BAND", [history, period, horizon, coverage, seasonality, trend]);
}

/**
 * Rolling-origin test: per step ahead, MAD, MAPE, MASE and the number of origins scored (four columns per series).
 * @customfunction BACKTEST
 * @param history Actuals, oldest first: a column (or row), or a block with one product per column. Blank cells are missing; trailing blanks are ignored.
 * @param period Season length, for example 12 for monthly data with a yearly pattern; 0 or blank detects it.
 * @param horizon How many periods ahead to forecast (1 to 1000).
 * @param origins How many forecast origins to refit from, ending horizon periods before the last actual (default 12).
 * @param seasonality multiplicative (default), additive, or auto (the better of the two by AICc).
 * @param trend linear (default), damped, none, or auto (the best by AICc).
 */
export function backtest(history: any[][], period: any, horizon: number, origins?: any, seasonality?: string, trend?: string): any[][] {
  return callHost("BACKTEST", [history, period, horizon, origins, seasonality, trend]);
}

/**
 * Mean absolute deviation of the forecast errors (error = actual - forecast).
 * @customfunction MAD
 * @param actual Actuals, oldest first (a column or a row). Blank cells are skipped.
 * @param forecast Forecasts for the same periods, the same size as actual. Blank cells are skipped.
 */
export function mad(actual: any[][], forecast: any[][]): number {
  return callHost("MAD", [actual, forecast]);
}

/**
 * Mean squared forecast error.
 * @customfunction MSE
 * @param actual Actuals, oldest first (a column or a row). Blank cells are skipped.
 * @param forecast Forecasts for the same periods, the same size as actual. Blank cells are skipped.
 */
export function mse(actual: any[][], forecast: any[][]): number {
  return callHost("MSE", [actual, forecast]);
}

/**
 * Root mean squared forecast error.
 * @customfunction RMSE
 * @param actual Actuals, oldest first (a column or a row). Blank cells are skipped.
 * @param forecast Forecasts for the same periods, the same size as actual. Blank cells are skipped.
 */
export function rmse(actual: any[][], forecast: any[][]): number {
  return callHost("RMSE", [actual, forecast]);
}

/**
 * Mean absolute percentage error, in percent.
 * @customfunction MAPE
 * @param actual Actuals, oldest first (a column or a row). Blank cells are skipped.
 * @param forecast Forecasts for the same periods, the same size as actual. Blank cells are skipped.
 */
export function mape(actual: any[][], forecast: any[][]): number {
  return callHost("MAPE", [actual, forecast]);
}

/**
 * Symmetric mean absolute percentage error (M3 competition form), in percent.
 * @customfunction SMAPE
 * @param actual Actuals, oldest first (a column or a row). Blank cells are skipped.
 * @param forecast Forecasts for the same periods, the same size as actual. Blank cells are skipped.
 */
export function smape(actual: any[][], forecast: any[][]): number {
  return callHost("SMAPE", [actual, forecast]);
}

/**
 * Mean forecast error (actual - forecast); positive means forecasts ran low.
 * @customfunction BIAS
 * @param actual Actuals, oldest first (a column or a row). Blank cells are skipped.
 * @param forecast Forecasts for the same periods, the same size as actual. Blank cells are skipped.
 */
export function bias(actual: any[][], forecast: any[][]): number {
  return callHost("BIAS", [actual, forecast]);
}

/**
 * Theil's U2: below 1 the forecasts beat the no-change forecast.
 * @customfunction THEILU
 * @param actual Actuals, oldest first (a column or a row). Blank cells are skipped.
 * @param forecast Forecasts for the same periods, the same size as actual. Blank cells are skipped.
 */
export function theilu(actual: any[][], forecast: any[][]): number {
  return callHost("THEILU", [actual, forecast]);
}

/**
 * Mean absolute scaled error: MAD divided by the in-sample MAD of the seasonal naive forecast on the history.
 * @customfunction MASE
 * @param actual Actuals, oldest first (a column or a row). Blank cells are skipped.
 * @param forecast Forecasts for the same periods, the same size as actual. Blank cells are skipped.
 * @param history In-sample history the forecasts were made from, oldest first.
 * @param period Season length, for example 12 for monthly data with a yearly pattern; 0 or blank detects it.
 */
export function mase(actual: any[][], forecast: any[][], history: any[][], period: any): number {
  return callHost("MASE", [actual, forecast, history, period]);
}

/**
 * Tracking signal per period: the sum of the last 6 errors over their expected spread (sqrt(pi/2) x the MAD of the errors before them, x sqrt(6)); beyond +/-2.2 the forecasts have leaned one way (about 3% false alarms on an unbiased forecast). Blank until 6 errors precede the window.
 * @customfunction TRACKING
 * @param actual Actuals, oldest first (a column or a row). Blank cells are skipped.
 * @param forecast Forecasts for the same periods, the same size as actual. Blank cells are skipped.
 * @param form window (default, limit +/-2.2) or running: the running sum of all errors over the running MAD (limit +/-4), which grows with time and alarms on most long series.
 */
export function tracking(actual: any[][], forecast: any[][], form?: string): any[][] {
  return callHost("TRACKING", [actual, forecast, form]);
}

/**
 * Table of accuracy measures: measure name and value (MASE too when a history is given).
 * @customfunction ACCURACY
 * @param actual Actuals, oldest first (a column or a row). Blank cells are skipped.
 * @param forecast Forecasts for the same periods, the same size as actual. Blank cells are skipped.
 * @param history Optional in-sample history, for MASE.
 * @param period Season length for MASE; 0 or blank detects it.
 */
export function accuracy(actual: any[][], forecast: any[][], history?: any[][], period?: any): any[][] {
  return callHost("ACCURACY", [actual, forecast, history, period]);
}

/**
 * Review list, one row per series: status ("too short", "forecast too low", "forecast too high", "worse than seasonal naive" or "ok"), tracking signal, bias over the last 6 periods as % of their mean, MASE of the last season forecast from the history before it, and how many of the last 6 actuals fell outside the one-step 95% band.
 * @customfunction WATCH
 * @param history Actuals, oldest first: a column (or row), or a block with one product per column. Blank cells are missing; trailing blanks are ignored.
 * @param period Season length, for example 12 for monthly data with a yearly pattern; 0 or blank detects it.
 * @param options Model settings as plain words in any order: multiplicative or additive; linear, damped or none; decomposition, classic or optimized; "auto" chooses seasonality and trend. Blank: multiplicative linear, as in EBB.AHEAD.
 */
export function watch(history: any[][], period: any, options?: string): any[][] {
  return callHost("WATCH", [history, period, options]);
}

/**
 * Forecast value added (Gilliland): the measure for the seasonal naive forecast, the model forecast and the adjusted forecast (rows), and the value added over the step before and over seasonal naive (positive: the step made the forecast better).
 * @customfunction FVA
 * @param actual Actuals, oldest first (a column or a row). Blank cells are skipped.
 * @param model_forecast The model's forecasts for the same periods, the same size as actual.
 * @param adjusted_forecast The forecasts after the planner's adjustments, the same size as actual.
 * @param measure MAD (default), MAPE, MASE or bias.
 * @param period Season length of the seasonal naive forecast, for example 12; 1 for the plain naive; 0 or blank detects it.
 */
export function fva(actual: any[][], model_forecast: any[][], adjusted_forecast: any[][], measure?: string, period?: any): any[][] {
  return callHost("FVA", [actual, model_forecast, adjusted_forecast, measure, period]);
}

/**
 * The history with each non-blank correction used in place of its actual (same size as the history); nest it in any function that takes a history. The actuals stay as typed.
 * @customfunction CORRECTED
 * @param history Actuals, oldest first: a column (or row), or a block with one product per column. Blank cells are missing; trailing blanks are ignored.
 * @param corrections Corrected values beside the actuals, the same size as history: a number replaces the actual in its row, a blank keeps the actual.
 */
export function corrected(history: any[][], corrections: any[][]): any[][] {
  return callHost("CORRECTED", [history, corrections]);
}

/**
 * Periods whose one-step error is unusually large for the automatic model: a flag ("high" or "low") and a suggested replacement (the one-step forecast), two columns per series. It suggests; it never changes the history.
 * @customfunction UNUSUAL
 * @param history Actuals, oldest first: a column (or row), or a block with one product per column. Blank cells are missing; trailing blanks are ignored.
 * @param period Season length, for example 12 for monthly data with a yearly pattern; 0 or blank detects it.
 * @param threshold How many robust standard deviations (1.4826 x the median absolute deviation of the one-step errors) count as unusual; default 4.
 */
export function unusual(history: any[][], period: any, threshold?: any): any[][] {
  return callHost("UNUSUAL", [history, period, threshold]);
}

/**
 * Safety stock from the model's own error growth, per series: demand forecast over the lead time (plus review period), the standard deviation of its error, the safety stock and the reorder point (four rows, one column per series). Review stock levels against supplier terms, shelf life and your own policy.
 * @customfunction BUFFER
 * @param history Actuals, oldest first: a column (or row), or a block with one product per column. Blank cells are missing; trailing blanks are ignored.
 * @param period Season length, for example 12 for monthly data with a yearly pattern; 0 or blank detects it.
 * @param lead_time Periods from placing an order to receiving it, a whole number such as 3.
 * @param service_level Cycle service level: the chance of no stock-out before the order arrives, such as 0.95 (or 95).
 * @param review_period Periods between stock reviews (0 or blank: continuous review). With a review period the last row is the order-up-to level.
 * @param options Model settings as plain words in any order: multiplicative or additive; linear, damped or none; decomposition, classic or optimized; "auto" chooses seasonality and trend. Blank: multiplicative linear, as in EBB.AHEAD.
 */
export function buffer(history: any[][], period: any, lead_time: any, service_level: any, review_period?: any, options?: string): any[][] {
  return callHost("BUFFER", [history, period, lead_time, service_level, review_period, options]);
}
