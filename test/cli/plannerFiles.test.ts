import ExcelJS from "exceljs";
/**
 * The batch command on the files planners actually have: the committed invented files in
 * test/cli/fixtures (semicolons, decimal commas, labels, duplicate names, a bad cell), and
 * what must never be lost (the input, an existing file) or crash (a full disk, a huge result).
 * Expected numbers come from the engine run on the same figures read by hand from the file
 * (the check is that the reading changes no digit); labels from calendar arithmetic.
 */
import { copyFileSync, existsSync, readFileSync, rmSync, statSync, writeFileSync } from "fs";
import { join } from "path";
import { fitModel, predictionInterval } from "../../src/engine";
import { REPO, runEbb, tempDir } from "./runEbb";

const FIXTURES = join(REPO, "test", "cli", "fixtures");
const fixture = (name: string) => join(FIXTURES, name);

/** The figures of plain-comma-point.csv, read by hand (split on commas; decimal points). */
function plainColumns(): { months: string[]; trays: number[]; fleece: number[] } {
  const lines = readFileSync(fixture("plain-comma-point.csv"), "utf8").trim().split("\n").slice(1);
  const cells = lines.map((l) => l.split(","));
  return { months: cells.map((c) => c[0]), trays: cells.map((c) => Number(c[1])), fleece: cells.map((c) => Number(c[2])) };
}

