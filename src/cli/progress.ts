/** Series count above which progress is shown on a terminal without being asked for. */
export const PROGRESS_THRESHOLD = 20;

/**
 * "fitting series k of N" on standard error (never standard output, which carries the results).
 * On a terminal the line is rewritten in place; otherwise (with --progress) about twenty lines
 * are written in all, so a log file stays short.
 */
export function progressReporter(total: number, asked: boolean, stream: NodeJS.WriteStream = process.stderr): (k: number) => void {
  const tty = stream.isTTY === true;
  if (!asked && !(tty && total > PROGRESS_THRESHOLD)) return () => {};
  const step = Math.max(1, Math.ceil(total / 20));
  return (k: number) => {
    const text = `fitting series ${k} of ${total}`;
    if (tty) stream.write(`\r${text}${k === total ? "\n" : ""}`);
    else if (k === 1 || k === total || k % step === 0) stream.write(`${text}\n`);
  };
}
