/** The design's cautions, in one place: the panel shows them once, the preview's Read me repeats them. */
export const CAUTIONS =
  "Forecasts are statistical estimates from past sales. Stock-outs, promotions, price changes and one-off events " +
  "in the history distort them. Review forecasts and their ranges before committing orders, stock or budgets, and " +
  "follow your organisation's planning and approval rules.";
