/**
 * The panel's port to the spreadsheet host (src/taskpane/ports/excelPort.ts) against a mock Excel
 * JavaScript API (office-addin-mock): reading the selection as a history, writing a ledger only
 * after asking when the destination holds anything, and finding the ledgers by their names.
 * Expected values: the committed demo CSV (read here on its own), the ledger description the port
 * was given, and hand-worked cell addresses noted beside their checks.
 */
import { OfficeMockObject } from "office-addin-mock";
import { describeLedger, type LedgerDescription } from "../../src/ledger";
import { pickHistories } from "../../src/taskpane/panel/historyPick";
import { ExcelPort } from "../../src/taskpane/ports/excelPort";
import { demoColumns } from "../ledger/support/cases";
import { fakeExcel, type FakeExcel } from "../ledger/support/fakeExcel";

/** Calls that change the workbook, as the host adapter's fake records them. */
const WRITES = /^(range\.|format@|fill@|font@|names\.add|names\.delete|merge|clear|conditionalFormats|charts\.add|chart\.|notes\.add|comments\.add|worksheets\.add|suspend)/;

function useHost(excel: FakeExcel["Excel"]): void {
  (globalThis as unknown as { Excel: unknown }).Excel = excel;
}

/** A host whose every Excel.run gets the same office-addin-mock context. */
function mockHost(data: Record<string, unknown>): OfficeMockObject {
  const context = new OfficeMockObject(data);
  useHost({ run: async (cb) => cb(context) });
  return context;
}

/** A column of the demo data as the host returns a selected range: values with their value types. */
function hostColumn(header: string, values: (number | null)[], spareRows: number): { values: unknown[][]; valueTypes: string[][] } {
  const cells: [unknown, string][] = [[header, "String"], ...values.map((v): [unknown, string] => (v === null ? ["", "Empty"] : [v, "Double"]))];
  for (let i = 0; i < spareRows; i++) cells.push(["", "Empty"]);
  return { values: cells.map(([v]) => [v]), valueTypes: cells.map(([, t]) => [t]) };
}

/** A host whose selected range is this column, at 0-based (rowIndex, columnIndex) of a sheet. */
function selectionHost(sheet: string, rowIndex: number, columnIndex: number, column: { values: unknown[][]; valueTypes: string[][] }): void {
  mockHost({
    workbook: {
      range: { ...column, rowIndex, columnIndex, worksheet: { name: sheet } },
      getSelectedRange(this: OfficeMockObject) {
        return this.range;
      },
    },
  });
}

function ledger(sheet: string, cell: string): LedgerDescription {
  const seed = demoColumns().find((c) => c.name.startsWith("Seed trays"))!;
  return describeLedger({ history: seed.values, name: seed.name, settings: { period: 12, seasonality: "multiplicative", trend: "linear" }, horizon: 6, coverage: 0.9, anchor: { sheet, cell } });
}

