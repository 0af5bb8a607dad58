/**
 * Starts the preview exactly as `npm start` does (PORT=0: any free port) and waits for the URL
 * it prints; stops the whole process group afterwards.
 */
import { spawn, type ChildProcess } from "child_process";
import { resolve } from "path";

export const REPO = resolve(__dirname, "../../..");

export interface PreviewServer {
  url: string;
  stop(): Promise<void>;
}

export function startPreviewServer(): Promise<PreviewServer> {
  const child: ChildProcess = spawn("npm", ["start", "--silent"], {
    cwd: REPO,
    env: { ...process.env, PORT: "0" },
    detached: true,
    stdio: ["ignore", "pipe", "pipe"],
  });
  let output = "";
  const stop = (): Promise<void> =>
    new Promise((done) => {
      if (child.exitCode !== null || child.pid === undefined) return done();
      child.once("exit", () => done());
      try {
        process.kill(-child.pid, "SIGTERM");
      } catch {
        done();
      }
    });
  return new Promise((resolvePromise, reject) => {
    const onData = (chunk: Buffer): void => {
      output += chunk.toString();
      const m = /Ebb preview ready: (http:\/\/localhost:\d+\/)/.exec(output);
      if (m) resolvePromise({ url: m[1], stop });
    };
    child.stdout?.on("data", onData);
    child.stderr?.on("data", (chunk: Buffer) => (output += chunk.toString()));
    child.once("exit", (code) => reject(new Error(`npm start stopped (exit ${code}) before printing its URL:\n${output}`)));
    child.once("error", (e) => reject(e));
  });
}
