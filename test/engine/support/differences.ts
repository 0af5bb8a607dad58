/**
 * Comparison helpers for the outside-source suites: each comparison records the worst
 * relative difference seen and lists every value outside the tolerance, so a failure names
 * the dataset, the quantity, the position, Ebb's value and the reference value.
 */

/** |actual - expected| / max(|expected|, floor); Infinity when actual is not a finite number. */
export function relativeDifference(actual: number, expected: number, floor: number): number {
  if (!Number.isFinite(actual)) return Infinity;
  return Math.abs(actual - expected) / Math.max(Math.abs(expected), floor, Number.MIN_VALUE);
}

/** Collects mismatches and the largest relative difference across many comparisons. */
export class DifferenceLog {
  readonly mismatches: string[] = [];
  largest = 0;
  largestAt = "(none)";

  constructor(readonly tolerance: number) {}

  /** Compare one value; `floor` keeps quantities that cross zero from blowing up the ratio. */
  value(label: string, actual: number, expected: number, floor = 0): void {
    const d = relativeDifference(actual, expected, floor);
    if (d > this.largest) {
      this.largest = d;
      this.largestAt = label;
    }
    if (!(d <= this.tolerance)) this.mismatches.push(`${label}: Ebb ${actual}, reference ${expected} (relative ${d.toExponential(2)})`);
  }

  /** Take over another log's worst case (for a summary across many tests). */
  absorb(other: DifferenceLog): void {
    if (other.largest > this.largest) {
      this.largest = other.largest;
      this.largestAt = other.largestAt;
    }
  }

  /** Compare `expected[j]` with `actualAt(j)` for every j. */
  series(label: string, expected: ArrayLike<number>, actualAt: (j: number) => number, floor = 0): void {
    for (let j = 0; j < expected.length; j++) this.value(`${label}[${j}]`, actualAt(j), expected[j], floor);
  }
}

/** Mean absolute value of the finite entries: the scale of a series, used as a floor near zero. */
export function meanAbs(values: ArrayLike<number>): number {
  let s = 0;
  let c = 0;
  for (let i = 0; i < values.length; i++) {
    if (Number.isFinite(values[i])) {
      s += Math.abs(values[i]);
      c++;
    }
  }
  return c > 0 ? s / c : 1;
}
