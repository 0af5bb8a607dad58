import { existsSync, realpathSync, statSync } from "fs";
import { dirname, resolve } from "path";
import { CliError } from "../cliError";

/**
 * Nothing the user has is lost: --out may never name the input file, names an existing file
 * only with --force, and must be in a folder that exists. Checked before any work is done.
 */
export function checkOutPath(out: string, input: string | undefined, force: boolean): void {
  if (out.trim() === "") throw new CliError("--out: give a file name.");
  const target = resolve(out);
  if (input !== undefined && input !== "-" && existsSync(input) && existsSync(target) && sameFile(input, target)) {
    throw new CliError(`--out "${out}" is the input file: writing there would replace your data. Choose another file name.`);
  }
  const folder = dirname(target);
  if (!existsSync(folder)) throw new CliError(`Cannot write "${out}": the folder ${folder} does not exist. Create it first, or choose another place.`);
  if (!statSync(folder).isDirectory()) throw new CliError(`Cannot write "${out}": ${folder} is not a folder.`);
  if (existsSync(target)) {
    if (statSync(target).isDirectory()) throw new CliError(`Cannot write "${out}": it is a folder. Give a file name.`);
    if (!force) throw new CliError(`"${out}" already exists. Give --force to replace it, or choose another file name.`);
  }
}

function sameFile(a: string, b: string): boolean {
  try {
    const sa = statSync(realpathSync(a));
    const sb = statSync(realpathSync(b));
    return sa.dev === sb.dev && sa.ino === sb.ino;
  } catch {
    return false;
  }
}

/** A write failure as one line: which file, and what went wrong in plain words. */
export function writeFailure(e: unknown, target: string): CliError {
  const code = (e as NodeJS.ErrnoException)?.code;
  const reasons: Record<string, string> = {
    ENOSPC: "the disk is full (ENOSPC); free some space and run again",
    EDQUOT: "the disk quota is used up (EDQUOT); free some space and run again",
    EACCES: "permission denied (EACCES); choose a folder you may write to",
    EPERM: "permission denied (EPERM); choose a folder you may write to",
    EROFS: "the file system is read-only (EROFS); choose another place",
    ENOENT: "the folder does not exist (ENOENT); create it first, or choose another place",
    EISDIR: "it is a folder (EISDIR); give a file name",
    EPIPE: "the reading program closed the pipe (EPIPE)",
  };
  const reason = (code && reasons[code]) ?? (e instanceof Error ? e.message.split("\n")[0] : String(e));
  return new CliError(`Cannot write ${target}: ${reason}.`);
}