let dir: string;
beforeAll(() => (dir = tempDir()));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe("separators, decimal marks and labels", () => {
  it("reads semicolons with decimal commas and yyyymm labels as the same figures as the comma file", () => {
    const eu = runEbb(["fit", fixture("eu-semicolon-decimal-comma.csv"), "--period", "12"]);
    const plain = runEbb(["fit", fixture("plain-comma-point.csv"), "--period", "12"]);
    expect(eu.status).toBe(0);
    expect(plain.status).toBe(0);
    expect(JSON.parse(eu.stdout)).toEqual(JSON.parse(plain.stdout));
    const { trays } = plainColumns();
    const m = fitModel(trays, { period: 12, seasonality: "multiplicative", trend: "linear", start: "decomposition" });
    expect(JSON.parse(eu.stdout).series[0]).toMatchObject({ name: "Seed trays", alpha: m.constants.alpha, sse: m.sse });
    // The period numbers are labels, said once on standard error; no series is named "period".
    expect(JSON.parse(eu.stdout).series.map((s: { name: string }) => s.name)).toEqual(["Seed trays", "Garden fleece"]);
    expect(eu.stderr).toMatch(/first column "period" holds period labels \(202101, 202102, \.\.\.\)/);
  });

  it("takes --delimiter and --decimal, and names them when the file is read wrongly", () => {
    const given = runEbb(["fit", fixture("eu-semicolon-decimal-comma.csv"), "--period", "12", "--delimiter", ";", "--decimal", ","]);
    expect(given.status).toBe(0);
    const wrong = runEbb(["fit", fixture("eu-semicolon-decimal-comma.csv"), "--period", "12", "--delimiter", ","]);
    expect(wrong.status).toBe(1);
    expect(wrong.stderr).toMatch(/The names row holds ";": give --delimiter ;/);
    const point = runEbb(["fit", fixture("eu-semicolon-decimal-comma.csv"), "--period", "12", "--decimal", "."]);
    expect(point.status).toBe(1);
    expect(point.stderr).toMatch(/Cell B2 of .*: "429,2" is not a number .* If the file writes decimals with ",", give --decimal ,/);
  });

  it("carries the labels into states and the next months into ahead", () => {
    const { months } = plainColumns();
    const states = runEbb(["states", fixture("eu-semicolon-decimal-comma.csv"), "--period", "12", "--format", "csv"]);
    expect(states.status).toBe(0);
    const lines = states.stdout.trim().split("\n");
    expect(lines[0]).toBe("series,t,label,actual,level,trend,index,forecast,error,message");
    expect(lines[1]).toMatch(/^Seed trays,1,202101,429\.2,/);
    expect(lines[48]).toMatch(/^Seed trays,48,202412,/);
    const ahead = JSON.parse(runEbb(["ahead", fixture("plain-comma-point.csv"), "--period", "12", "--horizon", "14"]).stdout);
    expect(months[months.length - 1]).toBe("2024-12");
    expect(ahead.series[0].ahead.map((r: { label: string }) => r.label)).toEqual([
      ...["01", "02", "03", "04", "05", "06", "07", "08", "09", "10", "11", "12"].map((m) => `2025-${m}`),
      "2026-01",
      "2026-02",
    ]);
    const eu = JSON.parse(runEbb(["ahead", fixture("eu-semicolon-decimal-comma.csv"), "--period", "12", "--horizon", "2"]).stdout);
    expect(eu.series[1].ahead.map((r: { label: string }) => r.label)).toEqual(["202501", "202502"]);
  });

  it("reads a tab-separated file of quarters, warns on the duplicate name, and guards formula-like names in CSV", () => {
    const r = runEbb(["ahead", fixture("quarters-duplicates-formulas.tsv"), "--period", "4", "--horizon", "2", "--format", "csv"]);
    expect(r.status).toBe(0);
    expect(r.stderr).toMatch(/warning: columns B, C are all named "Hose reels"/);
    const lines = r.stdout.trim().split("\n");
    expect(lines[0]).toBe("series,h,label,forecast,low,high,message");
    expect(lines.slice(1).map((l) => l.split(",").slice(0, 3).join(","))).toEqual([
      "Hose reels,1,2025-Q1",
      "Hose reels,2,2025-Q2",
      "Hose reels,1,2025-Q1",
      "Hose reels,2,2025-Q2",
      // A spreadsheet opening the file would run =SUM(...) as a formula: it is written as text.
      "'=SUM(A1:A9),1,2025-Q1",
      "'=SUM(A1:A9),2,2025-Q2",
    ]);
    // The guard is for CSV text only: JSON keeps the name as typed.
    const json = JSON.parse(runEbb(["fit", fixture("quarters-duplicates-formulas.tsv"), "--period", "4"]).stdout);
    expect(json.series[2].name).toBe("=SUM(A1:A9)");
  });

  it("never changes a negative number in CSV output", () => {
    const file = join(dir, "negative.csv");
    writeFileSync(file, "month,-North,@South\n" + Array.from({ length: 30 }, (_, i) => `2020-${i},${-5 - (i % 4)},${(i % 4) - 2}`).join("\n") + "\n");
    const r = runEbb(["states", file, "--period", "4", "--seasonality", "additive", "--format", "csv", "--labels", "none"]);
    const rows = r.stdout.trim().split("\n").slice(1);
    expect(rows.some((l) => l.startsWith("'-North,1,-5,"))).toBe(true);
    expect(rows.some((l) => l.startsWith("'@South,1,-2,"))).toBe(true);
  });

  it("stops with a clear message on a file with the names row only", () => {
    const r = runEbb(["fit", fixture("header-only.csv")]);
    expect(r.status).toBe(1);
    expect(r.stdout).toBe("");
    expect(r.stderr).toMatch(/header-only\.csv has the names row only, no periods: add one row per period/);
  });

  it("forecasts the good series of a file with one bad cell, names the cell, and exits with status 2", () => {
    const r = runEbb(["ahead", fixture("bad-cell.csv"), "--period", "12", "--horizon", "3", "--coverage", "95"]);
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/series "Garden fleece" failed: Cell C7 of .*bad-cell\.csv \(series "Garden fleece", line 7, column 3\): "see note" is not a number/);
    expect(r.stderr).toMatch(/1 of 2 series failed; the other 1 were written \(exit status 2\)/);
    const [trays, fleece] = JSON.parse(r.stdout).series;
    const m = fitModel(plainColumns().trays, { period: 12, seasonality: "multiplicative", trend: "linear", start: "decomposition" });
    // --coverage 95 is read as 95%, the same as 0.95.
    const band = predictionInterval(m, 3, 0.95);
    expect(trays.ahead.map((a: { high: number }) => a.high)).toEqual(Array.from(band.high));
    expect(Object.keys(fleece)).toEqual(["name", "error"]);
  });
});

