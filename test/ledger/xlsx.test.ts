/**
 * The .xlsx adapter and the workbook of `ebb ledger`: formulas with the engine's cached
 * results, names, notes, number formats, the tracking-signal flag, the chart's data block
 * with its note, and a sheet explaining a series that has no ledger.
 */
import ExcelJS from "exceljs";
import { mkdtempSync } from "fs";
import { tmpdir } from "os";
import { join } from "path";
import { describeLedger } from "../../src/ledger";
import { addLedgerToWorkbook, CHART_BLOCK_NOTE } from "../../src/ledger/adapters/xlsx";
import { writeLedgerWorkbook } from "../../src/ledger/xlsx/writeLedgerWorkbook";
import { demoSeries } from "./support/cases";

describe("xlsx adapter", () => {
  it("writes formulas with cached engine values, names, notes, formats and the flag", async () => {
    const desc = describeLedger({ history: demoSeries("Bird feed"), name: "Bird feed (sacks)", settings: { period: 12, seasonality: "additive" }, horizon: 6, coverage: 0.8, anchor: { sheet: "Bird feed", cell: "B2" } });
    const wb = new ExcelJS.Workbook();
    addLedgerToWorkbook(wb, desc);
    const file = join(mkdtempSync(join(tmpdir(), "ebb-xlsx-")), "l.xlsx");
    await wb.xlsx.writeFile(file);
    const back = new ExcelJS.Workbook();
    await back.xlsx.readFile(file);
    const ws = back.getWorksheet("Bird feed")!;
    for (const c of desc.cells) {
      const model = ws.getCell(c.address).model as { formula?: string; result?: unknown; value?: unknown };
      if (c.formula) {
        expect(`=${model.formula!.replace("_xlfn.", "")}`).toBe(c.formula);
        if (typeof c.value === "number") expect(model.result).toBeCloseTo(c.value, 9);
      } else if (c.value !== null) {
        expect(ws.getCell(c.address).value).toBe(c.value);
      }
      if (c.note) expect(ws.getCell(c.address).note).toBeDefined();
      if (c.format && c.format !== "General") expect(ws.getCell(c.address).numFmt).toBe(c.format);
    }
    const names = back.definedNames.model.map((n: { name: string }) => n.name).sort();
    expect(names).toEqual(desc.names.map((n) => n.name).sort());
    const chartHead = ws.getCell(desc.chart.from);
    expect(String(chartHead.value)).toMatch(/Chart data/);
    expect(JSON.stringify(chartHead.note)).toContain("cannot draw charts");
    expect(CHART_BLOCK_NOTE).toMatch(/exceljs/);
    const cf = (ws as unknown as { conditionalFormattings: { ref: string; rules: { type: string; operator?: string; formulae: string[] }[] }[] }).conditionalFormattings;
    // The tracking-signal limits, then the settings guard's warning phrases, read back from the file.
    expect(cf.map((c) => [c.ref, c.rules[0].type, c.rules[0].operator ?? c.rules[0].formulae[0]])).toEqual(
      desc.flags.map((f) => {
        const tl = f.range.split(":")[0];
        return "outside" in f ? [f.range, "expression", `AND(ISNUMBER(${tl}),OR(${tl}<-2.2,${tl}>2.2))`] : [f.range, "expression", `NOT(ISERROR(SEARCH("${f.containsText}",${tl})))`];
      }),
    );
    expect(desc.flags.filter((f) => "containsText" in f).length).toBeGreaterThan(0);
  });

  it("refuses to write over a sheet that already holds something there", () => {
    const desc = describeLedger({ history: demoSeries("Bird feed"), settings: { period: 12 }, horizon: 3, coverage: 0.9, anchor: { sheet: "Taken", cell: "A1" } });
    const wb = new ExcelJS.Workbook();
    wb.addWorksheet("Taken").getCell("D40").value = "mine";
    expect(() => addLedgerToWorkbook(wb, desc)).toThrow(/already holds 1 cell\(s\) where the ledger goes \(D40\)/);
  });

  it("writes a data sheet, one ledger per series, and a reason for a series that has none", async () => {
    const file = join(mkdtempSync(join(tmpdir(), "ebb-cli-")), "ledger.xlsx");
    await writeLedgerWorkbook(
      [
        { name: "Seed trays", values: demoSeries("Seed trays") },
        { name: "Too short", values: [5, 6, 7] },
      ],
      { period: 12, horizon: 4, coverage: 0.9 },
      file,
    );
    const back = new ExcelJS.Workbook();
    await back.xlsx.readFile(file);
    expect(back.worksheets.map((w) => w.name)).toEqual(["Data", "Ledger Seed trays", "Ledger Too short"]);
    expect(back.getWorksheet("Data")!.getCell("B4").value).toBe(7);
    expect(String(back.getWorksheet("Ledger Too short")!.getCell("A3").value)).toMatch(/no ledger: Needs \d+ values/);
  });
});
