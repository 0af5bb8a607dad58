/** Test helper: run the real batch command as a child process, the way a user runs it. */
import { spawnSync } from "child_process";
import { mkdtempSync, writeFileSync } from "fs";
import { tmpdir } from "os";
import { join, resolve } from "path";

export const REPO = resolve(__dirname, "..", "..");
const TSX = join(REPO, "node_modules", ".bin", "tsx");

export interface EbbRun {
  status: number | null;
  stdout: string;
  stderr: string;
}

/** `tsx src/cli/main.ts <args>` from the repository root, with optional standard input. */
export function runEbb(args: string[], input?: string, env: Record<string, string> = {}): EbbRun {
  return spawnCommand(TSX, [join(REPO, "src", "cli", "main.ts"), ...args], REPO, input, env);
}

export function spawnCommand(command: string, args: string[], cwd: string, input?: string, env: Record<string, string> = {}): EbbRun {
  const r = spawnSync(command, args, { cwd, input, encoding: "utf8", env: { ...process.env, FORCE_COLOR: "0", ...env }, timeout: 120000, maxBuffer: 256 * 1024 * 1024 });
  if (r.error) throw r.error;
  return { status: r.status, stdout: r.stdout, stderr: r.stderr };
}

/** A fresh temporary folder for this suite's CSV files. */
export function tempDir(): string {
  return mkdtempSync(join(tmpdir(), "ebb-cli-"));
}

/** Write CSV text: first row the names, then one row per period; null is a blank cell. */
export function writeCsv(dir: string, file: string, names: string[], columns: (number | string | null)[][]): string {
  const rows = Math.max(...columns.map((c) => c.length));
  const lines = [names.join(",")];
  for (let i = 0; i < rows; i++) lines.push(columns.map((c) => (c[i] === null || c[i] === undefined ? "" : String(c[i]))).join(","));
  const path = join(dir, file);
  writeFileSync(path, lines.join("\n") + "\n", "utf8");
  return path;
}