describe("nothing lost", () => {
  it("refuses to write over the input file, even with --force", () => {
    const input = join(dir, "mine.csv");
    copyFileSync(fixture("plain-comma-point.csv"), input);
    const before = readFileSync(input, "utf8");
    for (const extra of [[], ["--force"]]) {
      const r = runEbb(["fit", input, "--out", input, ...extra]);
      expect(r.status).toBe(1);
      expect(r.stderr).toMatch(/is the input file: writing there would replace your data/);
    }
    expect(readFileSync(input, "utf8")).toBe(before);
  });

  it("refuses to replace an existing file without --force, and replaces it with --force", () => {
    const out = join(dir, "result.json");
    writeFileSync(out, "keep me\n");
    const r = runEbb(["fit", fixture("plain-comma-point.csv"), "--period", "12", "--out", out]);
    expect(r.status).toBe(1);
    expect(r.stderr).toMatch(/result\.json" already exists. Give --force to replace it/);
    expect(readFileSync(out, "utf8")).toBe("keep me\n");
    const forced = runEbb(["fit", fixture("plain-comma-point.csv"), "--period", "12", "--out", out, "--force"]);
    expect(forced.status).toBe(0);
    expect(JSON.parse(readFileSync(out, "utf8")).series).toHaveLength(2);
  });

  it("refuses to replace an existing workbook without --force", () => {
    const out = join(dir, "mine.xlsx");
    writeFileSync(out, "a workbook\n");
    const r = runEbb(["ledger", fixture("plain-comma-point.csv"), "--period", "12", "--out", out]);
    expect(r.status).toBe(1);
    expect(r.stderr).toMatch(/mine\.xlsx" already exists. Give --force/);
    expect(readFileSync(out, "utf8")).toBe("a workbook\n");
  });

  it("turns write failures into one line: a full disk, a missing folder", () => {
    const full = runEbb(["fit", fixture("plain-comma-point.csv"), "--period", "12", "--out", "/dev/full", "--force"]);
    expect(full.status).toBe(1);
    expect(full.stderr.trim().split("\n").pop()).toBe('ebb: Cannot write "/dev/full": the disk is full (ENOSPC); free some space and run again.');
    expect(full.stderr).not.toMatch(/\n\s+at /);
    const missing = runEbb(["fit", fixture("plain-comma-point.csv"), "--out", join(dir, "no such folder", "x.json")]);
    expect(missing.status).toBe(1);
    expect(missing.stderr.trim()).toMatch(/^ebb: Cannot write .*x\.json": the folder .*no such folder does not exist/);
  });

  it("writes a states result far larger than the memory it may use, as a stream", () => {
    // 300 series x 440 months with fixed constants (nothing to fit): about 35 MB of JSON,
    // written with 64 MB of JavaScript heap. Building it as one string needs several times that.
    const rows = 440;
    const names = Array.from({ length: 300 }, (_, k) => `item ${k + 1}`);
    const lines = [names.join(",")];
    for (let t = 0; t < rows; t++) lines.push(names.map((_, k) => (100 + k + 30 * Math.sin((2 * Math.PI * t) / 12) + t / 10).toFixed(1)).join(","));
    const file = join(dir, "tall.csv");
    writeFileSync(file, lines.join("\n") + "\n");
    const out = join(dir, "tall.json");
    const r = runEbb(["states", file, "--period", "12", "--alpha", "0.3", "--beta", "0.1", "--gamma", "0.2", "--out", out, "--workers", "1"], undefined, {
      NODE_OPTIONS: "--max-old-space-size=64",
    });
    expect(r.stderr).toBe("");
    expect(r.status).toBe(0);
    expect(statSync(out).size).toBeGreaterThan(30e6);
    const tail = readFileSync(out, "utf8").slice(-200);
    expect(tail).toMatch(/"error": [-0-9.e]+\n\s+\}\n\s+\]\n\s+\}\n\s+\]\n\}\n$/);
    expect(existsSync(out)).toBe(true);
  });
});

describe("ledger", () => {
  it("warns about each series left out, keeps the labels on the Data sheet and formats the chart data", async () => {
    const out = join(dir, "bad-cell.xlsx");
    const r = runEbb(["ledger", fixture("bad-cell.csv"), "--period", "12", "--out", out]);
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/warning: series "Garden fleece" has no ledger: Cell C7 of/);
    expect(r.stdout).toMatch(/Wrote .*bad-cell\.xlsx: 1 ledger of 2 series; 1 left out/);
    const workbook = new ExcelJS.Workbook();
    await workbook.xlsx.readFile(out);
    const data = workbook.getWorksheet("Data")!;
    expect([data.getCell("A1").value, data.getCell("A2").value, data.getCell("B1").value, data.getCell("B2").value]).toEqual(["month", "2021-01", "Seed trays", 429.2]);
    const ledger = workbook.worksheets[1];
    // The chart-data block's numbers carry the ledger's formats, not every digit.
    const formats = new Set<string>();
    ledger.eachRow((row) => row.eachCell((cell) => {
      const v = cell.value as { formula?: string } | null;
      if (v && typeof v === "object" && v.formula && /^[A-Z]+\d+$/.test(v.formula) && cell.numFmt) formats.add(cell.numFmt);
    }));
    expect(formats.has("#,##0.00")).toBe(true);
  });
});

describe("demo help", () => {
  it("shows the demo's own defaults in its option list", () => {
    const r = runEbb(["demo", "--help"]);
    expect(r.status).toBe(0);
    expect(r.stdout).toMatch(/--seasonality <word>\s+multiplicative \| additive \| auto \(default: auto\)/);
    expect(r.stdout).toMatch(/--trend <word>\s+linear \| damped \| none \| auto\s+\(default: auto\)/);
    expect(r.stdout).not.toMatch(/default: multiplicative|default: linear/);
  });
});
