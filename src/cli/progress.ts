/** Series count above which progress is shown on a terminal without being asked for. */
export const PROGRESS_THRESHOLD = 20;

/**
 * "fitting series k of N, R series/s, about T left" on standard error (never standard output,
 * which carries the results). On a terminal the line is rewritten in place at most ten times a
 * second; otherwise (with --progress) about twenty lines are written in all, so a log stays short.
 * The rate and time left appear once half a second of work has been measured.
 */
export function progressReporter(
  total: number,
  asked: boolean,
  stream: NodeJS.WriteStream = process.stderr,
  now: () => number = () => performance.now(),
): (k: number) => void {
  const tty = stream.isTTY === true;
  if (!asked && !(tty && total > PROGRESS_THRESHOLD)) return () => {};
  const step = Math.max(1, Math.ceil(total / 20));
  const started = now();
  let shown = -Infinity;
  return (k: number) => {
    const t = now();
    const last = k === total;
    if (tty ? !last && k !== 1 && t - shown < 100 : !(k === 1 || last || k % step === 0)) return;
    shown = t;
    const text = `fitting series ${k} of ${total}${pace(k, total, (t - started) / 1000)}`;
    if (tty) stream.write(`\r${text}\x1b[K${last ? "\n" : ""}`);
    else stream.write(`${text}\n`);
  };
}

function pace(k: number, total: number, seconds: number): string {
  if (seconds < 0.5 || k < 2) return "";
  const rate = k / seconds;
  const left = (total - k) / rate;
  const rateText = rate >= 100 ? Math.round(rate).toLocaleString("en-US") : rate.toPrecision(2);
  return k === total ? `, ${rateText} series/s, done in ${duration(seconds)}` : `, ${rateText} series/s, about ${duration(left)} left`;
}

/** 42 s, 3 min 5 s, 2 h 10 min. */
export function duration(seconds: number): string {
  const s = Math.round(seconds);
  if (s < 60) return `${s} s`;
  if (s < 3600) return `${Math.floor(s / 60)} min ${s % 60} s`;
  return `${Math.floor(s / 3600)} h ${Math.floor((s % 3600) / 60)} min`;
}
