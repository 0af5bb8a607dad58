/**
 * The settings guard in the sheet, computed by HyperFormula: an untouched ledger shows its
 * explanations and no shaded cell; alpha typed as 1.5, a coverage of 150 and a seasonality
 * word typed over the one written each turn their own explanation into a warning, and the
 * warning, and only it, meets the ledger's text shading rule. The ranges checked are the
 * engine's documented ones (alpha, beta, gamma, phi in [0, 1]: Holt 1957 and Winters 1960
 * define the smoothing constants on that interval; coverage as a fraction or a percent).
 */
import { parseCell } from "../../src/ledger/describe/addresses";
import { GUARD_TEXT } from "../../src/ledger/describe/settingsGuard";
import type { LedgerDescription, TextFlag } from "../../src/ledger/describe/types";
import { demoSeries } from "./support/cases";
import { ledgerInHyperFormula } from "./support/hf";

const beside = (address: string): string => {
  const { row, col } = parseCell(address);
  return `${String.fromCharCode(65 + col + 2)}${row + 1}`; // the explanation column, two to the right of "in use"
};

function shaded(desc: LedgerDescription, address: string, shown: unknown): boolean {
  const { row, col } = parseCell(address);
  return desc.flags.some((f): boolean => {
    if (!("containsText" in f)) return false;
    const [a, b] = f.range.split(":").map(parseCell);
    const inside = row >= a.row && row <= b.row && col >= a.col && col <= b.col;
    return inside && typeof shown === "string" && shown.toLowerCase().includes((f as TextFlag).containsText.toLowerCase());
  });
}

describe("settings guard", () => {
  const { hf, desc, sheetId, value } = ledgerInHyperFormula({
    history: demoSeries("Seed trays"),
    settings: { period: 12, seasonality: "multiplicative" },
    horizon: 6,
    coverage: 0.95,
    anchor: { sheet: "Guard", cell: "A1" },
  });
  const settings = desc.layout.settings;
  const type = (address: string, typed: string | number) => {
    const { row, col } = parseCell(address);
    hf.setCellContents({ sheet: sheetId, row, col }, [[typed]]);
  };

  it("leaves an untouched ledger's explanations unshaded", () => {
    for (const address of Object.values(settings)) {
      const shown = value(beside(address));
      if (typeof shown !== "string") continue;
      expect(shown).not.toMatch(/^(Out of range|Changed)/);
      expect(shaded(desc, beside(address), shown)).toBe(false);
    }
  });

  it("turns the explanation into a shaded warning when a setting cannot be used", () => {
    type(settings.alpha, 1.5);
    type(settings.coverage, 150);
    type(settings.seasonality, "additive");
    expect(value(beside(settings.alpha))).toBe(GUARD_TEXT.constant);
    expect(value(beside(settings.coverage))).toBe(GUARD_TEXT.coverage);
    expect(value(beside(settings.seasonality))).toBe(`${GUARD_TEXT.fixedHead}multiplicative${GUARD_TEXT.fixedTail}`);
    for (const key of ["alpha", "coverage", "seasonality"] as const) expect(shaded(desc, beside(settings[key]), value(beside(settings[key])))).toBe(true);
    // The other settings keep their explanations, unshaded.
    expect(shaded(desc, beside(settings.gamma), value(beside(settings.gamma)))).toBe(false);
  });

  it("clears the warning once a usable value is typed back", () => {
    type(settings.alpha, 0.4);
    type(settings.seasonality, "multiplicative");
    expect(shaded(desc, beside(settings.alpha), value(beside(settings.alpha)))).toBe(false);
    expect(shaded(desc, beside(settings.seasonality), value(beside(settings.seasonality)))).toBe(false);
  });
});
