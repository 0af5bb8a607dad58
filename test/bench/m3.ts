/** The M3 competition series (test/data/m3) split by the competition's protocol. */
import { readFileSync } from "fs";
import { join } from "path";

export type Frequency = "monthly" | "quarterly";

export interface M3Series {
  id: string;
  category: string;
  frequency: Frequency;
  period: number;
  horizon: number;
  /** The first n - horizon values: what every method is fitted on. */
  train: Float64Array;
  /** The last `horizon` values: what every method is scored against. */
  test: Float64Array;
}

export const DATA_DIR = join(__dirname, "..", "data", "m3");

/** Read one M3 file (one series a line, values space-separated; see test/data/m3/README.md). */
export function loadM3(frequency: Frequency): M3Series[] {
  const text = readFileSync(join(DATA_DIR, `m3-${frequency}.csv`), "utf8");
  const lines = text.split(/\r?\n/).filter((l) => l.trim() !== "");
  const header = lines[0].split(",");
  const col = (name: string) => {
    const i = header.indexOf(name);
    if (i < 0) throw new Error(`m3-${frequency}.csv has no column "${name}"`);
    return i;
  };
  const [iId, iCat, iPeriod, iHorizon, iN, iValues] = ["series", "category", "period", "horizon", "n", "values"].map(col);
  return lines.slice(1).map((line) => {
    const f = line.split(",");
    const values = Float64Array.from(f[iValues].trim().split(/\s+/).map(Number));
    const n = Number(f[iN]);
    const horizon = Number(f[iHorizon]);
    if (values.length !== n || values.some((v) => !Number.isFinite(v))) {
      throw new Error(`m3-${frequency}.csv: series ${f[iId]} does not hold ${n} numbers`);
    }
    return {
      id: f[iId],
      category: f[iCat],
      frequency,
      period: Number(f[iPeriod]),
      horizon,
      train: values.slice(0, n - horizon),
      test: values.slice(n - horizon),
    };
  });
}

/** `count` series spread evenly over the file (deterministic, so quick runs are comparable). */
export function evenSample<T>(all: T[], count: number): T[] {
  if (count >= all.length) return all;
  const out: T[] = [];
  for (let i = 0; i < count; i++) out.push(all[Math.floor((i * all.length) / count)]);
  return out;
}

/** Horizon bands the results are reported by (1-based steps, inclusive). */
export function bandsFor(frequency: Frequency): { label: string; from: number; to: number }[] {
  return frequency === "monthly"
    ? [
        { label: "1-18", from: 1, to: 18 },
        { label: "1-6", from: 1, to: 6 },
        { label: "7-12", from: 7, to: 12 },
        { label: "13-18", from: 13, to: 18 },
      ]
    : [
        { label: "1-8", from: 1, to: 8 },
        { label: "1-4", from: 1, to: 4 },
        { label: "5-8", from: 5, to: 8 },
      ];
}
