/** The panel's form: coverage typed as a percentage (95) or a fraction (0.95), one rule with the batch command and the functions. */
import { readForm, type FormValues } from "../../src/taskpane/panel/readForm";

const form = (coveragePercent: string): FormValues => ({
  period: "12",
  seasonality: "multiplicative",
  trend: "linear",
  start: "decomposition",
  constantsMode: "fit",
  alpha: "",
  beta: "",
  gamma: "",
  phi: "",
  horizon: "12",
  coveragePercent,
  destination: "new-sheet",
  sheetName: "",
  areaCell: "",
});

describe("readForm coverage", () => {
  it("reads 95, 0.95 and 95% as the same 95% interval", () => {
    for (const typed of ["95", "0.95", " 95 ", "95%", "95 %"]) {
      const r = readForm(form(typed));
      expect(r.ok && r.value.coverage).toBe(0.95);
    }
  });

  it("says which forms it expects for anything else", () => {
    for (const typed of ["", "100", "0", "ninety"]) {
      const r = readForm(form(typed));
      expect(r.ok).toBe(false);
      if (!r.ok) {
        expect(r.field).toBe("coveragePercent");
        expect(r.message).toBe("Interval coverage: type a fraction above 0 and below 1 (such as 0.95) or a percentage above 1 and below 100 (such as 95).");
      }
    }
  });
});
