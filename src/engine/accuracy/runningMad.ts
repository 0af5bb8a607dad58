/**
 * Running MAD: at each period, the mean absolute error of the errors so far (the tracking
 * signal's denominator, as the ledger's "MAD so far" column shows it). A missing error (NaN)
 * adds nothing; NaN until the first error. One pass, so long tables stay linear in time.
 * @example runningMad([1, NaN, -3]) // [1, 1, 2]
 * @example runningMad([NaN, 2]) // [NaN, 2]
 */
export function runningMad(errors: ArrayLike<number>): Float64Array {
  const out = new Float64Array(errors.length);
  let sumAbs = 0;
  let k = 0;
  for (let i = 0; i < errors.length; i++) {
    if (!Number.isNaN(errors[i])) {
      sumAbs += Math.abs(errors[i]);
      k++;
    }
    out[i] = k === 0 ? NaN : sumAbs / k;
  }
  return out;
}
