/** Where a search ended: the point, its value and how many evaluations it took. */
export interface Minimum {
  x: Float64Array;
  fx: number;
  evals: number;
}

export interface ProjectedBfgsOptions {
  lower: ArrayLike<number>;
  upper: ArrayLike<number>;
  maxIter: number;
  /** Stop when two successive steps each lower f by less than this relative amount. */
  fTol: number;
  /** Optional early stop, asked after every accepted step (e.g. "this basin is known"). */
  abandon?: (x: Float64Array, f: number) => boolean;
  /**
   * The objective alone, cheaper than with its gradient: the line search tries points with it
   * and asks for the gradient only at the point it accepts.
   */
  f?: (x: Float64Array) => number;
}

/** A step that moves no variable by more than this share of its range (or, unbounded, of its size) has converged. */
const X_TOL = 1e-11;

/**
 * Bounded quasi-Newton minimisation with exact gradients: BFGS on the variables that are
 * not held at a bound, with a projected backtracking (Armijo) line search (Bertsekas 1982,
 * "Projected Newton methods for optimization problems with simple constraints", SIAM J.
 * Control Optim. 20(2); BFGS update as in Nocedal & Wright 2006, ch. 6). A variable whose
 * gradient pushes it against its bound is held there, so corner optima are reached exactly.
 * The line search backtracks by quadratic interpolation and, given the objective alone, tries
 * points with it (the gradient is computed only where a step is accepted); a step too small to
 * move any variable ends the search. Deterministic; bounded by maxIter.
 */
export function projectedBfgs(
  fg: (x: Float64Array, g: Float64Array) => number,
  x0: ArrayLike<number>,
  o: ProjectedBfgsOptions,
): Minimum {
  const d = x0.length;
  const x = new Float64Array(d);
  for (let i = 0; i < d; i++) x[i] = Math.min(o.upper[i], Math.max(o.lower[i], x0[i]));
  const g = new Float64Array(d);
  let f = fg(x, g);
  let evals = 1;
  if (!Number.isFinite(f)) return { x, fx: Infinity, evals };
  const H = new Float64Array(d * d);
  // Start of the inverse Hessian: a multiple of the identity, so the first step follows the
  // projected steepest-descent direction (as classic bounded quasi-Newton codes do). Only the
  // variables not held at a bound set the scale, so a steep but held coordinate cannot make
  // the steps of the others vanish.
  const resetH = (): void => {
    H.fill(0);
    let gmax = 0;
    for (let i = 0; i < d; i++) if (!isHeld(i)) gmax = Math.max(gmax, Math.abs(g[i]));
    for (let i = 0; i < d; i++) H[i * d + i] = gmax > 0 ? 0.1 / gmax : 1;
  };
  // What a step is measured against: a bounded variable's range; an unbounded one's own size
  // (at least 1). Against an infinite range every step of an unbounded variable would count as
  // no move, and the search would stop while only those variables can still improve.
  const resolution = (i: number): number => {
    const range = o.upper[i] - o.lower[i];
    return Number.isFinite(range) ? range : Math.max(1, Math.abs(x[i]));
  };
  const isHeld = (i: number): boolean => (x[i] <= o.lower[i] && g[i] > 0) || (x[i] >= o.upper[i] && g[i] < 0);
  resetH();
  const dir = new Float64Array(d);
  const xn = new Float64Array(d);
  const gn = new Float64Array(d);
  const s = new Float64Array(d);
  const yv = new Float64Array(d);
  const Hy = new Float64Array(d);
  const free = new Array<boolean>(d);
  let slow = 0;
  let freshRetry = false;
  for (let iter = 0; iter < o.maxIter; iter++) {
    let anyFree = false;
    for (let i = 0; i < d; i++) {
      free[i] = !isHeld(i);
      anyFree ||= free[i] && g[i] !== 0;
    }
    if (!anyFree) break;
    let slope = 0;
    for (let i = 0; i < d; i++) {
      let v = 0;
      if (free[i]) for (let j = 0; j < d; j++) if (free[j]) v -= H[i * d + j] * g[j];
      dir[i] = v;
      slope += v * g[i];
    }
    if (!(slope < 0)) {
      // not a descent direction: fall back to scaled steepest descent on the free variables
      resetH();
      slope = 0;
      for (let i = 0; i < d; i++) {
        dir[i] = free[i] ? -H[i * d + i] * g[i] : 0;
        slope += dir[i] * g[i];
      }
    }
    let t = 1;
    let fn = Infinity;
    let accepted = false;
    for (let k = 0; k < 40; k++) {
      let decrease = 0;
      let moved = 0;
      for (let i = 0; i < d; i++) {
        xn[i] = Math.min(o.upper[i], Math.max(o.lower[i], x[i] + t * dir[i]));
        decrease += g[i] * (xn[i] - x[i]);
        moved = Math.max(moved, Math.abs(xn[i] - x[i]) / resolution(i));
      }
      // Steps below the variables' resolution cannot lower f any more: converged.
      if (moved <= X_TOL) break;
      fn = o.f ? o.f(xn) : fg(xn, gn);
      evals++;
      if (Number.isFinite(fn) && fn <= f + 1e-4 * decrease) {
        accepted = true;
        break;
      }
      // Backtrack to the minimum of the quadratic through f, the slope and fn, kept within
      // [0.1 t, 0.5 t] (Nocedal & Wright 2006, section 3.5).
      const quadratic = Number.isFinite(fn) ? (-decrease * t) / (2 * (fn - f - decrease)) : 0.1 * t;
      t = Math.min(0.5 * t, Math.max(0.1 * t, quadratic));
    }
    if (accepted && o.f) {
      fn = fg(xn, gn);
      evals++;
      accepted = Number.isFinite(fn);
    }
    if (!accepted) break;
    let sy = 0;
    let yHy = 0;
    for (let i = 0; i < d; i++) {
      s[i] = xn[i] - x[i];
      yv[i] = gn[i] - g[i];
      sy += s[i] * yv[i];
    }
    for (let i = 0; i < d; i++) {
      let v = 0;
      for (let j = 0; j < d; j++) v += H[i * d + j] * yv[j];
      Hy[i] = v;
      yHy += yv[i] * v;
    }
    if (sy > 1e-12 * Math.sqrt(yHy * sy + 1e-300)) {
      // H <- H + ((sy + yHy) / sy^2) s s' - (Hy s' + s (Hy)') / sy
      const a = (sy + yHy) / (sy * sy);
      for (let i = 0; i < d; i++) {
        for (let j = 0; j < d; j++) H[i * d + j] += a * s[i] * s[j] - (Hy[i] * s[j] + s[i] * Hy[j]) / sy;
      }
    }
    const relative = (f - fn) / Math.max(Math.abs(f), 1e-300);
    x.set(xn);
    g.set(gn);
    f = fn;
    slow = relative < o.fTol ? slow + 1 : 0;
    if (slow >= 2) {
      // Before stopping, retry once with a fresh scaled start: progress may only have been
      // slow because the curvature estimate had gone stale.
      if (freshRetry) break;
      freshRetry = true;
      slow = 0;
      resetH();
      continue;
    }
    if (relative >= o.fTol) freshRetry = false;
    if (o.abandon && o.abandon(x, f)) break;
  }
  return { x, fx: f, evals };
}
