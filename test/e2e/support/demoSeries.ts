/** The committed demo CSV, read independently of the page (the page bundles the same file). */
import { parse } from "csv-parse/sync";
import { readFileSync } from "fs";
import { join } from "path";
import { REPO } from "./previewServer";

export interface DemoColumn {
  name: string;
  values: (number | null)[];
}

export function demoColumns(): DemoColumn[] {
  const rows: string[][] = parse(readFileSync(join(REPO, "src/preview/demo/larkmere-demo.csv"), "utf8"), { relaxColumnCount: false });
  const [header, ...data] = rows;
  return header.slice(1).map((name, k) => ({
    name,
    values: data.map((r) => (r[k + 1].trim() === "" ? null : Number(r[k + 1]))),
  }));
}
