/** What the bench ran on, for the results header. */
import { spawnSync } from "child_process";
import { cpus, release, totalmem, type } from "os";

export interface Machine {
  cpu: string;
  cores: number;
  memoryGb: number;
  os: string;
  node: string;
  compiler?: string;
}

export function describeMachine(): Machine {
  const list = cpus();
  const cc = spawnSync("cc", ["--version"], { encoding: "utf8" });
  return {
    cpu: list[0]?.model.trim() ?? "unknown",
    cores: list.length,
    memoryGb: totalmem() / 2 ** 30,
    os: `${type()} ${release()}`,
    node: process.version,
    compiler: cc.status === 0 ? cc.stdout.split("\n")[0].trim() : undefined,
  };
}

/** The commit measured, and whether the engine had uncommitted changes (read-only git queries). */
export function describeCode(): string {
  const git = (args: string[]) => spawnSync("git", args, { encoding: "utf8", cwd: __dirname });
  const head = git(["rev-parse", "--short", "HEAD"]);
  if (head.status !== 0) return "not a git checkout";
  const dirty = git(["status", "--porcelain", "--", "../../src/engine"]).stdout.trim();
  return `commit ${head.stdout.trim()}${dirty ? ", with uncommitted changes in src/engine" : ""}`;
}
