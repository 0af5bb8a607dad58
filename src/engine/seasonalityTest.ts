import { seasonalityTest90 } from "./acf";
import { countPresent } from "./series";

/**
 * Whether the automatic model considers seasonal candidates at all for season length p.
 *
 * The 90% autocorrelation test at the seasonal lag ({@link seasonalityTest90}): the test of the
 * M3 competition's Naive2 benchmark (Makridakis & Hibon 2000), also used by the M4
 * competition's published benchmarks and by the Theta method as R's forecast package
 * implements it (forecast::thetaf, after Hyndman & Billah 2003). As in forecast::thetaf the
 * test needs more than two full seasons of values (n > 2p); with fewer there is not enough
 * history to tell a season from noise, and the series is treated as not seasonal.
 * Leading and trailing blanks do not count toward n.
 */
export function passesSeasonalityTest(y: Float64Array, p: number): boolean {
  if (!(p >= 2)) return false;
  let first = 0;
  let last = y.length - 1;
  while (first <= last && Number.isNaN(y[first])) first++;
  while (last >= first && Number.isNaN(y[last])) last--;
  const span = y.subarray(first, last + 1);
  if (countPresent(span) <= 2 * p) return false;
  return seasonalityTest90(span, p);
}
