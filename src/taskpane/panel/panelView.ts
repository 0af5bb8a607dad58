/**
 * The Ebb ledger panel's page: plain form controls in a fixed order, so everything can be
 * reached with Tab and read by a screen reader. No logic here; mountLedgerPanel wires it.
 */
import { AUTO_TRENDS } from "../../engine";
import { ACTIONS } from "../../ledger/actions";
import { CAUTIONS, STOCK_CAUTION } from "./cautions";
import { el } from "./dom";
import type { FormValues } from "./readForm";

export interface PanelView {
  root: HTMLElement;
  form: HTMLFormElement;
  pick: HTMLButtonElement;
  historySummary: HTMLElement;
  period: HTMLInputElement;
  periodFound: HTMLElement;
  seasonality: HTMLSelectElement;
  trend: HTMLSelectElement;
  start: HTMLSelectElement;
  constantsFit: HTMLInputElement;
  constantsTyped: HTMLInputElement;
  constants: Record<"alpha" | "beta" | "gamma" | "phi", HTMLInputElement>;
  horizon: HTMLInputElement;
  coverage: HTMLInputElement;
  toNewSheet: HTMLInputElement;
  toArea: HTMLInputElement;
  sheetName: HTMLInputElement;
  areaCell: HTMLInputElement;
  correctionsColumn: HTMLInputElement;
  reasonsColumn: HTMLInputElement;
  useSelectedCell: HTMLButtonElement;
  write: HTMLButtonElement;
  ledgerList: HTMLSelectElement;
  refreshLedgers: HTMLButtonElement;
  extend: HTMLButtonElement;
  verify: HTMLButtonElement;
  fit: HTMLButtonElement;
  refreshInterval: HTMLButtonElement;
  confirm: HTMLElement;
  progress: HTMLElement;
  progressBar: HTMLProgressElement;
  progressText: HTMLElement;
  message: HTMLElement;
  findings: HTMLElement;
  findingsList: HTMLElement;
}

function field(label: string, control: HTMLElement, hint?: HTMLElement): HTMLElement {
  return el("div", { class: "ebb-field" }, el("label", { for: control.id, text: label }), control, ...(hint ? [hint] : []));
}

function select(id: string, options: [string, string][], described?: string): HTMLSelectElement {
  const s = el("select", { id, "aria-describedby": described });
  for (const [value, text] of options) s.append(el("option", { value, text }));
  return s;
}

function input(id: string, attrs: Record<string, string | number | boolean | undefined> = {}): HTMLInputElement {
  return el("input", { id, type: "text", autocomplete: "off", spellcheck: "false", ...attrs });
}

function radio(id: string, name: string, value: string, checked: boolean): HTMLInputElement {
  return el("input", { id, type: "radio", name, value, checked });
}

