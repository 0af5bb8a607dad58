import { EbbError, fitModel, predictionInterval, type FittedModel } from "../../engine";
import { DEMO_COMPANY, DEMO_CSV_PATH, DEMO_NOTICE } from "../../preview/demo/generate-demo";
import { readFileSync } from "fs";
import { nextLabels } from "../input/periodLabels";
import { parseSeriesText } from "../input/readSeries";
import type { Defaults, RunSettings } from "../options";

/** The demo's own defaults (its help shows these): the automatic choice, with 95% intervals. */
export const DEMO_DEFAULTS: Defaults = { seasonality: "auto", trend: "auto", coverage: 0.95 };

/** DESIGN "Cautions": shown with every demo outlook. */
export const CAUTION_TEXT =
  "Caution: forecasts are statistical estimates from past sales; stock-outs, promotions, price changes and one-off " +
  "events in the history distort them; review forecasts and intervals before committing orders, stock or budgets, " +
  "and follow your organisation's planning and approval rules.";

/**
 * `demo`: the `ahead` command with intervals on
 * the invented Larkmere demo data, printed as a readable table per product.
 */
export function runDemo(settings: RunSettings): number {
  const data = parseSeriesText(readFileSync(DEMO_CSV_PATH, "utf8"), DEMO_CSV_PATH);
  const labels = data.labels?.values ?? [];
  const coverage = settings.coverage as number;
  const out: string[] = [];
  out.push(`Ebb demo: ${DEMO_COMPANY}, next ${settings.horizon} months with ${percent(coverage)} prediction intervals`);
  out.push(DEMO_NOTICE, "");
  for (let k = 0; k < data.seriesCount; k++) {
    const column = data.column(k);
    const months = nextLabels(labels, column.values.length - 1, settings.horizon);
    let model: FittedModel;
    try {
      model = fitModel(column.values, settings.model);
      const band = predictionInterval(model, settings.horizon, coverage);
      out.push(column.name);
      out.push(`  ${describe(model)}`);
      out.push(table(["month", "forecast", "low", "high"], Array.from(band.forecast, (f, i) => [months?.[i] ?? `t+${i + 1}`, whole(f), whole(band.low[i]), whole(band.high[i])])));
    } catch (e) {
      if (!(e instanceof EbbError)) throw e;
      out.push(column.name, `  not forecast: ${e.message}`);
    }
    out.push("");
  }
  out.push(wrap(CAUTION_TEXT, 96));
  out.push("", `The same run as JSON: npm run --silent ebb -- ahead src/preview/demo/larkmere-demo.csv --horizon ${settings.horizon} --coverage ${coverage} --seasonality auto --trend auto`);
  process.stdout.write(out.join("\n") + "\n");
  return 0;
}

function describe(m: FittedModel): string {
  const { spec, shape, constants: c } = m;
  const parts = [`season length ${spec.period}`, `${spec.seasonality === "none" ? "no" : spec.seasonality} seasonality`, `${spec.trend === "none" ? "no" : spec.trend} trend`];
  const constants = [`alpha ${c.alpha.toFixed(3)}`];
  if (shape.hasTrend) constants.push(`beta ${c.beta.toFixed(3)}`);
  if (shape.seasonal) constants.push(`gamma ${c.gamma.toFixed(3)}`);
  if (shape.damped) constants.push(`phi ${c.phi.toFixed(3)}`);
  return `${parts.join(", ")}; ${constants.join(", ")}; one-step RMSE ${m.rmse.toFixed(1)}`;
}

function whole(v: number): string {
  return Math.round(v).toLocaleString("en-US");
}

function percent(c: number): string {
  return `${Number((c * 100).toFixed(1))}%`;
}

function table(header: string[], rows: string[][]): string {
  const widths = header.map((h, c) => Math.max(h.length, ...rows.map((r) => r[c].length)));
  const line = (cells: string[]) => "  " + cells.map((s, c) => (c === 0 ? s.padEnd(widths[c]) : s.padStart(widths[c]))).join("   ");
  return [line(header), ...rows.map(line)].join("\n");
}

function wrap(text: string, width: number): string {
  const lines: string[] = [];
  let line = "";
  for (const word of text.split(" ")) {
    if (line && line.length + 1 + word.length > width) {
      lines.push(line);
      line = word;
    } else line = line ? `${line} ${word}` : word;
  }
  if (line) lines.push(line);
  return lines.join("\n");
}
