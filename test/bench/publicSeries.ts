/**
 * Public seasonal series from R's datasets, forecast and AER packages
 * (test/reference/fixtures/r-public-seasonal.json, written by test/reference/r/public_seasonal.R),
 * split as the M3 series are, for checking a design on data it was not chosen on. Each carries
 * R forecast's ets and thetaf forecasts of its holdout, as references.
 */
import { readFileSync } from "fs";
import { join } from "path";
import type { Frequency, M3Series } from "./m3";

interface PublicCase {
  name: string;
  period: number;
  horizon: number;
  values: number[];
  etsModel: string;
  ets: number[];
  thetaf: number[];
}

export interface PublicSeries extends M3Series {
  /** R forecast's holdout forecasts, and the ets model it chose. */
  reference: { ets: Float64Array; thetaf: Float64Array; etsModel: string };
}

export const PUBLIC_FIXTURE = join(__dirname, "..", "reference", "fixtures", "r-public-seasonal.json");

export function publicSource(): string {
  return (JSON.parse(readFileSync(PUBLIC_FIXTURE, "utf8")) as { source: string }).source;
}

export function loadPublic(frequency: Frequency): PublicSeries[] {
  const cases = (JSON.parse(readFileSync(PUBLIC_FIXTURE, "utf8")) as { cases: PublicCase[] }).cases;
  return cases
    .filter((c) => c.period === (frequency === "monthly" ? 12 : 4))
    .map((c) => {
      const values = Float64Array.from(c.values);
      const n = values.length - c.horizon;
      return {
        id: c.name,
        category: "public",
        frequency,
        period: c.period,
        horizon: c.horizon,
        train: values.slice(0, n),
        test: values.slice(n),
        reference: { ets: Float64Array.from(c.ets), thetaf: Float64Array.from(c.thetaf), etsModel: c.etsModel },
      };
    });
}
