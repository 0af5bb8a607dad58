/**
 * The `optimized` start when a smoothing constant ends at its bound: the search must go on
 * moving the start state, which has no bounds. Case: R's WWWusage series (base R `datasets`,
 * read from the committed fixture test/reference/fixtures/r-theta.json) with simple
 * exponential smoothing. Its optimum has alpha = 1 (forecast::ses in R 4.2.2 stops at its own
 * bound, 0.9999). With alpha = 1 the SSE is (y_1 - l_0)^2 + sum (y_t - y_{t-1})^2, so the best
 * start level is y_1 = 88 and the SSE the sum of squared differences, 3330 (hand-computed from
 * the data).
 */
import { readFileSync } from "fs";
import { join } from "path";
import { fitOne } from "../../src/engine";

const fixture: { cases: { name: string; values: number[] }[] } = JSON.parse(
  readFileSync(join(__dirname, "..", "reference", "fixtures", "r-theta.json"), "utf8"),
);
const www = Float64Array.from(fixture.cases.find((c) => c.name.startsWith("WWWusage"))!.values);

describe("optimized start with alpha at its bound", () => {
  it("WWWusage: alpha 1, start level 88 (the first value), SSE 3330", () => {
    let differences = 0;
    for (let t = 1; t < www.length; t++) differences += (www[t] - www[t - 1]) ** 2;
    expect(differences).toBe(3330);
    const m = fitOne(www, 1, "none", "none", "optimized", 2, {});
    expect(m.constants.alpha).toBe(1);
    expect(m.start.state.level).toBeCloseTo(88, 6);
    expect(m.sse).toBeCloseTo(3330, 6);
  });
});
