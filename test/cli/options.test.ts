/**
 * Command-line options to engine options, in process. The accepted words and ranges come from
 * DESIGN.md ("Batch command" and "Worksheet functions": option words; constants in [0, 1]).
 */
import { CliError } from "../../src/cli/cliError";
import { toRunSettings } from "../../src/cli/options";

describe("toRunSettings", () => {
  it("uses DESIGN's defaults when nothing is typed", () => {
    const s = toRunSettings({});
    expect(s.model).toEqual({ period: 0, seasonality: "multiplicative", trend: "linear", start: "decomposition", cycles: undefined, alpha: undefined, beta: undefined, gamma: undefined, phi: undefined });
    expect(s.format).toBe("json");
    expect(s.coverage).toBeUndefined();
  });

  it("reads numbers and words, case-insensitively", () => {
    const s = toRunSettings({ period: "4", seasonality: "Additive", trend: "DAMPED", start: "classic", cycles: "3", alpha: "0.5", phi: "0.9", horizon: "8", coverage: "0.8", holdout: "6", format: "CSV" });
    expect(s.model).toMatchObject({ period: 4, seasonality: "additive", trend: "damped", start: "classic", cycles: 3, alpha: 0.5, phi: 0.9 });
    expect(s).toMatchObject({ horizon: 8, coverage: 0.8, holdout: 6, format: "csv" });
  });

  it("reads coverage as a fraction or a percentage (0.95 and 95 are the same)", () => {
    expect(toRunSettings({ coverage: "95" }).coverage).toBe(0.95);
    expect(toRunSettings({ coverage: "0.95" }).coverage).toBe(0.95);
    expect(toRunSettings({ coverage: "80.5" }).coverage).toBeCloseTo(0.805, 15);
  });

  it("lists the accepted words for an unknown word", () => {
    expect(() => toRunSettings({ trend: "wavy" })).toThrow(/--trend: .*linear, damped, none, auto/);
    expect(() => toRunSettings({ start: "guess" })).toThrow(/--start: .*decomposition, classic, optimized/);
    expect(() => toRunSettings({ format: "xml" })).toThrow(/--format: .*json, csv/);
  });

  it("names the option of a bad number", () => {
    const cases: [Record<string, string>, RegExp][] = [
      [{ alpha: "1.5" }, /--alpha/],
      [{ alpha: "high" }, /--alpha expects a number; got "high"/],
      [{ period: "2.5" }, /--period/],
      [{ cycles: "1" }, /--cycles/],
      [{ horizon: "0" }, /--horizon/],
      [{ coverage: "100" }, /--coverage: Coverage must be a fraction above 0 and below 1 \(such as 0.95\) or a percentage above 1 and below 100 \(such as 95\)/],
      [{ coverage: "1" }, /--coverage/],
      [{ workers: "0" }, /--workers/],
      [{ delimiter: "x" }, /--delimiter/],
      [{ decimal: ";" }, /--decimal/],
      [{ holdout: "-3" }, /--holdout/],
    ];
    for (const [raw, message] of cases) {
      expect(() => toRunSettings(raw)).toThrow(CliError);
      expect(() => toRunSettings(raw)).toThrow(message);
    }
  });
});
