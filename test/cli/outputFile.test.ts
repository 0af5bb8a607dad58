/**
 * Write failures as one line each, in process. The full disk and the missing folder are also
 * run for real in plannerFiles.test.ts; permission denied cannot be made to happen there when the
 * tests run as root, so its wording is checked here on the error Node raises (code EACCES).
 */
import { writeFailure } from "../../src/cli/output/outputFile";

const nodeError = (code: string, message: string) => Object.assign(new Error(message), { code });

describe("writeFailure", () => {
  it.each([
    ["EACCES", /^Cannot write "out\.json": permission denied \(EACCES\); choose a folder you may write to\.$/],
    ["ENOSPC", /^Cannot write "out\.json": the disk is full \(ENOSPC\); free some space and run again\.$/],
    ["ENOENT", /^Cannot write "out\.json": the folder does not exist \(ENOENT\); create it first, or choose another place\.$/],
    ["EROFS", /^Cannot write "out\.json": the file system is read-only \(EROFS\)/],
  ])("%s", (code, message) => {
    const e = writeFailure(nodeError(code, `${code}: something, open 'out.json'\n    at stack line`), '"out.json"');
    expect(e.message).toMatch(message);
    expect(e.message).not.toContain("\n");
  });

  it("keeps the first line of an unknown failure only", () => {
    expect(writeFailure(nodeError("EIO", "EIO: i/o error, write\n    at x"), "standard output").message).toBe("Cannot write standard output: EIO: i/o error, write.");
  });
});
