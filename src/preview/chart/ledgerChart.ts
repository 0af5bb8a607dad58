/**
 * The ledger's chart in the preview page (the embedded engine has no charts): actuals,
 * one-step forecasts and the outlook with its interval, read live from the ledger's cells,
 * drawn with Chart.js. Shown below the grid while a ledger's sheet is open.
 */
import { Chart, Filler, Legend, LinearScale, LineElement, PointElement, ScatterController, Title, Tooltip } from "chart.js";
import type { ChartSpec } from "../../ledger/describe/types";
import { el } from "../../taskpane/panel/dom";
import { parseA1 } from "../workbook/addresses";
import type { PreviewWorkbook } from "../workbook/previewWorkbook";

Chart.register(ScatterController, LineElement, PointElement, LinearScale, Legend, Title, Tooltip, Filler);

/** Series colours: Ebb's own (slate, amber, teal; the interval a pale band between low and high). */
const COLOURS = ["#2f4858", "#c97b12", "#1f7a72", "#7d8fa0", "#7d8fa0"];

export class LedgerChart {
  readonly element: HTMLElement;
  private readonly canvas: HTMLCanvasElement;
  private readonly heading: HTMLElement;
  private readonly specs = new Map<string, ChartSpec>();
  private chart?: Chart<"scatter", { x: number; y: number }[]>;
  private sheet = "";
  private queued = false;

  constructor(private readonly workbook: PreviewWorkbook) {
    this.heading = el("h2", { id: "ledger-chart-title", text: "Ledger chart" });
    this.canvas = el("canvas", { role: "img", "aria-labelledby": "ledger-chart-title" });
    this.element = el("section", { class: "ledger-chart", "aria-labelledby": "ledger-chart-title", hidden: true }, this.heading, el("div", { class: "chart-box" }, this.canvas));
    workbook.onChange(() => this.queue());
  }

  /** Remembers (or updates) the chart of a ledger sheet. */
  setSpec(sheet: string, spec: ChartSpec): void {
    this.specs.set(sheet, spec);
    if (sheet === this.sheet) this.draw();
  }

  showSheet(sheet: string): void {
    this.sheet = sheet;
    this.draw();
  }

  private queue(): void {
    if (this.queued || !this.specs.has(this.sheet)) return;
    this.queued = true;
    requestAnimationFrame(() => {
      this.queued = false;
      this.draw();
    });
  }

  private draw(): void {
    const spec = this.specs.get(this.sheet);
    if (!spec || !this.workbook.sheetNames().includes(this.sheet)) {
      this.element.hidden = true;
      return;
    }
    this.element.hidden = false;
    this.heading.textContent = spec.title;
    this.canvas.setAttribute("aria-label", `${spec.title}: ${spec.series.map((s) => s.label).join(", ")}, by period.`);
    const datasets = spec.series.map((s, i) => ({
      label: s.label,
      data: this.points(s.x, s.y),
      showLine: true,
      borderColor: COLOURS[i % COLOURS.length],
      backgroundColor: i === 4 ? "rgba(125, 143, 160, 0.18)" : COLOURS[i % COLOURS.length],
      borderDash: i >= 3 ? [4, 3] : undefined,
      borderWidth: i === 0 ? 2 : 1.5,
      pointRadius: i === 0 ? 1.5 : 0,
      fill: i === 4 ? 3 : false,
    }));
    if (this.chart) {
      this.chart.data.datasets = datasets;
      this.chart.update("none");
      return;
    }
    this.chart = new Chart(this.canvas, {
      type: "scatter",
      data: { datasets },
      options: {
        animation: false,
        maintainAspectRatio: false,
        scales: { x: { title: { display: true, text: "Period" } }, y: { title: { display: true, text: "Value" } } },
        plugins: { legend: { position: "bottom" } },
      },
    });
  }

  /** (x, y) pairs from two ranges of the ledger sheet, numbers only. */
  private points(xRange: string, yRange: string): { x: number; y: number }[] {
    const xs = this.column(xRange);
    const ys = this.column(yRange);
    const out: { x: number; y: number }[] = [];
    for (let i = 0; i < Math.min(xs.length, ys.length); i++) {
      const x = xs[i];
      const y = ys[i];
      if (typeof x === "number" && typeof y === "number" && Number.isFinite(x) && Number.isFinite(y)) out.push({ x, y });
    }
    return out;
  }

  private column(range: string): unknown[] {
    const [a, b] = range.split(":");
    const p = parseA1(a);
    const q = parseA1(b ?? a);
    if (!p || !q) return [];
    const out: unknown[] = [];
    for (let r = p.row; r <= q.row; r++) out.push(this.workbook.cell(this.sheet, r, p.col).value);
    return out;
  }
}
