/**
 * The host adapter against a mock Excel JavaScript API (office-addin-mock): it writes the
 * formulas, names and formats of a ledger in one batch (one sync after a look at the
 * destination), with calculation and screen updating suspended, and refuses (asks) when the
 * destination holds anything. Expected values: the description the adapter was given.
 */
import { describeLedger, extendLedger, type LedgerDescription } from "../../src/ledger";
import { writeExtensionToExcel, writeLedgerToExcel, type HostWriteResult } from "../../src/ledger/adapters/excelHost";
import { parseCell } from "../../src/ledger/describe/addresses";
import { longSeries, quarterlyMargin } from "./support/cases";
import { hyperFormulaReader, ledgerInHyperFormula } from "./support/hf";
import { fakeExcel, type FakeExcel } from "./support/fakeExcel";

function ledger(): LedgerDescription {
  return describeLedger({ history: quarterlyMargin(), name: "Margin", settings: { period: 4, seasonality: "additive", trend: "linear" }, horizon: 6, coverage: 0.9, anchor: { sheet: "Ebb ledger", cell: "B2" } });
}

async function run(fake: FakeExcel, desc: LedgerDescription, options: Parameters<typeof writeLedgerToExcel>[1] = { notes: "notes" }): Promise<HostWriteResult> {
  (globalThis as unknown as { Excel: unknown }).Excel = fake.Excel;
  return writeLedgerToExcel(desc, options);
}

const WRITES = /^(range\.|format@|fill@|font@|names\.add|names\.delete|merge|clear|conditionalFormats|charts\.add|chart\.|notes\.add|comments\.add|worksheets\.add|suspend)/;

