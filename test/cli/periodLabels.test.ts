/** Period labels continued past the last value (calendar arithmetic: common practice). */
import { looksLikePeriodNumbers, nextLabels } from "../../src/cli/input/periodLabels";

describe("nextLabels", () => {
  it.each([
    [["2024-11", "2024-12"], ["2025-01", "2025-02"]],
    [["2024/11", "2024/12"], ["2025/01", "2025/02"]],
    [["202411", "202412"], ["202501", "202502"]],
    [["2024-Q3", "2024-Q4"], ["2025-Q1", "2025-Q2"]],
    [["2024Q3", "2024Q4"], ["2025Q1", "2025Q2"]],
    [["Q3 2024", "Q4 2024"], ["Q1 2025", "Q2 2025"]],
    [["20243", "20244"], ["20251", "20252"]],
    [["2024-11-01", "2024-12-01"], ["2025-01-01", "2025-02-01"]],
    [["2024-11-30", "2024-12-31"], ["2025-01-31", "2025-02-28"]],
    [["2024-12-16", "2024-12-23"], ["2024-12-30", "2025-01-06"]],
    [["2023", "2024"], ["2025", "2026"]],
    [["7", "8"], ["9", "10"]],
  ])("%j continues as %j", (labels, next) => {
    expect(nextLabels(labels, labels.length - 1, 2)).toEqual(next);
  });

  it("continues from the series' own last value, not the file's last row", () => {
    expect(nextLabels(["2024-10", "2024-11", "2024-12"], 1, 1)).toEqual(["2024-12"]);
  });

  it("gives nothing for labels that do not run evenly or are not periods", () => {
    // A gap early in the history does not matter; the last three labels must run evenly.
    expect(nextLabels(["2023-12", "2024-02", "2024-03", "2024-04"], 3, 1)).toEqual(["2024-05"]);
    expect(nextLabels(["2024-01", "2024-03", "2024-04"], 2, 1)).toBeUndefined();
    expect(nextLabels(["2024-01", "2024-03", "2024-06"], 2, 1)).toBeUndefined();
    expect(nextLabels(["spring", "summer"], 1, 1)).toBeUndefined();
    expect(nextLabels(["2024-12"], 0, 1)).toBeUndefined();
  });
});

describe("looksLikePeriodNumbers", () => {
  it("knows yyyymm months, yyyyq quarters and years from sales", () => {
    expect(looksLikePeriodNumbers(["202111", "202112", "202201"])).toBe(true);
    expect(looksLikePeriodNumbers(["20214", "20221", "20222"])).toBe(true);
    expect(looksLikePeriodNumbers(["2019", "2020", "2021"])).toBe(true);
    expect(looksLikePeriodNumbers(["1", "2", "3"])).toBe(false);
    expect(looksLikePeriodNumbers(["10", "11", "12"])).toBe(false);
    expect(looksLikePeriodNumbers(["525", "610", "480"])).toBe(false);
  });
});
