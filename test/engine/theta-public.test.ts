/**
 * The Theta method on 20 public seasonal series that Ebb was not tuned on (R's datasets, forecast
 * and AER packages; test/reference/fixtures/r-public-seasonal.json, written by
 * test/reference/r/public_seasonal.R with R 4.2.2 and forecast 8.20). Each series is fitted on all
 * but its last 18 (monthly) or 8 (quarterly) values, and Ebb's holdout forecasts are compared with
 * those of `forecast::thetaf` on the same values: to 1e-4 relative, as in theta.test.ts (both fit
 * alpha and the start level by an iterative search that stops at slightly different points).
 */
import { readFileSync } from "fs";
import { join } from "path";
import { fitTheta, thetaForecast } from "../../src/engine";

interface Case {
  name: string;
  period: number;
  horizon: number;
  values: number[];
  thetaf: number[];
}

const cases = (JSON.parse(readFileSync(join(__dirname, "../reference/fixtures/r-public-seasonal.json"), "utf8")) as { cases: Case[] }).cases;

test("the fixture holds the 13 monthly and 7 quarterly series it promises", () => {
  expect(cases.filter((c) => c.period === 12)).toHaveLength(13);
  expect(cases.filter((c) => c.period === 4)).toHaveLength(7);
});

test.each(cases.map((c) => [c.name, c] as const))("%s: holdout forecasts match R's thetaf to 1e-4 relative", (_name, c) => {
  const n = c.values.length - c.horizon;
  const forecast = thetaForecast(fitTheta(Float64Array.from(c.values.slice(0, n)), c.period), c.horizon);
  expect(forecast).toHaveLength(c.thetaf.length);
  for (let h = 0; h < c.horizon; h++) expect(Math.abs(forecast[h] - c.thetaf[h]) / Math.abs(c.thetaf[h])).toBeLessThan(1e-4);
});