describe("the panel's port to the spreadsheet host", () => {
  const port = new ExcelPort();

  it("reads the selected column as a history: header detected, blanks missing, trailing blanks dropped", async () => {
    // Flower bulbs has three missing months (blank cells in the demo CSV).
    const bulbs = demoColumns().find((c) => c.name.startsWith("Flower bulbs"))!;
    expect(bulbs.values.filter((v) => v === null).length).toBe(3);
    // Selected F1:F90 on "Sales": header in F1, 84 months below, 5 spare empty rows.
    const column = hostColumn(bulbs.name, bulbs.values, 5);
    selectionHost("Sales", 0, 5, column);

    const block = await port.selection();
    expect(block).toMatchObject({ sheet: "Sales", top: 0, left: 5 });
    expect(block.values).toHaveLength(90);

    const picked = pickHistories(block);
    expect(picked.ok).toBe(true);
    if (!picked.ok) return;
    expect(picked.picks).toHaveLength(1);
    // Header text as in the CSV; values start on row 2 (0-based row 1) of column F (0-based 5).
    expect(picked.picks[0]).toEqual({ sheet: "Sales", col: 5, headerRow: 0, firstRow: 1, name: "Flower bulbs (packs)", values: bulbs.values });
  });

  it("keeps a host error's code, so the history is refused with the cell named", async () => {
    const column = hostColumn("Hose reels (units)", [192, 254, 301], 0);
    column.values[2][0] = "#N/A";
    column.valueTypes[2][0] = "Error";
    // Selected C4:C7: the error is the second value, in C6.
    selectionHost("Sales", 3, 2, column);

    const block = await port.selection();
    expect(block.values[2][0]).toEqual({ error: "#N/A" });
    const picked = pickHistories(block);
    expect(picked.ok).toBe(false);
    if (!picked.ok) expect(picked.message).toMatch(/^Sales!C6 shows #N\/A\./);
  });

  it("reads a whole column for a single selected cell: its last used row, then the block down to it", async () => {
    const bulbs = demoColumns().find((c) => c.name.startsWith("Flower bulbs"))!;
    const asked: string[] = [];
    const sheetWith = (used: { isNullObject: boolean; rowIndex: number; rowCount: number }) =>
      mockHost({
        workbook: {
          worksheets: {
            sheet: {
              used,
              range: hostColumn(bulbs.name, bulbs.values, 0),
              getUsedRangeOrNullObject(this: OfficeMockObject) {
                return this.used;
              },
              getRange(this: OfficeMockObject, address: string) {
                asked.push(address);
                return this.range;
              },
            },
            getItem(this: OfficeMockObject, name: string) {
              asked.push(name);
              return this.sheet;
            },
          },
        },
      });
    // Used rows 1-85 (header and 84 months): the last used row is 0-based 84.
    sheetWith({ isNullObject: false, rowIndex: 0, rowCount: 85 });
    await expect(port.lastUsedRow("Sales")).resolves.toBe(84);
    // Rows 0-84 of column index 5 are F1:F85.
    const block = await port.read("Sales", 0, 5, 85, 1);
    expect(asked).toEqual(["Sales", "Sales", "F1:F85"]);
    expect(block.values.map((r) => r[0])).toEqual([bulbs.name, ...bulbs.values]);
    sheetWith({ isNullObject: true, rowIndex: 0, rowCount: 0 });
    await expect(port.lastUsedRow("Empty")).resolves.toBe(-1); // the port's "empty sheet" answer
  });

  it("writes a ledger into an empty new sheet at once, with every name of the description", async () => {
    const desc = ledger("Seed plan", "A1");
    const fake = fakeExcel({ sheetExists: false });
    useHost(fake.Excel);
    await expect(port.writeLedger(desc, false)).resolves.toEqual({ status: "written" });
    expect(fake.calls.find((c) => c.what === "worksheets.add")?.args).toEqual(["Seed plan"]);
    expect(fake.calls.filter((c) => c.what === "names.add").map((c) => c.args[0])).toEqual(desc.names.map((n) => n.name));
  });

  it("asks, writing nothing, when the destination holds anything; writes over it once confirmed", async () => {
    const desc = ledger("Seed plan", "A1");
    // The used part of the footprint starts at row index 9, column index 3: "keep me" sits in E10, 42 in D11.
    const occupied = { rowIndex: 9, columnIndex: 3, formulas: [["", "keep me"], [42, ""]] };
    const asked = fakeExcel({ sheetExists: true, occupied });
    useHost(asked.Excel);
    const outcome = await port.writeLedger(desc, false);
    expect(outcome.status).toBe("needs-confirmation");
    if (outcome.status === "needs-confirmation") expect(outcome.message).toMatch(/E10, D11/);
    expect(asked.calls.filter((c) => WRITES.test(c.what))).toEqual([]);

    const confirmed = fakeExcel({ sheetExists: true, occupied });
    useHost(confirmed.Excel);
    await expect(port.writeLedger(desc, true)).resolves.toEqual({ status: "written" });
    expect(confirmed.calls.find((c) => c.what === "clear")?.args).toEqual([desc.footprint[0], "All"]);
  });

  it("finds the first cell in use where new rows would go (the ask-first check for added actuals)", async () => {
    // Same content as above: the first cell holding anything, row by row, is E10.
    useHost(fakeExcel({ sheetExists: true, occupied: { rowIndex: 9, columnIndex: 3, formulas: [["", "keep me"], [42, ""]] } }).Excel);
    await expect(port.firstUsedCell("Seed plan", ["D10:E11"])).resolves.toBe("Seed plan!E10");
    useHost(fakeExcel({ sheetExists: true }).Excel);
    await expect(port.firstUsedCell("Seed plan", ["D10:E11"])).resolves.toBeUndefined();
    useHost(fakeExcel({ sheetExists: false }).Excel);
    await expect(port.firstUsedCell("No such sheet", ["A1:B2"])).resolves.toBeUndefined();
  });

  it("lists the ledgers by their defined names, with the sheet, top-left cell and tag of each description", async () => {
    const first = ledger("Seed plan", "A1");
    const second = ledger("Owner's view", "D4"); // a sheet name the host quotes, with its apostrophe doubled
    // Every name both ledgers define, as the host gives them back (formula "=" + reference), plus unrelated ones.
    const items = [...first.names, ...second.names].map((n) => ({ name: n.name, formula: `=${n.refersTo}` }));
    items.push({ name: "Budget2025", formula: "=Sales!$B$2:$B$13" }, { name: "ebb_Gone_ledger", formula: "=#REF!" });
    mockHost({
      workbook: {
        names: {
          items,
          // A collection loads "items/<property>"; this mock only lets items be read once both are loaded.
          load(this: OfficeMockObject, what: string) {
            const wanted = what.split(",").map((p) => p.trim());
            if (wanted.includes("items/name") && wanted.includes("items/formula")) OfficeMockObject.prototype.load.call(this, "items");
          },
        },
      },
    });

    const found = await port.ledgers();
    expect(found).toEqual([
      { sheet: "Seed plan", cell: first.anchor, tag: first.tag },
      { sheet: "Owner's view", cell: second.anchor, tag: second.tag },
    ]);
    expect(second.anchor).toBe("D4");
  });
});
