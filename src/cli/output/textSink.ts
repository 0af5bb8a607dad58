import { createWriteStream, existsSync, renameSync, statSync, unlinkSync } from "fs";
import { basename, dirname, join, resolve } from "path";
import { finished } from "stream/promises";
import { writeFailure } from "./outputFile";

/**
 * Where a command's text goes, written as it is produced (a 300 MB `states` result is never one
 * string in memory). A file is written under a temporary name beside it and renamed into place
 * only when complete, so a failed run (a full disk) leaves any earlier file as it was.
 */
export interface TextSink {
  write(text: string): Promise<void>;
  /** Flush, and put a file in place. */
  close(): Promise<void>;
  /** Stop after a failure: a partial file is removed. */
  abort(): void;
}

/** Text collected before it is handed to the stream: fewer, larger writes. */
const CHUNK = 256 * 1024;

export function openSink(out: string | undefined): TextSink {
  if (out === undefined) return streamSink(process.stdout, "standard output", () => {});
  const target = resolve(out);
  const special = existsSync(target) && !statSync(target).isFile();
  if (special) return streamSink(createWriteStream(target), `"${out}"`, () => {});
  const partial = join(dirname(target), `.${basename(target)}.${process.pid}.partial`);
  const stream = createWriteStream(partial);
  const sink = streamSink(stream, `"${out}"`, () => {
    try {
      unlinkSync(partial);
    } catch {
      // already gone
    }
  });
  const close = sink.close;
  sink.close = async () => {
    await close();
    try {
      renameSync(partial, target);
    } catch (e) {
      sink.abort();
      throw writeFailure(e, `"${out}"`);
    }
  };
  return sink;
}

function streamSink(stream: NodeJS.WritableStream, what: string, cleanUp: () => void): TextSink {
  let failure: Error | undefined;
  let buffer = "";
  const isStdout = stream === process.stdout;
  const onError = (e: Error) => {
    failure = failure ?? writeFailure(e, what);
  };
  stream.on("error", onError);
  const flush = async (): Promise<void> => {
    if (failure) throw failure;
    if (buffer === "") return;
    const text = buffer;
    buffer = "";
    const ok = stream.write(text);
    if (!ok) await waitFor(stream, "drain", () => failure);
    if (failure) throw failure;
  };
  return {
    async write(text) {
      buffer += text;
      if (buffer.length >= CHUNK) await flush();
    },
    async close() {
      await flush();
      if (isStdout) {
        // Standard output stays open; wait until what was written has been handed on.
        await new Promise<void>((res) => stream.write("", () => res()));
      } else {
        stream.end();
        await finished(stream).catch(onError);
      }
      if (failure) {
        cleanUp();
        throw failure;
      }
      stream.removeListener("error", onError);
    },
    abort() {
      if (!isStdout) (stream as unknown as { destroy(): void }).destroy();
      cleanUp();
    },
  };
}

/** Resolves on the event, or as soon as a failure is recorded (the stream's error event). */
function waitFor(stream: NodeJS.WritableStream, event: string, failed: () => Error | undefined): Promise<void> {
  return new Promise((res) => {
    const done = () => {
      stream.removeListener(event, done);
      stream.removeListener("error", done);
      res();
    };
    if (failed()) return res();
    stream.once(event, done);
    stream.once("error", done);
  });
}
