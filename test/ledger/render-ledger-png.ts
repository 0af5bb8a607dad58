/**
 * Renders one ledger to PNG for review (not a test): writes the .xlsx, lets LibreOffice
 * recompute and print it to PDF, then pdftoppm turns the first pages into images:
 *   npx tsx test/ledger/render-ledger-png.ts
 * Output: test-artifacts/ledger.png (settings, scorecard, outlook, start) and
 * test-artifacts/ledger-updates.png (the update rows). Needs soffice and pdftoppm (poppler-utils).
 */
import ExcelJS from "exceljs";
import { execFileSync } from "child_process";
import { copyFileSync, mkdirSync, mkdtempSync, readdirSync } from "fs";
import { tmpdir } from "os";
import { join } from "path";
import { describeLedger } from "../../src/ledger";
import { addLedgerToWorkbook } from "../../src/ledger/adapters/xlsx";
import { parseCell } from "../../src/ledger/describe/addresses";
import { demoSeries } from "./support/cases";
import { convertWithLibreOffice, findSoffice } from "./support/libreoffice";

async function main(): Promise<void> {
  const soffice = findSoffice();
  if (!soffice) throw new Error("soffice (LibreOffice) is needed to render the ledger.");
  const desc = describeLedger({
    history: demoSeries("Seed trays"),
    name: "Seed trays (units), Larkmere Garden Supply (invented data)",
    settings: { period: 12, seasonality: "multiplicative", trend: "damped" },
    horizon: 12,
    coverage: 0.9,
    anchor: { sheet: "Seed trays", cell: "A1" },
  });
  const wb = new ExcelJS.Workbook();
  const ws = addLedgerToWorkbook(wb, desc);
  // Print the ledger itself at a readable scale (the chart's data block is left out).
  const chartCol = parseCell(desc.chart.from).col;
  for (let c = chartCol; c < chartCol + 8; c++) ws.getColumn(c + 1).hidden = true;
  ws.pageSetup = { ...ws.pageSetup, fitToPage: false, scale: 62, orientation: "landscape", paperSize: 9 };
  ws.pageSetup.margins = { left: 0.3, right: 0.3, top: 0.3, bottom: 0.3, header: 0, footer: 0 };
  const dir = mkdtempSync(join(tmpdir(), "ebb-render-"));
  const xlsx = join(dir, "ledger.xlsx");
  await wb.xlsx.writeFile(xlsx);
  const pdf = convertWithLibreOffice(soffice, xlsx, "pdf", dir);
  execFileSync("pdftoppm", ["-png", "-r", "60", "-f", "1", "-l", "2", pdf, join(dir, "page")]);
  const pages = readdirSync(dir).filter((f) => f.startsWith("page") && f.endsWith(".png")).sort();
  const out = join(__dirname, "..", "..", "test-artifacts");
  mkdirSync(out, { recursive: true });
  copyFileSync(join(dir, pages[0]), join(out, "ledger.png"));
  if (pages[1]) copyFileSync(join(dir, pages[1]), join(out, "ledger-updates.png"));
  console.log(`Wrote ${join(out, "ledger.png")}${pages[1] ? " and ledger-updates.png" : ""} from ${pdf}`);
}

main().catch((e) => {
  console.error(e instanceof Error ? e.message : e);
  process.exit(1);
});
