/** A1-style addresses for the preview grid (column letters, 1-based rows shown to people). */

/** 0 -> "A", 25 -> "Z", 26 -> "AA". */
export function columnLetters(col: number): string {
  let s = "";
  let n = col + 1;
  while (n > 0) {
    const r = (n - 1) % 26;
    s = String.fromCharCode(65 + r) + s;
    n = Math.floor((n - 1) / 26);
  }
  return s;
}

/** "A" -> 0, "AA" -> 26; undefined for anything but letters. */
export function columnIndex(letters: string): number | undefined {
  if (!/^[A-Za-z]{1,3}$/.test(letters)) return undefined;
  let n = 0;
  for (const ch of letters.toUpperCase()) n = n * 26 + (ch.charCodeAt(0) - 64);
  return n - 1;
}

/** (row 0, col 0) -> "A1". */
export function a1(row: number, col: number): string {
  return `${columnLetters(col)}${row + 1}`;
}

/** "B12" -> { row: 11, col: 1 }; "$B$12" works too; undefined when it is not one cell address. */
export function parseA1(text: string): { row: number; col: number } | undefined {
  const m = /^\$?([A-Za-z]{1,3})\$?(\d{1,7})$/.exec(text.trim());
  if (!m) return undefined;
  const col = columnIndex(m[1]);
  const row = Number(m[2]) - 1;
  if (col === undefined || row < 0) return undefined;
  return { row, col };
}

/** Sheet names that need quoting in a reference ('Read me'!A1). */
export function quoteSheet(name: string): string {
  return /^[A-Za-z_][A-Za-z0-9_.]*$/.test(name) ? name : `'${name.replace(/'/g, "''")}'`;
}
