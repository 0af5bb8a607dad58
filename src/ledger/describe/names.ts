import { badInput } from "../../engine";

/**
 * Defined names of a ledger: ebb_<tag>_<key>. The tag keeps two ledgers apart (names are
 * workbook-wide in every host we write to, so a per-ledger prefix works everywhere).
 */

/** A default tag from the sheet name and, when not A1, the anchor cell: letters and digits only. */
export function defaultTag(sheet: string, cell: string): string {
  let base = sheet.replace(/[^A-Za-z0-9]/g, "").slice(0, 12);
  if (!/^[A-Za-z]/.test(base)) base = `L${base}`.slice(0, 12);
  const where = cell.replace(/\$/g, "").toUpperCase();
  return where === "A1" ? base : `${base}${where}`;
}

/**
 * A tag no other ledger uses: the wanted one, or it with 2, 3, ... at the end. Tags compare
 * without letter case (defined names do), so "Widget 100 blue" and "Widget 100 red", whose
 * default tags agree, still get names of their own.
 */
export function uniqueTag(wanted: string, taken: Iterable<string>): string {
  const used = new Set([...taken].map((t) => t.toLowerCase()));
  let tag = wanted;
  for (let k = 2; used.has(tag.toLowerCase()); k++) tag = `${wanted.slice(0, 24 - String(k).length)}${k}`;
  return tag;
}

export function checkTag(tag: string): string {
  if (typeof tag !== "string" || !/^[A-Za-z][A-Za-z0-9]{0,23}$/.test(tag)) {
    throw badInput("bad-tag", `The ledger tag "${String(tag)}" must start with a letter and hold only letters and digits (at most 24).`);
  }
  return tag;
}

export function ledgerName(tag: string, key: string): string {
  return `ebb_${tag}_${key}`;
}
