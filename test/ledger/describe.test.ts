/**
 * The shape of a ledger description: plain built-in functions only (each one HyperFormula
 * knows; LibreOffice evaluates them in libreoffice.test.ts), a note on every column header,
 * names that keep two ledgers apart, clear messages on bad input.
 */
import { HyperFormula } from "hyperformula";
import { EbbError } from "../../src/engine";
import { describeLedger, type LedgerInput } from "../../src/ledger";
import { demoSeries, ledgerCases, quarterlyMargin } from "./support/cases";
import { ledgerInHyperFormula } from "./support/hf";

/** Built-in functions the ledger may use: in both HyperFormula 3 and LibreOffice Calc (and Excel). */
const ALLOWED = ["SUM", "AVERAGE", "ABS", "SQRT", "INDEX", "SLOPE", "IF", "ISNUMBER", "COUNT", "COUNTIF", "SUMSQ", "MOD", "T.INV", "NA", "ROWS", "MAX", "AND", "OR", "EXACT", "TRIM", "T", "PI"];

const input = (over: Partial<LedgerInput> = {}): LedgerInput => ({
  history: demoSeries("Seed trays"),
  name: "Seed trays (units)",
  settings: { period: 12 },
  horizon: 12,
  coverage: 0.95,
  anchor: { sheet: "Seed trays", cell: "A1" },
  ...over,
});

describe("ledger description", () => {
  const all = ledgerCases().map((c) => describeLedger({ history: c.history, name: c.label, settings: c.settings, corrections: c.corrections, horizon: 12, coverage: 0.9, anchor: { sheet: "S", cell: "A1" } }));

  it("uses only arithmetic and built-in functions that HyperFormula registers, and no Ebb function", () => {
    const registered = HyperFormula.getRegisteredFunctionNames("enGB");
    for (const f of ALLOWED) expect(registered).toContain(f);
    for (const d of all) {
      for (const c of d.cells) {
        if (!c.formula) continue;
        expect(c.formula).not.toMatch(/EBB\./i);
        const used = [...c.formula.replace(/"[^"]*"/g, "").matchAll(/([A-Z][A-Z0-9.]*)\(/g)].map((m) => m[1]);
        for (const u of used) expect(ALLOWED).toContain(u);
      }
    }
  });

  it("gives every column header a note, and every update row the update formulas", () => {
    for (const d of all) {
      const headers = d.cells.filter((c) => c.role === "header");
      expect(headers.length).toBeGreaterThan(20);
      for (const h of headers.filter((c) => c.row === d.layout.updates.headerRow || c.row === d.layout.outlook.firstRow - 1)) expect(h.note?.length ?? 0).toBeGreaterThan(10);
      const levelCol = d.layout.updates.columns.level!;
      for (const r of d.layout.updates.rows.filter((r) => !r.start)) {
        const level = d.cells.find((c) => c.row === r.row && c.col === levelCol)!;
        // Refers to the row above (and, with seasonality, to the index one season back).
        expect(level.formula).toContain(`${String.fromCharCode(65 + levelCol)}${r.row}`);
      }
    }
  });

  it("names every setting with a per-ledger prefix, so two ledgers never share a name", () => {
    const a = describeLedger(input());
    const b = describeLedger(input({ anchor: { sheet: "Hose reels", cell: "A1" } }));
    const c = describeLedger(input({ anchor: { sheet: "Seed trays", cell: "T1" } }));
    for (const key of ["alpha", "beta", "gamma", "phi", "season", "seasonality", "coverage"]) expect(a.names.map((n) => n.name)).toContain(`ebb_Seedtrays_${key}`);
    const an = new Set(a.names.map((n) => n.name));
    for (const other of [b, c]) for (const n of other.names) expect(an.has(n.name)).toBe(false);
    for (const n of a.names) expect(n.refersTo.startsWith("'Seed trays'!$")).toBe(true);
  });

  it("says MAPE is not defined when an actual is 0 (and HyperFormula agrees)", () => {
    const history = quarterlyMargin();
    history[30] = 0;
    const { desc, value } = ledgerInHyperFormula(input({ history, settings: { period: 4, seasonality: "additive" } }));
    expect(desc.cells.find((c) => c.address === desc.layout.scorecard.mape)!.value).toBe("not defined (an actual is 0)");
    expect(value(desc.layout.scorecard.mape)).toBe("not defined (an actual is 0)");
  });

  it("writes the multiplicative interval as engine numbers with a note, the additive one as formulas", () => {
    const mult = describeLedger(input({ settings: { period: 12, seasonality: "multiplicative" } }));
    const add = describeLedger(input({ settings: { period: 12, seasonality: "additive" } }));
    expect(mult.intervalMethod).toBe("engine-simulation");
    expect(mult.cells.filter((c) => c.kind === "engine")).toHaveLength(2 * 12);
    expect(mult.cells.find((c) => c.role === "header" && c.value === "Gap below")!.note).toMatch(/simulation/);
    expect(add.intervalMethod).toBe("formula");
    expect(add.cells.filter((c) => c.kind === "engine")).toHaveLength(0);
  });

  it("refuses bad input with a message that says what to do", () => {
    const cases: [Partial<LedgerInput>, RegExp][] = [
      [{ settings: { period: 12, start: "optimized" } }, /decomposition or the classic start/],
      [{ horizon: 0 }, /horizon must be a whole number/],
      [{ coverage: 1.5 }, /Coverage must be a fraction/],
      [{ anchor: { sheet: "a/b", cell: "A1" } }, /cannot be a sheet name/],
      [{ anchor: { sheet: "S", cell: "1A" } }, /not a cell address/],
      [{ history: [1, 2, 3], settings: { period: 12 } }, /Needs \d+ values/],
      [{ settings: { period: 12, alpha: 2 } }, /alpha must be a number from 0 to 1/],
      [{ tag: "9lives" }, /must start with a letter/],
    ];
    for (const [over, message] of cases) {
      let error: unknown;
      try {
        describeLedger(input(over));
      } catch (e) {
        error = e;
      }
      expect(error).toBeInstanceOf(EbbError);
      expect((error as Error).message).toMatch(message);
    }
  });

  it("keeps a history name that looks like a date or number as text in HyperFormula", () => {
    const { desc, value } = ledgerInHyperFormula(input({ name: "2019-01" }));
    expect(value(desc.layout.settings.name)).toBe("2019-01");
  });
});
