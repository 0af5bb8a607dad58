/**
 * Two ledgers never share names: series whose sheet names agree in their first letters and
 * digits ("Widget 100 blue", "Widget 100 red") get default tags that agree, and the tag rule
 * the panel and the .xlsx writer use gives the second one a tag of its own. Written into one
 * workbook, each ledger's names point at its own sheet and the check finds both untouched.
 * Expected values: the sheets this test wrote.
 */
import { HyperFormula } from "hyperformula";
import { registerStudentQuantile } from "../../src/functions/hyperformula";
import { defaultTag, describeLedger, hyperFormulaReader, uniqueTag, verifyLedger, writeLedgerToHyperFormula } from "../../src/ledger";
import { demoSeries } from "./support/cases";

describe("ledger name tags", () => {
  it("gives two ledgers whose sheets share their first letters tags of their own", () => {
    const blue = defaultTag("Ledger Widget 100 blue", "A1");
    const red = defaultTag("Ledger Widget 100 red", "A1");
    expect(red).toBe(blue); // the collision the rule must resolve
    const second = uniqueTag(red, [blue]);
    expect(second.toLowerCase()).not.toBe(blue.toLowerCase());
    expect(uniqueTag(blue.toUpperCase(), [blue, second]).toLowerCase()).not.toMatch(new RegExp(`^(${blue}|${second})$`, "i")); // names ignore letter case
  });

  it("keeps each ledger's names on its own sheet when both are in one workbook", () => {
    registerStudentQuantile(); // as the preview does: T.INV to full precision
    const hf = HyperFormula.buildEmpty({ licenseKey: "gpl-v3" });
    const sheets = ["Ledger Widget 100 blue", "Ledger Widget 100 red"];
    const taken: string[] = [];
    const descs = sheets.map((sheet, i) => {
      const tag = uniqueTag(defaultTag(sheet, "A1"), taken);
      taken.push(tag);
      const desc = describeLedger({ history: demoSeries(i === 0 ? "Seed trays" : "Bird feed"), name: sheet.slice(7), settings: { period: 12 }, horizon: 6, coverage: 0.9, anchor: { sheet, cell: "A1" }, tag });
      writeLedgerToHyperFormula(hf, desc);
      return desc;
    });
    const names = descs.map((d) => new Set(d.names.map((n) => n.name.toLowerCase())));
    for (const n of names[0]) expect(names[1].has(n)).toBe(false);
    for (const d of descs) {
      for (const n of d.names) expect(n.refersTo).toContain(`'${d.sheet}'!`);
      expect(verifyLedger(hyperFormulaReader(hf, d.sheet), { sheet: d.sheet, cell: "A1" }).problems).toEqual([]);
    }
  });
});
