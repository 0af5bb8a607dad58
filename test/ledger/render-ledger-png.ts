/**
 * Renders one ledger to PNG for review (not a test): writes the .xlsx, lets LibreOffice
 * recompute and print it to PDF, then pdftoppm turns the first pages into images:
 *   npx tsx test/ledger/render-ledger-png.ts ["Rain barrels"] [additive]
 * (a demo product's name, Seed trays by default; the seasonality, multiplicative by default:
 * additive shows the interval's formulas, the variance and T.INV cells). Output: test-artifacts/ledger.png (settings,
 * scorecard, outlook, start), test-artifacts/ledger-updates.png (the first update rows) and
 * test-artifacts/ledger-last.png (the last page: the latest rows and their tracking-signal
 * shading as LibreOffice draws the conditional format). Needs soffice and pdftoppm (poppler-utils).
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
  const product = process.argv[2] ?? "Seed trays";
  const desc = describeLedger({
    history: demoSeries(product),
    name: `${product}, Larkmere Garden Supply (invented data)`,
    settings: { period: 12, seasonality: process.argv[3] === "additive" ? "additive" : "multiplicative", trend: "damped" },
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
  execFileSync("pdftoppm", ["-png", "-r", "60", pdf, join(dir, "page")]);
  const pages = readdirSync(dir).filter((f) => f.startsWith("page") && f.endsWith(".png")).sort();
  const out = join(__dirname, "..", "..", "test-artifacts");
  mkdirSync(out, { recursive: true });
  copyFileSync(join(dir, pages[0]), join(out, "ledger.png"));
  if (pages[1]) copyFileSync(join(dir, pages[1]), join(out, "ledger-updates.png"));
  copyFileSync(join(dir, pages[pages.length - 1]), join(out, "ledger-last.png"));
  console.log(`Wrote ${join(out, "ledger.png")}${pages[1] ? ", ledger-updates.png" : ""} and ledger-last.png (${pages.length} pages) from ${pdf}`);
}

main().catch((e) => {
  console.error(e instanceof Error ? e.message : e);
  process.exit(1);
});
