/**
 * Runs R's forecast package on the whole M3 bench set and caches its outputs, so the next
 * `npm run bench -- --references` reads them (npx tsx test/bench/fillForecastCache.ts).
 */
import { loadM3 } from "./m3";
import { runForecastPackage } from "./references";

const run = runForecastPackage([...loadM3("monthly"), ...loadM3("quarterly")]);
console.error(run.skipped ? `skipped: ${run.skipped}` : run.cached ? `already cached (${run.cached})` : `ran and cached ${run.fits.length} fits (${run.version})`);
