/**
 * Nelder-Mead downhill simplex (Nelder & Mead 1965, The Computer Journal 7(4)) with box
 * bounds handled by projecting every trial point onto the box, so an optimum on a bound
 * (a smoothing constant of 0 or 1) is reached exactly. Deterministic; bounded by maxEvals.
 */
export interface NelderMeadOptions {
  /** Initial simplex step per coordinate. */
  step: ArrayLike<number>;
  lower: ArrayLike<number>;
  upper: ArrayLike<number>;
  maxEvals: number;
  /** Stop when the simplex's function values agree to this relative spread... */
  fTol: number;
  /** ...and its vertices lie within this distance of the best one. */
  xTol: number;
}

export interface Minimum {
  x: Float64Array;
  fx: number;
  evals: number;
}

export function nelderMead(f: (x: Float64Array) => number, x0: ArrayLike<number>, o: NelderMeadOptions): Minimum {
  const d = x0.length;
  const clamp = (x: Float64Array): Float64Array => {
    for (let i = 0; i < d; i++) x[i] = Math.min(o.upper[i], Math.max(o.lower[i], x[i]));
    return x;
  };
  const pts: Float64Array[] = [];
  const vals: number[] = [];
  let evals = 0;
  const evalAt = (x: Float64Array): number => {
    evals++;
    const v = f(x);
    return Number.isNaN(v) ? Infinity : v;
  };
  const first = clamp(Float64Array.from(x0));
  pts.push(first);
  vals.push(evalAt(first));
  for (let i = 0; i < d; i++) {
    const x = Float64Array.from(first);
    // step away from the nearer bound so the simplex is never degenerate at a bound
    const room = o.upper[i] - x[i] >= x[i] - o.lower[i] ? 1 : -1;
    x[i] += room * o.step[i];
    clamp(x);
    pts.push(x);
    vals.push(evalAt(x));
  }
  const order = new Array<number>(d + 1);
  const centroid = new Float64Array(d);
  const trial = (from: Float64Array, coef: number): Float64Array => {
    const x = new Float64Array(d);
    for (let i = 0; i < d; i++) x[i] = centroid[i] + coef * (from[i] - centroid[i]);
    return clamp(x);
  };
  while (evals < o.maxEvals) {
    for (let i = 0; i <= d; i++) order[i] = i;
    order.sort((a, b) => vals[a] - vals[b] || a - b);
    const best = order[0];
    const worst = order[d];
    const second = order[d - 1];
    // convergence: function spread and simplex size both small
    const fSpread = Math.abs(vals[worst] - vals[best]);
    let size = 0;
    for (let k = 1; k <= d; k++) {
      for (let i = 0; i < d; i++) size = Math.max(size, Math.abs(pts[order[k]][i] - pts[best][i]));
    }
    if (fSpread <= o.fTol * (Math.abs(vals[best]) + 1e-300) && size <= o.xTol) break;
    if (size === 0) break;
    centroid.fill(0);
    for (let k = 0; k < d; k++) for (let i = 0; i < d; i++) centroid[i] += pts[order[k]][i] / d;
    const xr = trial(pts[worst], -1);
    const fr = evalAt(xr);
    if (fr < vals[best]) {
      const xe = trial(pts[worst], -2);
      const fe = evalAt(xe);
      if (fe < fr) {
        pts[worst] = xe;
        vals[worst] = fe;
      } else {
        pts[worst] = xr;
        vals[worst] = fr;
      }
    } else if (fr < vals[second]) {
      pts[worst] = xr;
      vals[worst] = fr;
    } else {
      const outside = fr < vals[worst];
      const xc = trial(outside ? xr : pts[worst], 0.5);
      const fc = evalAt(xc);
      if (fc < Math.min(fr, vals[worst])) {
        pts[worst] = xc;
        vals[worst] = fc;
      } else {
        for (let k = 1; k <= d; k++) {
          const j = order[k];
          for (let i = 0; i < d; i++) pts[j][i] = pts[best][i] + 0.5 * (pts[j][i] - pts[best][i]);
          vals[j] = evalAt(pts[j]);
        }
      }
    }
  }
  let bi = 0;
  for (let k = 1; k <= d; k++) if (vals[k] < vals[bi]) bi = k;
  return { x: pts[bi], fx: vals[bi], evals };
}
