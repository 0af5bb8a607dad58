/**
 * The preview's T.INV (the embedded formula engine's, replaced at full precision because the
 * ledger's interval quantile is a T.INV cell and its check allows 1e-9). Expected values: base R
 * 4.2's qt(p, floor(df)), printed to 15 digits. The engine's own T.INV was off by up to 3.9e-8
 * on these arguments, so the 1e-12 asked here fails without the replacement.
 */
import { createEbbWorkbook } from "../../src/functions/hyperformula";

const R_QT: [number, number, number][] = [
  [0.975, 1, 12.7062047361747],
  [0.9, 2, 1.88561808316413],
  [0.975, 26, 2.05552943864287],
  [0.995, 27, 2.77068295712221],
  [0.9, 104, 1.28974481602908],
  [0.975, 400, 1.96591234322946],
  [0.6, 7.9, 0.263166861352023], // degrees truncated, as spreadsheets do: qt(0.6, 7)
];

describe("T.INV in the preview", () => {
  const hf = createEbbWorkbook({ Sheet1: [R_QT.map(([p, df]) => `=T.INV(${p},${df})`), ["=T.INV(0,5)", "=T.INV(1,5)", "=T.INV(0.9,0)", '=T.INV("x",5)']] }, { smartRounding: false });

  test.each(R_QT.map((c, i) => [...c, i] as const))("T.INV(%p, %p) = qt = %p to 1e-12", (_p, _df, expected, col) => {
    const found = hf.getCellValue({ sheet: 0, row: 0, col });
    expect(typeof found).toBe("number");
    expect(Math.abs((found as number) - expected)).toBeLessThanOrEqual(1e-12 * Math.abs(expected));
  });

  test("a probability outside (0, 1), fewer than 1 degree or text is an error, as with the built-in", () => {
    for (let col = 0; col < 4; col++) {
      const v = hf.getCellValue({ sheet: 0, row: 1, col }) as { type?: string };
      expect(typeof v).toBe("object");
      expect(["NUM", "VALUE"]).toContain(v.type);
    }
  });
});