describe("Excel host adapter", () => {
  it("writes a new sheet in one batch: formulas, names, formats, notes, flags and chart", async () => {
    const desc = ledger();
    const fake = fakeExcel({ sheetExists: false });
    const result = await run(fake, desc);
    expect(result.status).toBe("written");
    // One look (sheet and names), one batch of writes.
    expect(fake.syncs()).toBe(2);
    const writes = fake.calls.filter((c) => WRITES.test(c.what));
    expect(writes.length).toBeGreaterThan(50);
    expect(writes.every((c) => c.afterSyncs === 1)).toBe(true);
    expect(fake.calls[fake.calls.length - 1].what).toBe("sync");
    const suspend = fake.calls.filter((c) => c.what.startsWith("suspend")).map((c) => c.what);
    expect(suspend).toEqual(["suspendApiCalculationUntilNextSync", "suspendScreenUpdatingUntilNextSync"]);
    expect(fake.calls.find((c) => c.what === "worksheets.add")!.args).toEqual(["Ebb ledger"]);

    // Every name, with its reference.
    const names = fake.calls.filter((c) => c.what === "names.add").map((c) => [c.args[0], c.args[1]]);
    expect(names).toEqual(desc.names.map((n) => [n.name, `=${n.refersTo}`]));
    // Names come before the formulas that use them.
    const firstName = fake.calls.findIndex((c) => c.what === "names.add");
    const firstFormulas = fake.calls.findIndex((c) => c.what === "range.formulas");
    expect(firstName).toBeLessThan(firstFormulas);

    // One block holds every formula and constant at its place, and every number format.
    const blockWrites = fake.calls.filter((c) => c.what === "range.formulas");
    expect(blockWrites).toHaveLength(1);
    const [address, grid] = blockWrites[0].args as [string, (string | number | null)[][]];
    const top = parseCell(address.split(":")[0]);
    const formats = fake.ranges.get(address)!.numberFormat as (string | null)[][];
    for (const c of desc.cells) {
      const written = grid[c.row - top.row][c.col - top.col];
      if (c.formula) expect(written).toBe(c.formula);
      else if (typeof c.value === "number") expect(written).toBe(c.value);
      if (c.format) expect(formats[c.row - top.row][c.col - top.col]).toBe(c.format);
    }
    expect(grid.flat().filter((v) => typeof v === "string" && v.startsWith("=")).length).toBe(desc.cells.filter((c) => c.formula).length);

    // Notes on every header, the merged title, the tracking-signal flag and the chart.
    expect(fake.calls.filter((c) => c.what === "notes.add").length).toBe(desc.cells.filter((c) => c.note).length);
    expect(fake.calls.filter((c) => c.what === "merge").map((c) => c.args[0])).toEqual(desc.merges);
    const flagRange = desc.flags[0].range;
    const cf = fake.ranges.get(flagRange)!.conditionalFormat as { custom: { rule: { formula: string } } };
    // A formula rule shades numbers beyond the windowed signal's +/-2.2 and never the blank text of an undefined signal.
    const topLeft = flagRange.split(":")[0];
    expect(fake.calls.some((c) => c.what === "conditionalFormats.add" && c.args[0] === flagRange && c.args[1] === "Custom")).toBe(true);
    expect(cf.custom.rule.formula).toBe(`=AND(ISNUMBER(${topLeft}),OR(${topLeft}<-2.2,${topLeft}>2.2))`);
    // The settings guard's warnings: a text rule on the explanation column (one per warning phrase).
    const textFlags = desc.flags.filter((f) => "containsText" in f);
    expect(textFlags.length).toBeGreaterThan(0);
    for (const flag of textFlags) {
      expect(fake.calls.some((c) => c.what === "conditionalFormats.add" && c.args[0] === flag.range && c.args[1] === "ContainsText")).toBe(true);
    }
    expect(fake.calls.filter((c) => c.what === "charts.add")).toHaveLength(1);
    expect(fake.calls.find((c) => c.what === "chart.setPosition")!.args).toEqual([desc.chart.from, desc.chart.to]);
    // Fills were set for the inputs.
    const settingsAlpha = desc.layout.settings.alpha;
    expect(fake.calls.some((c) => c.what.startsWith("fill@") && c.what.includes(settingsAlpha))).toBe(true);
  });

  it("writes into an existing empty sheet after looking at the destination: still one batch", async () => {
    const fake = fakeExcel({ sheetExists: true });
    const result = await run(fake, ledger(), { notes: "comments" });
    expect(result.status).toBe("written");
    expect(fake.syncs()).toBe(3);
    const writes = fake.calls.filter((c) => WRITES.test(c.what));
    expect(writes.every((c) => c.afterSyncs === 2)).toBe(true);
    expect(fake.calls.some((c) => c.what === "comments.add")).toBe(true);
  });

  it("refuses and lists the occupied cells when the destination holds anything", async () => {
    const desc = ledger();
    const fake = fakeExcel({ sheetExists: true, occupied: { rowIndex: 9, columnIndex: 3, formulas: [["", "keep me"], [42, ""]] } });
    const result = await run(fake, desc);
    expect(result.status).toBe("needs-confirmation");
    if (result.status !== "needs-confirmation") return;
    expect(result.occupied).toEqual(["E10", "D11"]);
    expect(result.occupiedCount).toBe(2);
    expect(result.message).toMatch(/2 cells .* already hold something \(E10, D11\).*confirm/);
    expect(fake.calls.filter((c) => WRITES.test(c.what))).toEqual([]);
  });

  it("refuses when the ledger's names already exist, and clears and writes once confirmed", async () => {
    const desc = ledger();
    const existing = [desc.names[0].name];
    const asked = await run(fakeExcel({ sheetExists: true, existingNames: existing }), desc);
    expect(asked.status).toBe("needs-confirmation");
    const fake = fakeExcel({ sheetExists: true, existingNames: existing, occupied: { rowIndex: 1, columnIndex: 1, formulas: [["old"]] } });
    const done = await run(fake, desc, { confirmed: true, notes: "none" });
    expect(done.status).toBe("written");
    expect(fake.calls.find((c) => c.what === "clear")!.args).toEqual([desc.footprint[0], "All"]);
    expect(fake.calls.find((c) => c.what === "names.delete")!.args).toEqual(existing);
    const clearAt = fake.calls.findIndex((c) => c.what === "clear");
    const formulasAt = fake.calls.findIndex((c) => c.what === "range.formulas");
    expect(clearAt).toBeLessThan(formulasAt);
  });
});

