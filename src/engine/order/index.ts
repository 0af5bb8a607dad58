/** From forecast to order: planner corrections, unusual-period suggestions, safety stock. */
export { applyCorrections, correctedCount, type CorrectedHistory } from "./corrected";
export { unusualPeriods, checkThreshold, UNUSUAL_THRESHOLD, MAD_TO_SD, type UnusualPeriods } from "./unusual";
export { leadTimeDemand, LEAD_TIME_PATHS, type LeadTimeDemand } from "./leadTime";
export { stockBuffer, checkServiceLevel, checkWholePeriods, type BufferSettings, type StockBuffer } from "./buffer";
