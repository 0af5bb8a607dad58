/**
 * Seeded pseudo-random numbers for the simulated prediction intervals, so the same inputs
 * always give the same digits. mulberry32 (a public-domain 32-bit generator) feeds a
 * Box-Muller transform for standard normal draws.
 */
/** mulberry32 with its state in view, so a stream can be copied and continued. */
export class Mulberry32 {
  constructor(public state: number) {
    this.state = state >>> 0;
  }
  /** A uniform draw in [0, 1). */
  next(): number {
    this.state = (this.state + 0x6d2b79f5) >>> 0;
    let t = this.state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  }
}

/** Uniform draws in [0, 1) from mulberry32. */
export function seededUniform(seed: number): () => number {
  const g = new Mulberry32(seed);
  return () => g.next();
}

export function seededNormal(seed: number): () => number {
  const uniform = seededUniform(seed);
  let spare = NaN;
  return () => {
    if (!Number.isNaN(spare)) {
      const s = spare;
      spare = NaN;
      return s;
    }
    let u = uniform();
    while (u === 0) u = uniform();
    const v = uniform();
    const r = Math.sqrt(-2 * Math.log(u));
    spare = r * Math.sin(2 * Math.PI * v);
    return r * Math.cos(2 * Math.PI * v);
  };
}
