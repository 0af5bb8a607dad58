import { createReadStream } from "fs";
import { parse as parseStream } from "csv-parse";
import { parse as parseSync } from "csv-parse/sync";
import { CliError } from "../cliError";
import { detectDialect, type Dialect } from "./dialect";
import { TableBuilder, type LabelChoice, type SeriesTable } from "./seriesTable";

/** How to read the file: a separator and decimal mark given on the command line, and the label column. */
export interface ReadOptions extends LabelChoice {
  delimiter?: string;
  decimal?: "." | ",";
}

/** Bytes looked at to tell the separator and the decimal mark. */
const SAMPLE_BYTES = 64 * 1024;

function csvOptions(dialect: Dialect) {
  return { delimiter: dialect.delimiter, info: true, bom: true, trim: true, relax_column_count: true, skip_empty_lines: false } as const;
}

type InfoRecord = { record: string[]; info: { lines: number } };

/** Feeds records to the builder with the line each starts on (a quoted cell may span lines). */
function recordSink(builder: TableBuilder): (r: InfoRecord) => void {
  let lastLine = 0;
  return (r) => {
    builder.add(r.record, lastLine + 1);
    lastLine = r.info.lines;
  };
}

function unreadable(source: string, e: unknown): never {
  if (e instanceof CliError) throw e;
  throw new CliError(`${source} is not readable as CSV: ${(e as Error).message}`);
}

/** Parse CSV text held in memory (tests, the demo file). */
export function parseSeriesText(text: string, source = "the input", options: ReadOptions = {}): SeriesTable {
  const dialect = detectDialect(text.slice(0, SAMPLE_BYTES), text.length <= SAMPLE_BYTES, source, options);
  const builder = new TableBuilder(source, dialect, options);
  let records: InfoRecord[];
  try {
    records = parseSync(text, csvOptions(dialect)) as unknown as InfoRecord[];
  } catch (e) {
    unreadable(source, e);
  }
  records.forEach(recordSink(builder));
  return builder.finish();
}

/**
 * Read a CSV file (or standard input for "-") as it streams in: the first 64 KB decide the
 * dialect, then every record goes straight into the number table, so memory holds the cells as
 * numbers (8 bytes each) and never the file's text.
 */
export async function readSeriesTable(file: string, options: ReadOptions = {}): Promise<SeriesTable> {
  const source = file === "-" ? "standard input" : file;
  if (file === "-" && process.stdin.isTTY) process.stderr.write("ebb: reading CSV from standard input; end it with Ctrl-D.\n");
  const input = file === "-" ? process.stdin : createReadStream(file);
  let builder: TableBuilder | undefined;
  let parser: ReturnType<typeof parseStream> | undefined;
  let sample = "";
  const decoder = new TextDecoder("utf-8");
  const done = new Promise<SeriesTable>((resolve, reject) => {
    const fail = (e: unknown) => {
      input.destroy();
      reject(readFailure(e, file, source));
    };
    const start = (complete: boolean) => {
      try {
        const dialect = detectDialect(sample, complete, source, options);
        builder = new TableBuilder(source, dialect, options);
        const sink = recordSink(builder);
        parser = parseStream(csvOptions(dialect));
        parser.on("readable", () => {
          let r: InfoRecord | null;
          try {
            while ((r = parser!.read() as InfoRecord | null) !== null) sink(r);
          } catch (e) {
            fail(e);
          }
        });
        parser.on("error", fail);
        parser.on("end", () => {
          try {
            resolve(builder!.finish());
          } catch (e) {
            reject(e);
          }
        });
        parser.write(sample);
      } catch (e) {
        fail(e);
      }
    };
    input.on("data", (chunk: Buffer | string) => {
      const text = typeof chunk === "string" ? chunk : decoder.decode(chunk, { stream: true });
      if (parser) {
        if (!parser.write(text)) {
          input.pause();
          parser.once("drain", () => input.resume());
        }
        return;
      }
      sample += text;
      if (sample.length >= SAMPLE_BYTES) start(false);
    });
    input.on("end", () => {
      if (!parser) start(true);
      parser?.end(decoder.decode());
    });
    input.on("error", fail);
  });
  return done;
}

function readFailure(e: unknown, file: string, source: string): Error {
  if (e instanceof CliError) return e;
  const code = (e as NodeJS.ErrnoException).code;
  const what = file === "-" ? "standard input" : `"${file}"`;
  if (code === "ENOENT") return new CliError(`Cannot find the file ${what}. Check the path, or use - to read standard input.`);
  if (code === "EISDIR") return new CliError(`${what} is a folder; give a CSV file.`);
  if (code === "EACCES" || code === "EPERM") return new CliError(`Cannot read ${what}: permission denied.`);
  if (code !== undefined) return new CliError(`Cannot read ${what}: ${(e as Error).message.split("\n")[0]}`);
  return new CliError(`${source} is not readable as CSV: ${(e as Error).message.split("\n")[0]}`);
}
