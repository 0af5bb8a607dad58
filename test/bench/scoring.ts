/**
 * Accuracy bookkeeping with the M3 protocol: per method and frequency, the mean over series of
 * each series' sMAPE and MASE over a horizon band (Makridakis & Hibon 2000; MASE per Hyndman &
 * Koehler 2006, scaled by the training part's in-sample seasonal naive MAE). The measures are
 * the engine's.
 */
import { maseScale, smape } from "../../src/engine";
import { bandsFor, type Frequency, type M3Series } from "./m3";

export interface BandScore {
  band: string;
  smape: number;
  mase: number;
  series: number;
}

interface Sums {
  smape: number;
  mase: number;
  smapeCount: number;
  maseCount: number;
}

export class Scoreboard {
  private sums = new Map<string, Sums[]>();
  private scales = new WeakMap<M3Series, number>();
  /** Series where a method gave no forecast and the seasonal naive forecast stood in. */
  readonly standIns = new Map<string, number>();

  add(method: string, s: M3Series, forecast: Float64Array): void {
    const key = `${method}|${s.frequency}`;
    const bands = bandsFor(s.frequency);
    let sums = this.sums.get(key);
    if (!sums) {
      sums = bands.map(() => ({ smape: 0, mase: 0, smapeCount: 0, maseCount: 0 }));
      this.sums.set(key, sums);
    }
    const scale = this.scaleOf(s);
    bands.forEach((b, i) => {
      const a = s.test.subarray(b.from - 1, b.to);
      const f = forecast.subarray(b.from - 1, b.to);
      sums![i].smape += smape(a, f);
      sums![i].smapeCount++;
      if (scale > 0) {
        let abs = 0;
        for (let k = 0; k < a.length; k++) abs += Math.abs(a[k] - f[k]);
        sums![i].mase += abs / a.length / scale;
        sums![i].maseCount++;
      }
    });
  }

  noteStandIn(method: string): void {
    this.standIns.set(method, (this.standIns.get(method) ?? 0) + 1);
  }

  scores(method: string, frequency: Frequency): BandScore[] | undefined {
    const sums = this.sums.get(`${method}|${frequency}`);
    if (!sums) return undefined;
    return bandsFor(frequency).map((b, i) => ({
      band: b.label,
      smape: sums[i].smape / sums[i].smapeCount,
      mase: sums[i].mase / sums[i].maseCount,
      series: sums[i].smapeCount,
    }));
  }

  private scaleOf(s: M3Series): number {
    let q = this.scales.get(s);
    if (q === undefined) {
      try {
        q = maseScale(s.train, s.period);
      } catch {
        q = NaN; // a flat training part has no MASE scale: the series is left out of MASE only
      }
      this.scales.set(s, q);
    }
    return q;
  }
}

/** Share of holdout actuals inside prediction intervals, per method, frequency, coverage and band. */
export class CoverageTally {
  private counts = new Map<string, { inside: number; total: number }>();

  add(method: string, s: M3Series, coverage: number, low: ArrayLike<number>, high: ArrayLike<number>): void {
    for (const b of bandsFor(s.frequency)) {
      const key = `${method}|${s.frequency}|${coverage}|${b.label}`;
      const c = this.counts.get(key) ?? { inside: 0, total: 0 };
      for (let h = b.from; h <= b.to; h++) {
        const a = s.test[h - 1];
        c.total++;
        if (a >= low[h - 1] && a <= high[h - 1]) c.inside++;
      }
      this.counts.set(key, c);
    }
  }

  /** Share inside over every series and step of both frequencies (each frequency's full horizon). */
  combined(method: string, coverage: number): number | undefined {
    let inside = 0;
    let total = 0;
    for (const frequency of ["monthly", "quarterly"] as const) {
      const c = this.counts.get(`${method}|${frequency}|${coverage}|${bandsFor(frequency)[0].label}`);
      if (c) {
        inside += c.inside;
        total += c.total;
      }
    }
    return total > 0 ? inside / total : undefined;
  }

  /** Share inside (0..1), or undefined when nothing was tallied. */
  share(method: string, frequency: Frequency, coverage: number, band: string): number | undefined {
    const c = this.counts.get(`${method}|${frequency}|${coverage}|${band}`);
    return c && c.total > 0 ? c.inside / c.total : undefined;
  }
}
