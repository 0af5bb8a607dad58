/**
 * Worker threads change nothing but the speed: the same file run on the main thread only
 * (--workers 1) and on three worker threads gives the same text, byte for byte, series in file
 * order. The file is invented: 90 seasonal series (period 12) of different lengths, one failing.
 */
import { rmSync, writeFileSync } from "fs";
import { join } from "path";
import { progressReporter } from "../../src/cli/progress";
import { seriesPerBatch } from "../../src/cli/run/workerPool";
import { runEbb, tempDir } from "./runEbb";

let dir: string;
let file: string;
beforeAll(() => {
  dir = tempDir();
  const names = Array.from({ length: 90 }, (_, k) => (k === 40 ? "too short" : `item ${k + 1}`));
  const lines = ["month," + names.join(",")];
  for (let t = 0; t < 60; t++) {
    const month = `${2020 + Math.floor(t / 12)}-${String((t % 12) + 1).padStart(2, "0")}`;
    // Series k stops after 36 + k % 24 months; "too short" has 5 values.
    const cells = names.map((_, k) => (t < (k === 40 ? 5 : 36 + (k % 24)) ? (50 + k + 20 * Math.sin((2 * Math.PI * (t + k)) / 12) + ((t * 7 + k * 3) % 5)).toFixed(1) : ""));
    lines.push(`${month},${cells.join(",")}`);
  }
  file = join(dir, "items.csv");
  writeFileSync(file, lines.join("\n") + "\n");
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe("worker threads", () => {
  it.each([
    ["fit", "json"],
    ["ahead", "csv"],
    ["states", "csv"],
  ])("%s --format %s gives the same output with and without workers", (command, format) => {
    const args = [command, file, "--period", "12", "--format", format, "--coverage", "0.9"].filter((a, i, all) => command === "ahead" || (a !== "--coverage" && all[i - 1] !== "--coverage"));
    const one = runEbb([...args, "--workers", "1"]);
    const three = runEbb([...args, "--workers", "3"]);
    expect(one.status).toBe(2); // "too short" fails, the rest run
    expect(three.status).toBe(2);
    expect(three.stdout).toBe(one.stdout);
    expect(three.stderr).toBe(one.stderr);
    if (format === "json") {
      const names = JSON.parse(one.stdout).series.map((s: { name: string }) => s.name);
      expect(names).toHaveLength(90);
      expect(names[40]).toBe("too short");
      expect(names[89]).toBe("item 90");
    }
  });

  it("sends batches of about 20,000 cells, at least eight per worker", () => {
    expect(seriesPerBatch(120, 100000, 2)).toBe(167);
    expect(seriesPerBatch(440, 5000, 2)).toBe(45);
    expect(seriesPerBatch(100000, 10, 2)).toBe(1);
    // This suite's file: 90 series on 3 workers go in 23 batches of 4 (the last of 2).
    expect(seriesPerBatch(60, 90, 3)).toBe(4);
  });
});

describe("progress", () => {
  it("shows the rate and the time left once half a second has been measured", () => {
    const lines: string[] = [];
    const stream = { isTTY: false, write: (s: string) => lines.push(s) } as unknown as NodeJS.WriteStream;
    let now = 0;
    const tick = progressReporter(1000, true, stream, () => now);
    tick(1);
    now = 2000; // 2 s for 50 series: 25 series/s, 950 left: 38 s
    tick(50);
    now = 40000;
    tick(1000);
    expect(lines).toEqual([
      "fitting series 1 of 1000\n",
      "fitting series 50 of 1000, 25 series/s, about 38 s left\n",
      "fitting series 1000 of 1000, 25 series/s, done in 40 s\n",
    ]);
  });
});
