/** The design's cautions, in one place: the panel shows them once, the preview's Read me repeats them. */
export const CAUTIONS =
  "Forecasts are statistical estimates from past sales. Stock-outs, promotions, price changes and one-off events " +
  "in the history distort them. Review forecasts and their ranges before committing orders, stock or budgets, and " +
  "follow your organisation's planning and approval rules.";

/** Shown wherever Ebb turns a forecast into a stock level (EBB.BUFFER, the batch command's buffer, the panel). */
export const STOCK_CAUTION =
  "Safety stock and reorder points are statistical estimates from the forecast and its past errors. Review every " +
  "stock level against supplier terms (minimum order quantities, delivery reliability), shelf life and your " +
  "organisation's own stock policy before placing orders.";
