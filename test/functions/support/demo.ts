/** The invented Larkmere Garden Supply demo data (src/preview/demo), one array per product. */
import { readFileSync } from "fs";
import { join } from "path";

export interface DemoData {
  names: string[];
  /** One array per product, oldest first; null where the CSV cell is blank. */
  columns: (number | null)[][];
}

export function readDemo(): DemoData {
  const text = readFileSync(join(__dirname, "../../../src/preview/demo/larkmere-demo.csv"), "utf8");
  const lines = text.trim().split(/\r?\n/);
  const names = lines[0].split(",").slice(1);
  const rows = lines.slice(1).map((l) => l.split(",").slice(1));
  const columns = names.map((_, c) => rows.map((r) => (r[c] === undefined || r[c] === "" ? null : Number(r[c]))));
  return { names, columns };
}
