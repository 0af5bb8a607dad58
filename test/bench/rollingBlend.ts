/**
 * Design evaluation for item 3 of the automatic model (combination): the automatic model, its
 * members and several combinations (combinationDesigns.ts), on rolling origins over the training
 * parts (the origins of rolling.ts; Tashman 2000) and on the holdout, for M3 or (--public) for
 * public seasonal series the designs were not chosen on (publicSeries.ts).
 *
 *   npx tsx test/bench/rollingBlend.ts [--series N] [--seed S] [--public]
 *
 * Prints mean sMAPE, MASE and the share of actuals inside the 80% / 95% intervals.
 */
import { evaluateDesigns, METHODS } from "./combinationDesigns";
import { loadM3 } from "./m3";
import { loadPublic } from "./publicSeries";
import { holdoutCuts, numberArg as arg, rollingCuts, sample } from "./rollingOrigins";

const seed = arg("--seed", 20260);
const onPublic = process.argv.includes("--public");
for (const frequency of ["monthly", "quarterly"] as const) {
  const all = onPublic ? loadPublic(frequency) : loadM3(frequency);
  const series = sample(all, arg("--series", all.length), seed);
  for (const [name, cuts] of [["rolling origins", rollingCuts(series)], ["holdout", holdoutCuts(series)]] as const) {
    const tallies = evaluateDesigns(cuts);
    const skipped = tallies[0].skipped > 0 ? ` (${tallies[0].skipped} cuts left out: some method could not forecast)` : "";
    console.log(`\n${onPublic ? "public " : "M3 "}${frequency}, ${name}: ${series.length} series; sMAPE, MASE, share inside the 80% / 95% interval${skipped}`);
    tallies.forEach((t, i) => {
      const cover = t.inside.map((v) => ((100 * v) / t.steps).toFixed(1)).join(" / ");
      console.log(`  ${METHODS[i].padEnd(38)} ${(t.smape / t.n).toFixed(2).padStart(6)}  ${(t.mase / t.nMase).toFixed(3)}  ${cover}   (${t.n} forecasts)`);
    });
  }
}