export function buildPanelView(): PanelView {
  const pick = el("button", { type: "button", id: "ebb-pick", class: "ebb-button", text: "Use the selected cells" });
  const historySummary = el("p", {
    id: "ebb-history-summary",
    class: "ebb-summary",
    text: "No history chosen yet. Select a column of actuals, oldest at the top (a header in the first cell is fine), then press the button.",
  });

  const period = input("ebb-period", { inputmode: "numeric", "aria-describedby": "ebb-period-found" });
  const periodFound = el("span", { id: "ebb-period-found", class: "ebb-hint", text: "Blank: found from the history." });
  const seasonality = select("ebb-seasonality", [
    ["multiplicative", "multiplicative (grows with the level)"],
    ["additive", "additive (a steady amount)"],
    ["auto", "auto: tested; none if no season found"],
  ]);
  const trend = select("ebb-trend", [
    ["linear", "linear"],
    ["damped", "damped (levels off)"],
    ["none", "none"],
    ["auto", `auto: ${AUTO_TRENDS.join(" or ")}, the lower AICc`],
  ]);
  const start = select("ebb-start", [
    ["decomposition", "decomposition of the first seasons"],
    ["classic", "classic (first two seasons)"],
  ]);
  const constantsFit = radio("ebb-constants-fit", "ebb-constants", "fit", true);
  const constantsTyped = radio("ebb-constants-typed", "ebb-constants", "typed", false);
  const constants = {
    alpha: input("ebb-alpha", { inputmode: "decimal", disabled: true }),
    beta: input("ebb-beta", { inputmode: "decimal", disabled: true }),
    gamma: input("ebb-gamma", { inputmode: "decimal", disabled: true }),
    phi: input("ebb-phi", { inputmode: "decimal", disabled: true }),
  };
  const constantsBox = el(
    "fieldset",
    { class: "ebb-constants" },
    el("legend", { text: "Smoothing constants" }),
    el("div", { class: "ebb-choice" }, constantsFit, el("label", { for: constantsFit.id, text: "Fit them to the history" })),
    el("div", { class: "ebb-choice" }, constantsTyped, el("label", { for: constantsTyped.id, text: "Use my values (blank ones are fitted)" })),
    el(
      "div",
      { class: "ebb-row4" },
      field("Alpha", constants.alpha),
      field("Beta", constants.beta),
      field("Gamma", constants.gamma),
      field("Phi", constants.phi),
    ),
  );

  const horizon = input("ebb-horizon", { inputmode: "numeric", value: "12" });
  const coverage = input("ebb-coverage", { inputmode: "decimal", value: "95" });

  const toNewSheet = radio("ebb-to-sheet", "ebb-destination", "new-sheet", true);
  const toArea = radio("ebb-to-area", "ebb-destination", "area", false);
  const sheetName = input("ebb-sheet-name", { placeholder: "made from the series name" });
  const areaCell = input("ebb-area-cell", { placeholder: "for example Sheet1!H2", disabled: true });
  const useSelectedCell = el("button", { type: "button", id: "ebb-use-cell", class: "ebb-button small", text: "Use the selected cell", disabled: true });

  const correctionsColumn = input("ebb-corrections-column", { placeholder: "optional" });
  const reasonsColumn = input("ebb-reasons-column", { placeholder: "optional" });
  const correctionsHint = el("p", {
    class: "ebb-hint",
    text: "Type a column such as C or Corrections!C. Corrections sit beside the actuals, row for row: a figure replaces the actual in the updates (the ledger shows both, with the reason); a blank keeps the actual.",
  });

  const write = el("button", { type: "submit", id: "ebb-write", class: "ebb-button primary", text: ACTIONS.write });
  const form = el(
    "form",
    { class: "ebb-form", novalidate: true },
    el(
      "fieldset",
      {},
      el("legend", { text: "1  History" }),
      pick,
      historySummary,
      field("Corrections column", correctionsColumn),
      field("Reasons column", reasonsColumn),
      correctionsHint,
    ),
    el(
      "fieldset",
      {},
      el("legend", { text: "2  Model" }),
      field("Season length (periods)", period, periodFound),
      field("Seasonality", seasonality),
      field("Trend", trend),
      field("Start", start),
      constantsBox,
    ),
    el(
      "fieldset",
      {},
      el("legend", { text: "3  Outlook" }),
      field("Periods ahead", horizon),
      field("Interval coverage (%)", coverage),
    ),
    el(
      "fieldset",
      {},
      el("legend", { text: "4  Where to write" }),
      el("div", { class: "ebb-choice" }, toNewSheet, el("label", { for: toNewSheet.id, text: "A new sheet" })),
      field("Sheet name", sheetName),
      el("div", { class: "ebb-choice" }, toArea, el("label", { for: toArea.id, text: "An empty area, starting at a cell" })),
      field("Top-left cell", areaCell),
      useSelectedCell,
    ),
    write,
  );

  const ledgerList = el("select", { id: "ebb-ledger-list" });
  const refreshLedgers = el("button", { type: "button", id: "ebb-refresh", class: "ebb-button small", text: "Look again" });
  const extend = el("button", { type: "button", id: "ebb-extend", class: "ebb-button", text: ACTIONS.extend });
  const verify = el("button", { type: "button", id: "ebb-verify", class: "ebb-button", text: ACTIONS.verify });
  const fit = el("button", { type: "button", id: "ebb-fit", class: "ebb-button", text: ACTIONS.fit });
  const refreshInterval = el("button", { type: "button", id: "ebb-refresh-interval", class: "ebb-button", text: ACTIONS.refreshInterval });
  const existing = el(
    "section",
    { class: "ebb-existing", "aria-labelledby": "ebb-existing-title" },
    el("h3", { id: "ebb-existing-title", text: "Ledgers in this workbook" }),
    el("div", { class: "ebb-field" }, el("label", { for: ledgerList.id, text: "Ledger" }), ledgerList, refreshLedgers),
    el("div", { class: "ebb-actions" }, extend, verify, fit, refreshInterval),
    el("p", {
      class: "ebb-hint",
      text: `${ACTIONS.extend}: type the new values below the history, then press the button (a ledger written before this panel knew its history: select that column first). Rows are added; nothing else changes.`,
    }),
  );

  const confirm = el("div", { id: "ebb-confirm", class: "ebb-confirm", role: "group", "aria-labelledby": "ebb-confirm-text", hidden: true });
  const progressBar = el("progress", { id: "ebb-progress-bar", max: 1, value: 0, "aria-labelledby": "ebb-progress-text" });
  const progressText = el("span", { id: "ebb-progress-text" });
  const progress = el("div", { class: "ebb-progress", hidden: true }, progressBar, progressText);
  const message = el("p", { id: "ebb-message", class: "ebb-message", role: "status", "aria-live": "polite" });
  const findingsList = el("ul", { id: "ebb-findings-list", class: "ebb-findings-list" });
  const findings = el(
    "section",
    { class: "ebb-findings", "aria-labelledby": "ebb-findings-title", hidden: true },
    el("h3", { id: "ebb-findings-title", text: "Cells that differ" }),
    findingsList,
  );

  const root = el(
    "div",
    { class: "ebb-panel" },
    el("h2", { class: "ebb-title", text: "Ebb ledger" }),
    el("p", { class: "ebb-intro", text: "Writes a forecast as plain formulas, one row per period, that anyone can follow and recompute." }),
    el("details", { class: "ebb-cautions", open: true }, el("summary", { text: "Before you rely on a forecast" }), el("p", { text: CAUTIONS }), el("p", { text: STOCK_CAUTION })),
    form,
    confirm,
    progress,
    message,
    existing,
    findings,
  );
  return {
    root,
    form,
    pick,
    historySummary,
    period,
    periodFound,
    seasonality,
    trend,
    start,
    constantsFit,
    constantsTyped,
    constants,
    horizon,
    coverage,
    toNewSheet,
    toArea,
    sheetName,
    areaCell,
    correctionsColumn,
    reasonsColumn,
    useSelectedCell,
    write,
    ledgerList,
    refreshLedgers,
    extend,
    verify,
    fit,
    refreshInterval,
    confirm,
    progress,
    progressBar,
    progressText,
    message,
    findings,
    findingsList,
  };
}

export function formValues(v: PanelView): FormValues {
  return {
    period: v.period.value,
    seasonality: v.seasonality.value,
    trend: v.trend.value,
    start: v.start.value,
    constantsMode: v.constantsTyped.checked ? "typed" : "fit",
    alpha: v.constants.alpha.value,
    beta: v.constants.beta.value,
    gamma: v.constants.gamma.value,
    phi: v.constants.phi.value,
    horizon: v.horizon.value,
    coveragePercent: v.coverage.value,
    destination: v.toArea.checked ? "area" : "new-sheet",
    sheetName: v.sheetName.value,
    areaCell: v.areaCell.value,
    correctionsColumn: v.correctionsColumn.value,
    reasonsColumn: v.reasonsColumn.value,
  };
}
