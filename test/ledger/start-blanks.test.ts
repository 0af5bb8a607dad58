/**
 * A history the engine can only start by skipping leading blanks or filling blanks of the start
 * window (src/engine/start/fillGaps.ts) cannot be written as start formulas over the first rows:
 * the ledger refuses it with what to do, instead of writing a ledger whose own formulas
 * disagree with the engine (before this guard: 494 findings on an untouched ledger).
 * The engine still forecasts such a history (test/engine/startBlanks.test.ts).
 */
import { fitModel } from "../../src/engine";
import { describeLedger } from "../../src/ledger";

function series(n: number, lead: number, holes: number[]): (number | null)[] {
  const h: (number | null)[] = [];
  for (let t = 0; t < n; t++) h.push(t < lead || holes.includes(t) ? null : Math.round(200 + 2 * t + 40 * Math.sin((2 * Math.PI * t) / 12)));
  return h;
}
const settings = { period: 12, seasonality: "additive", trend: "linear" } as const;
const describe12 = (history: (number | null)[]) => describeLedger({ history, name: "Invented item", settings, horizon: 6, coverage: 0.95, anchor: { sheet: "Ledger", cell: "A1" } } as Parameters<typeof describeLedger>[0]);

it("a history that begins with blanks is refused with the period to start from", () => {
  const history = series(60, 3, []);
  expect(() => fitModel(history, settings)).not.toThrow();
  expect(() => describe12(history)).toThrow(/begins with 3 blank periods.*period 4/);
});

it("blanks inside the start window are refused, naming each period and the engine's fill", () => {
  const history = series(60, 0, [4, 5]);
  expect(fitModel(history, settings).start.detail?.filled?.at).toEqual([4, 5]);
  expect(() => describe12(history)).toThrow(/period 5 \(the engine would use [\d.]+\), period 6/);
});

it("a complete start window is written as before", () => {
  expect(() => describe12(series(60, 0, [30]))).not.toThrow();
});
