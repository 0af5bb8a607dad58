/** The invented events in the demo data, apart from the generator so the preview page can read them (no Node modules). */

/** A month whose recorded sales were distorted: sales = normal demand x factor. */
export interface DemoEvent {
  product: string;
  month: string;
  factor: number;
  kind: "promotion" | "stock-out";
  /** What the planner types as the reason beside the correction. */
  reason: string;
}

/**
 * The invented distortions in the demo: a spring promotion and a summer stock-out of hose reels.
 * The promoted month sold well above normal demand (and pulled the March index up for the next
 * year); in the stock-out month only part of the demand could be served.
 */
export const DEMO_EVENTS: readonly DemoEvent[] = [
  {
    product: "Hose reels (units)",
    month: "2024-03",
    factor: 1.8,
    kind: "promotion",
    reason: "Spring promotion: 20% off hose reels for the whole month (invented)",
  },
  {
    product: "Hose reels (units)",
    month: "2025-06",
    factor: 0.45,
    kind: "stock-out",
    reason: "Stock-out: supplier delivery three weeks late, orders turned away (invented)",
  },
];