describe("Excel host adapter at any length", () => {
  it("writes a 10,000-period ledger in batches that each send under 2 MB, every cell in its place", async () => {
    const desc = describeLedger({ history: longSeries(10_000), name: "Long", settings: { period: 12, seasonality: "multiplicative", trend: "linear", alpha: 0.2, beta: 0.01, gamma: 0.1 }, horizon: 12, coverage: 0.9, anchor: { sheet: "Long", cell: "A1" } });
    const fake = fakeExcel({ sheetExists: false });
    const progress: number[] = [];
    const result = await run(fake, desc, { notes: "notes", onProgress: (done, total) => progress.push(done / total) });
    expect(result.status).toBe("written");
    const sizes = fake.requestSizes();
    const total = sizes.reduce((a, b) => a + b, 0);
    console.log(`10,000-period ledger: ${desc.cells.length} cells sent in ${sizes.length} requests, largest ${(Math.max(...sizes) / 1e6).toFixed(2)} MB, all ${(total / 1e6).toFixed(2)} MB`);
    // The web host refuses a request over 5 MB; each stays under 2 MB (measured as the JSON of what was sent).
    expect(Math.max(...sizes)).toBeLessThan(2 * 1024 * 1024);
    expect(total).toBeGreaterThan(5 * 1024 * 1024);
    // The progress bar moves: one report per batch, rising.
    expect(progress.length).toBeGreaterThan(2);
    expect(progress).toEqual([...progress].sort((a, b) => a - b));
    // Every formula and constant lands where the description puts it.
    const written = new Map<string, unknown>();
    for (const c of fake.calls.filter((x) => x.what === "range.formulas")) {
      const [address, grid] = c.args as [string, unknown[][]];
      const top = parseCell(address.split(":")[0]);
      grid.forEach((line, i) => line.forEach((v, j) => v !== null && written.set(`${top.row + i},${top.col + j}`, v)));
    }
    const misplaced = desc.cells.filter((c) => {
      const v = written.get(`${c.row},${c.col}`);
      return c.formula ? v !== c.formula : typeof c.value === "number" && v !== c.value;
    });
    expect(misplaced.map((c) => c.address)).toEqual([]);
  });

  it("adds new actuals after one of the ledger's names was deleted: the name is defined again, nothing fails", async () => {
    const history = quarterlyMargin();
    const input = { history: history.slice(0, 36), name: "Margin", settings: { period: 4, seasonality: "additive", trend: "linear" }, horizon: 6, coverage: 0.9, anchor: { sheet: "Ebb ledger", cell: "A1" } };
    const { hf } = ledgerInHyperFormula(input);
    const ext = extendLedger(hyperFormulaReader(hf, "Ebb ledger"), input.anchor, history.slice(36));
    const deleted = ext.description.names.find((n) => n.name.endsWith("_errors"))!;
    const fake = fakeExcel({ sheetExists: true, existingNames: ext.description.names.filter((n) => n !== deleted).map((n) => n.name) });
    (globalThis as unknown as { Excel: unknown }).Excel = fake.Excel;
    await expect(writeExtensionToExcel(ext)).resolves.toBeDefined();
    expect(fake.calls.filter((c) => c.what === "names.add").map((c) => c.args[0])).toEqual([deleted.name]);
    expect(fake.calls.filter((c) => c.what === "names.delete")).toEqual([]);
    const appended = fake.calls.filter((c) => c.what === "range.formulas");
    expect(appended.length).toBeGreaterThan(0);
  });
});
