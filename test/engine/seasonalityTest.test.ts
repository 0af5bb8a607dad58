/**
 * Outside source: R 4.2.2 with the forecast package 8.20 (Debian r-cran-forecast), through the
 * committed fixture test/reference/fixtures/r-seasonality-test.json written by
 * test/reference/r/seasonality_test.R (this suite never runs R). The fixture applies the 90%
 * autocorrelation test at the seasonal lag exactly as forecast::thetaf does (the M3 Naive2
 * benchmark's test) to base R's public datasets; Ebb's autocorrelations must agree with
 * stats::acf to 1e-12 and its decision with R's on every case.
 */
import { readFileSync } from "fs";
import { join } from "path";
import { acf, fitModel, passesSeasonalityTest } from "../../src/engine";

interface Case {
  name: string;
  period: number;
  values: number[];
  acf: number[];
  stat: number | null;
  seasonal: boolean;
}
const fixture: { source: string; cases: Case[] } = JSON.parse(
  readFileSync(join(__dirname, "..", "reference", "fixtures", "r-seasonality-test.json"), "utf8"),
);

describe("seasonality test against R's forecast::thetaf (fixture)", () => {
  it("covers seasonal and non-seasonal cases", () => {
    expect(fixture.cases.filter((c) => c.seasonal).length).toBeGreaterThan(3);
    expect(fixture.cases.filter((c) => !c.seasonal).length).toBeGreaterThan(2);
  });
  for (const c of fixture.cases) {
    it(`${c.name}: ${c.seasonal ? "seasonal" : "not seasonal"}`, () => {
      const y = Float64Array.from(c.values);
      if (c.acf.length > 0) {
        const r = acf(y, c.period);
        for (let k = 1; k <= c.period; k++) expect(Math.abs(r[k] - c.acf[k - 1])).toBeLessThan(1e-12);
      }
      expect(passesSeasonalityTest(y, c.period)).toBe(c.seasonal);
    });
  }
});

describe("automatic model and the seasonality test", () => {
  it("gives a non-seasonal model to a series that fails the test (R: WWWusage as monthly)", () => {
    const c = fixture.cases.find((x) => x.name === "WWWusage as monthly")!;
    const m = fitModel(c.values, { period: 12, seasonality: "auto", trend: "auto" });
    expect(m.spec.seasonality).toBe("none");
    expect(m.shape.seasonal).toBe(false);
  });
  it("considers seasonal candidates for a series that passes it (R: USAccDeaths)", () => {
    const c = fixture.cases.find((x) => x.name === "USAccDeaths")!;
    const m = fitModel(c.values, { period: 12, seasonality: "auto", trend: "auto" });
    expect(m.spec.seasonality).not.toBe("none");
  });
  it("leaves a typed seasonality alone whatever the test says", () => {
    const c = fixture.cases.find((x) => x.name === "WWWusage as monthly")!;
    expect(fitModel(c.values, { period: 12, seasonality: "additive", trend: "damped" }).spec.seasonality).toBe("additive");
  });
});
