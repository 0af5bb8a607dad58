/**
 * The reference implementations, run by the bench on the same training parts in the same
 * run: base R's stats::HoltWinters (via /usr/bin/Rscript) and statsmodels'
 * ExponentialSmoothing (via Debian's /usr/bin/python3). Each times its own fits; the bench
 * scores their forecasts with the same code as Ebb's.
 */
import { spawnSync } from "child_process";
import { existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from "fs";
import { tmpdir } from "os";
import { join } from "path";
import type { M3Series } from "./m3";

export interface ReferenceFit {
  id: string;
  seasonality: "multiplicative" | "additive";
  seconds: number;
  /** NaN when the fit failed. */
  sse: number;
  alpha: number;
  beta: number;
  gamma: number;
  /** The program's warning (or error message when the fit failed), "" when none. */
  warning: string;
  forecast?: Float64Array;
  low80?: Float64Array;
  high80?: Float64Array;
  low95?: Float64Array;
  high95?: Float64Array;
}

export interface ReferenceRun {
  name: string;
  version: string;
  fits: ReferenceFit[];
  /** Set when the program could not be run at all. */
  skipped?: string;
}

export const RSCRIPT = process.env.RSCRIPT ?? "/usr/bin/Rscript";
export const PYTHON = process.env.PYTHON ?? "/usr/bin/python3";

const numbers = (field: string | undefined): Float64Array | undefined =>
  field && field.trim() !== "" ? Float64Array.from(field.trim().split(" ").map(Number)) : undefined;

function parseOutput(text: string): { version: string; fits: ReferenceFit[] } {
  let version = "";
  const fits: ReferenceFit[] = [];
  for (const line of text.split("\n")) {
    if (line.startsWith("#version,")) version = line.slice("#version,".length);
    else if (line.trim() !== "") {
      const f = line.split(",");
      fits.push({
        id: f[0],
        seasonality: f[1] as ReferenceFit["seasonality"],
        seconds: Number(f[2]),
        sse: f[3] === "NA" ? NaN : Number(f[3]),
        alpha: Number(f[4]),
        beta: Number(f[5]),
        gamma: Number(f[6]),
        warning: f[7] ?? "",
        forecast: numbers(f[8]),
        low80: numbers(f[9]),
        high80: numbers(f[10]),
        low95: numbers(f[11]),
        high95: numbers(f[12]),
      });
    }
  }
  return { version, fits };
}

/** Run one reference program on the series; never throws (a missing program gives `skipped`). */
function runProgram(name: string, program: string, script: string, input: string, dir: string, args: string[] = []): ReferenceRun {
  if (!existsSync(program)) return { name, version: "", fits: [], skipped: `${program} not found` };
  const output = join(dir, `${name.replace(/\W+/g, "-")}.csv`);
  const run = spawnSync(program, [...args, join(__dirname, "references", script), input, output], {
    stdio: ["ignore", "ignore", "inherit"],
    // One thread each, like Ebb: the comparison is per fit on one core.
    env: { ...process.env, OMP_NUM_THREADS: "1", OPENBLAS_NUM_THREADS: "1", MKL_NUM_THREADS: "1" },
  });
  if (run.error || run.status !== 0 || !existsSync(output)) {
    return { name, version: "", fits: [], skipped: `${program} ${script} failed (${run.error?.message ?? `exit ${run.status}`})` };
  }
  return { name, ...parseOutput(readFileSync(output, "utf8")) };
}

export function runReferences(series: M3Series[]): ReferenceRun[] {
  const dir = mkdtempSync(join(tmpdir(), "ebb-bench-ref-"));
  try {
    const input = join(dir, "series.csv");
    // Only the training parts leave the bench: the references never see the held-out values.
    writeFileSync(input, series.map((s) => `${s.id},${s.period},${s.horizon},${Array.from(s.train, String).join(" ")}`).join("\n") + "\n");
    return [
      runProgram("base R HoltWinters", RSCRIPT, "holtwinters_bench.R", input, dir, ["--vanilla"]),
      runProgram("statsmodels ExponentialSmoothing", PYTHON, "statsmodels_bench.py", input, dir),
    ];
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}
