/**
 * Public seasonal series from R's datasets, forecast and AER packages
 * (test/reference/fixtures/r-public-seasonal.json, written by test/reference/r/public_seasonal.R),
 * split as the M3 series are, for checking a design on data it was not chosen on.
 */
import { readFileSync } from "fs";
import { join } from "path";
import type { Frequency, M3Series } from "./m3";

interface PublicCase {
  name: string;
  period: number;
  horizon: number;
  values: number[];
}

export function loadPublic(frequency: Frequency): M3Series[] {
  const file = join(__dirname, "..", "reference", "fixtures", "r-public-seasonal.json");
  const cases = (JSON.parse(readFileSync(file, "utf8")) as { cases: PublicCase[] }).cases;
  return cases
    .filter((c) => c.period === (frequency === "monthly" ? 12 : 4))
    .map((c) => {
      const values = Float64Array.from(c.values);
      const n = values.length - c.horizon;
      return { id: c.name, category: "public", frequency, period: c.period, horizon: c.horizon, train: values.slice(0, n), test: values.slice(n) };
    });
}
