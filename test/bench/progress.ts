/** One progress line on standard error, so a long run shows it is alive without cluttering stdout. */
export class Progress {
  private last = 0;
  private readonly tty = process.stderr.isTTY === true;

  constructor(private readonly quiet = false) {}

  /** Report `done` of `total` for a stage; rewrites the line on a terminal, else prints every ~10%. */
  step(stage: string, done: number, total: number): void {
    if (this.quiet) return;
    const t = Date.now();
    const finished = done >= total;
    if (this.tty) {
      if (!finished && t - this.last < 200) return;
      this.last = t;
      process.stderr.write(`\r\x1b[K[bench] ${stage}: ${done}/${total}${finished ? "\n" : ""}`);
    } else {
      const tenth = Math.max(1, Math.floor(total / 10));
      if (done === 1 || finished || done % tenth === 0) process.stderr.write(`[bench] ${stage}: ${done}/${total}\n`);
    }
  }

  note(message: string): void {
    if (this.quiet) return;
    process.stderr.write(`${this.tty ? "\r\x1b[K" : ""}[bench] ${message}\n`);
  }
}
