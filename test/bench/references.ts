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
import { cacheKey, readCached, writeCached } from "./referenceCache";

export interface ReferenceFit {
  id: string;
  /** The model run: a seasonality for the Holt-Winters references, "ets" or "theta" for R's forecast package. */
  seasonality: "multiplicative" | "additive" | "ets" | "theta";
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
  /** Set when the outputs came from the cache (the file read). */
  cached?: string;
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

/** Only the training parts leave the bench: the references never see the held-out values. */
export function referenceInput(series: M3Series[]): string {
  return series.map((s) => `${s.id},${s.period},${s.horizon},${Array.from(s.train, String).join(" ")}`).join("\n") + "\n";
}

/** R and the forecast package's versions, or undefined when either is missing. */
function forecastPackageVersion(): string | undefined {
  if (!existsSync(RSCRIPT)) return undefined;
  const r = spawnSync(RSCRIPT, ["--vanilla", "-e", 'cat(R.version.string, "; forecast ", as.character(packageVersion("forecast")), sep = "")'], {
    encoding: "utf8",
  });
  return r.status === 0 && r.stdout.includes("forecast") ? r.stdout.trim() : undefined;
}

const FORECAST_NAME = "R forecast";
const FORECAST_SCRIPT = "forecast_bench.R";

/**
 * R's forecast package (ets and thetaf), from the cache when the same script has run on the
 * same series with the same versions; otherwise run (about 20 minutes on M3) and cached.
 */
export function runForecastPackage(series: M3Series[]): ReferenceRun {
  const version = forecastPackageVersion();
  if (!version) return { name: FORECAST_NAME, version: "", fits: [], skipped: `R's forecast package not found (${RSCRIPT}; Debian r-cran-forecast)` };
  const text = referenceInput(series);
  const key = cacheKey(FORECAST_SCRIPT, text, version);
  const hit = readCached(FORECAST_NAME, key);
  if (hit !== undefined) return { name: FORECAST_NAME, ...parseOutput(hit), cached: key };
  const dir = mkdtempSync(join(tmpdir(), "ebb-bench-ref-"));
  try {
    const input = join(dir, "series.csv");
    writeFileSync(input, text);
    const run = runProgram(FORECAST_NAME, RSCRIPT, FORECAST_SCRIPT, input, dir, ["--vanilla"]);
    if (!run.skipped) writeCached(FORECAST_NAME, key, readFileSync(join(dir, `${FORECAST_NAME.replace(/\W+/g, "-")}.csv`), "utf8"));
    return run;
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

export function runReferences(series: M3Series[]): ReferenceRun[] {
  const dir = mkdtempSync(join(tmpdir(), "ebb-bench-ref-"));
  try {
    const input = join(dir, "series.csv");
    writeFileSync(input, referenceInput(series));
    return [
      runProgram("base R HoltWinters", RSCRIPT, "holtwinters_bench.R", input, dir, ["--vanilla"]),
      runProgram("statsmodels ExponentialSmoothing", PYTHON, "statsmodels_bench.py", input, dir),
    ];
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}
