/** Markdown tables padded so they also read well as plain text on a terminal. */
export function markdownTable(header: string[], rows: string[][], rightAlign: boolean[] = []): string {
  const widths = header.map((h, i) => Math.max(h.length, ...rows.map((r) => (r[i] ?? "").length), 3));
  const cell = (text: string, i: number) => (rightAlign[i] ? text.padStart(widths[i]) : text.padEnd(widths[i]));
  const line = (cells: string[]) => `| ${cells.map(cell).join(" | ")} |`;
  const rule = `| ${widths.map((w, i) => (rightAlign[i] ? "-".repeat(w - 1) + ":" : "-".repeat(w))).join(" | ")} |`;
  return [line(header), rule, ...rows.map(line)].join("\n");
}

export const fixed = (v: number | undefined, digits: number): string =>
  v === undefined || !Number.isFinite(v) ? "-" : v.toFixed(digits);

/** Milliseconds with three significant figures. */
export const ms = (seconds: number | undefined): string =>
  seconds === undefined || !Number.isFinite(seconds) ? "-" : (seconds * 1000).toPrecision(3);

export const percent = (share: number | undefined, digits = 1): string =>
  share === undefined || !Number.isFinite(share) ? "-" : `${(share * 100).toFixed(digits)}%`;
