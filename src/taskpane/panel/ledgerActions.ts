/**
 * What the panel's buttons do: pick a history, write ledgers, add new actuals, check a ledger
 * against the engine, and fit its constants. Every write goes through the ask-first step when
 * a target cell holds anything.
 */
import { columnLetters } from "../../ledger/describe/addresses";
import {
  describeLedger,
  extendLedger,
  fitLedgerConstants,
  readLedger,
  refreshEngineCells,
  verifyLedger,
  type LedgerDescription,
  type LedgerInput,
} from "../../ledger";
import type { LedgerLocation, WorkbookPort } from "../port";
import { ask } from "./confirmStep";
import { el } from "./dom";
import { describePick, foundPeriod, pickHistories, type HistoryPick } from "./historyPick";
import { messageOf } from "./messages";
import type { PanelView } from "./panelView";
import { formValues } from "./panelView";
import { parseArea, readForm, sheetNameFor } from "./readForm";
import { Progress, yieldToPage } from "./progress";

const fixed4 = (v: number): string => (Number.isFinite(v) ? v.toFixed(4) : String(v));

export class LedgerActions {
  private picks: HistoryPick[] = [];
  /** Where each ledger written in this session took its history from (by tag), for adding actuals. */
  private readonly sources = new Map<string, HistoryPick>();
  private ledgerList: LedgerLocation[] = [];
  private busy = false;
  private readonly progress: Progress;
  private periodTyped = false;

  constructor(private readonly view: PanelView, private readonly port: WorkbookPort) {
    this.progress = new Progress(view);
    view.period.addEventListener("input", () => (this.periodTyped = view.period.value.trim() !== ""));
  }

  /** Runs one action at a time, with its message; the buttons are disabled meanwhile. */
  async guard(work: () => Promise<void>, clearMessage = true): Promise<void> {
    if (this.busy) {
      this.say("Still working on the last request; one moment.");
      return;
    }
    this.busy = true;
    this.view.root.setAttribute("aria-busy", "true");
    this.setButtons(false);
    if (clearMessage) this.say("");
    try {
      await work();
    } catch (e) {
      this.say(messageOf(e), "error");
    } finally {
      this.progress.hide();
      this.busy = false;
      this.view.root.removeAttribute("aria-busy");
      this.setButtons(true);
    }
  }

  say(text: string, tone: "plain" | "error" | "done" = "plain"): void {
    this.view.message.textContent = text;
    this.view.message.dataset.tone = tone;
  }

  /** "Use the selected cells": one history per selected column; a single cell means its whole column. */
  async pickHistory(): Promise<void> {
    let block = await this.port.selection();
    const rows = block.values.length;
    const cols = rows ? block.values[0].length : 0;
    if (rows === 1 && cols === 1) {
      const last = await this.port.lastUsedRow(block.sheet);
      if (last >= 0) block = await this.port.read(block.sheet, 0, block.left, last + 1, 1);
    }
    const result = pickHistories(block);
    if (!result.ok) {
      this.picks = [];
      this.view.historySummary.textContent = result.message;
      this.say(result.message, "error");
      return;
    }
    this.picks = result.picks;
    const first = result.picks[0];
    const found = foundPeriod(first.values);
    this.view.periodFound.textContent =
      found > 1 ? `Found in the history: ${found}.` : "No repeating season found in the history (1); type the season length if you know it.";
    if (!this.periodTyped) this.view.period.value = found > 1 ? String(found) : "";
    this.view.historySummary.textContent =
      result.picks.length === 1
        ? `History: ${describePick(first)}.`
        : `${result.picks.length} histories, one ledger each on its own sheet: ${result.picks.map((p) => p.name).join("; ")}.`;
    this.say(result.picks.length === 1 ? "History chosen. Check the settings, then write the ledger." : "Histories chosen. Each gets its own ledger sheet.");
  }

  async useSelectedCell(): Promise<void> {
    const block = await this.port.selection();
    const letters = columnLetters(block.left);
    this.view.areaCell.value = `${quoteIfNeeded(block.sheet)}!${letters}${block.top + 1}`;
  }

  /** "Write ledger": one ledger per chosen history; long runs show progress and yield between series. */
  async writeLedgers(): Promise<void> {
    if (this.picks.length === 0) {
      this.say("Choose the history first: select its column and press \"Use the selected cells\".", "error");
      this.view.pick.focus();
      return;
    }
    const values = formValues(this.view);
    const form = readForm(values);
    if (!form.ok) {
      this.say(form.message, "error");
      this.fieldFor(form.field)?.focus();
      return;
    }
    let area: { sheet: string; cell: string } | undefined;
    if (values.destination === "area") {
      if (this.picks.length > 1) {
        this.say("An area holds one ledger. Choose \"A new sheet\" to write one ledger per column.", "error");
        return;
      }
      area = parseArea(values.areaCell, this.picks[0].sheet);
      if (!area) {
        this.say("Top-left cell: type a cell such as H2 or Sheet1!H2, or press \"Use the selected cell\".", "error");
        this.view.areaCell.focus();
        return;
      }
    }
    const written: LedgerDescription[] = [];
    const total = this.picks.length;
    for (let i = 0; i < total; i++) {
      const pick = this.picks[i];
      if (total > 1) this.progress.show(i, total, `Fitting ${i + 1} of ${total}: ${pick.name}`);
      await yieldToPage();
      const taken = await this.port.sheetNames();
      const sheet = area?.sheet ?? (total === 1 && values.sheetName.trim() ? values.sheetName.trim() : sheetNameFor(pick.name, taken));
      const input: LedgerInput = {
        history: pick.values,
        name: pick.name,
        settings: { ...form.value.settings },
        horizon: form.value.horizon,
        coverage: form.value.coverage,
        anchor: { sheet, cell: area?.cell ?? "A1" },
      };
      let desc: LedgerDescription;
      try {
        desc = describeLedger(input);
      } catch (e) {
        this.say(`${pick.name}: ${messageOf(e)}${i > 0 ? ` (${i} ledger${i > 1 ? "s" : ""} written before this one)` : ""}`, "error");
        return;
      }
      let outcome = await this.port.writeLedger(desc, false);
      if (outcome.status === "needs-confirmation") {
        const yes = await ask(this.view.confirm, `Ledger for "${pick.name}": ${outcome.message}`, "Write over it");
        if (!yes) {
          this.say(`Nothing written for "${pick.name}".${written.length ? ` ${written.length} ledger(s) were written before it.` : ""}`);
          return;
        }
        outcome = await this.port.writeLedger(desc, true);
      }
      this.sources.set(desc.tag, pick);
      this.port.ledgerShown?.(desc);
      written.push(desc);
      await yieldToPage();
    }
    if (total > 1) this.progress.show(total, total, `Wrote ${total} ledgers.`);
    const last = written[written.length - 1];
    await this.refreshLedgerList(last ? { sheet: last.sheet, cell: last.anchor, tag: last.tag } : undefined);
    await this.port.select(last.sheet, last.anchor, false);
    this.say(written.length === 1 ? wroteMessage(last) : `Wrote ${written.length} ledgers: ${written.map((d) => `"${d.sheet}"`).join(", ")}.`, "done");
  }

  /** Fills the list of ledgers found in the workbook; keeps (or sets) the chosen one. */
  async refreshLedgerList(choose?: LedgerLocation): Promise<void> {
    const before = this.chosenLedger();
    this.ledgerList = await this.port.ledgers();
    const list = this.view.ledgerList;
    list.replaceChildren(
      ...(this.ledgerList.length
        ? this.ledgerList.map((l, i) => el("option", { value: String(i), text: `${l.sheet}, from ${l.cell}` }))
        : [el("option", { value: "", text: "No ledger yet" })]),
    );
    const want = choose ?? before;
    const index = want ? this.ledgerList.findIndex((l) => l.tag === want.tag) : -1;
    list.value = String(Math.max(0, index));
  }

  private chosenLedger(): LedgerLocation | undefined {
    const i = Number(this.view.ledgerList.value);
    return Number.isInteger(i) ? this.ledgerList[i] : undefined;
  }

  private async requireLedger(): Promise<LedgerLocation | undefined> {
    if (this.ledgerList.length === 0) await this.refreshLedgerList();
    const chosen = this.chosenLedger();
    if (!chosen) this.say("There is no ledger in this workbook yet. Write one first.", "error");
    return chosen;
  }

  /** "Add new actuals": the values below the history the ledger was written from become new rows. */
  async extendLedger(): Promise<void> {
    const loc = await this.requireLedger();
    if (!loc) return;
    const read = await this.port.reader(loc.sheet, loc.cell);
    const { input } = readLedger(read, { sheet: loc.sheet, cell: loc.cell });
    const history = await this.currentHistoryFor(loc);
    if (!history) return;
    const known = Array.from(input.history, (v) => (v === undefined ? null : v));
    const mismatch = known.findIndex((v, t) => !sameActual(v, history.values[t] ?? null));
    if (history.values.length < known.length || mismatch >= 0) {
      const t = mismatch >= 0 ? mismatch : history.values.length;
      this.say(
        `The chosen history differs from the one this ledger was written from at period ${t + 1} (${history.sheet}!${columnLetters(history.col)}${history.firstRow + t + 1}). ` +
          "Adding actuals only appends new periods; for a corrected history, write a new ledger.",
        "error",
      );
      return;
    }
    const added = history.values.slice(known.length);
    if (!added.some((v) => v !== null)) {
      this.say(`No new actuals below the history (the ledger already has ${known.length} periods). Type them under the last actual, then press the button again.`);
      return;
    }
    const ext = extendLedger(read, { sheet: loc.sheet, cell: loc.cell }, added);
    if (!(await this.clearToWrite(ext.sheet, [boundingRange(ext.append)], "the new ledger rows"))) {
      this.say("Nothing added.");
      return;
    }
    await this.port.writeExtension(ext);
    this.port.ledgerShown?.(ext.description);
    const count = added.length;
    this.say(`Added ${count} period${count > 1 ? "s" : ""} to the ledger on "${loc.sheet}"; the outlook and scorecard now start after period ${known.length + count}.`, "done");
  }

  /** "Check against the engine": lists every cell that differs; each entry selects its cell. */
  async verifyLedger(): Promise<void> {
    const loc = await this.requireLedger();
    if (!loc) return;
    const read = await this.port.reader(loc.sheet, loc.cell);
    const report = verifyLedger(read, { sheet: loc.sheet, cell: loc.cell });
    const list = this.view.findingsList;
    list.replaceChildren(
      ...report.problems.map((p) => {
        const button = el("button", { type: "button", class: "ebb-finding", text: `${p.address}: ${p.message}` });
        button.dataset.address = p.address;
        button.addEventListener("click", () => void this.port.select(report.sheet, p.address, true));
        return el("li", {}, button);
      }),
    );
    this.view.findings.hidden = report.problems.length === 0;
    if (report.expected) this.port.ledgerShown?.(report.expected);
    if (report.ok) {
      this.say(`All ${report.checked} cells of the ledger on "${loc.sheet}" match the engine.`, "done");
    } else {
      const n = report.problems.length;
      const follow = report.downstream.length ? ` ${report.downstream.length} more cell(s) differ only because they read those.` : "";
      this.say(`${n} cell${n > 1 ? "s" : ""} of the ledger on "${loc.sheet}" ${n > 1 ? "differ" : "differs"} from the engine; see the list below.${follow}`, "error");
    }
  }

  /** "Fit constants into its settings": asks before replacing the constants in use. */
  async fitLedger(): Promise<void> {
    const loc = await this.requireLedger();
    if (!loc) return;
    const read = await this.port.reader(loc.sheet, loc.cell);
    this.progress.show(0, 1, `Fitting the constants of the ledger on "${loc.sheet}"`);
    await yieldToPage();
    const before = readLedger(read, { sheet: loc.sheet, cell: loc.cell }).inUse;
    const fit = fitLedgerConstants(read, { sheet: loc.sheet, cell: loc.cell });
    this.progress.hide();
    const changes = (["alpha", "beta", "gamma", "phi"] as const)
      .map((k) => `${k} ${typeof before[k] === "number" ? fixed4(before[k] as number) : String(before[k] ?? "blank")} to ${fixed4(fit.constants[k])}`)
      .join(", ");
    const yes = await ask(this.view.confirm, `Replace the constants in the ledger's settings on "${loc.sheet}" (${changes})?`, "Write the fitted constants");
    if (!yes) {
      this.say("The settings were left as they are.");
      return;
    }
    await this.port.writeCells(fit.sheet, fit.cells);
    this.port.ledgerShown?.(fit.description);
    this.say(`Wrote the fitted constants (${changes}); the ledger has recomputed.`, "done");
  }

  /**
   * "Update the simulated interval": a multiplicative ledger's interval gaps come from the
   * engine's seeded simulation, which no formula can redo; after a setting changes they are
   * recomputed here (asking first, since they hold numbers).
   */
  async refreshLedger(): Promise<void> {
    const loc = await this.requireLedger();
    if (!loc) return;
    const read = await this.port.reader(loc.sheet, loc.cell);
    const cells = refreshEngineCells(read, { sheet: loc.sheet, cell: loc.cell });
    if (cells.length === 0) {
      this.say(`The ledger on "${loc.sheet}" computes its whole interval with formulas; there is nothing to update.`);
      return;
    }
    const yes = await ask(
      this.view.confirm,
      `Replace the ${cells.length} simulated interval numbers of the ledger on "${loc.sheet}" with the engine's values at the settings in use?`,
      "Update them",
    );
    if (!yes) {
      this.say("The simulated interval was left as it is.");
      return;
    }
    await this.port.writeCells(loc.sheet, cells);
    this.say(`Updated ${cells.length} simulated interval numbers on "${loc.sheet}".`, "done");
  }

  /** The history to extend from: the source of a ledger written this session, else the selection. */
  private async currentHistoryFor(loc: LedgerLocation): Promise<HistoryPick | undefined> {
    const source = this.sources.get(loc.tag);
    if (source) {
      const last = await this.port.lastUsedRow(source.sheet);
      const block = await this.port.read(source.sheet, source.firstRow, source.col, Math.max(1, last - source.firstRow + 1), 1);
      const result = pickHistories({ ...block, values: block.values });
      if (result.ok) return { ...result.picks[0], name: source.name };
      this.say(result.message, "error");
      return undefined;
    }
    await this.pickHistory();
    if (this.picks.length !== 1) {
      this.say("Select the ledger's history column (with the new actuals below it), then press \"Add new actuals\".", "error");
      return undefined;
    }
    return this.picks[0];
  }

  /** True when the ranges are empty, or the person agreed to write over what is there. */
  private async clearToWrite(sheet: string, ranges: string[], what: string): Promise<boolean> {
    const used = await this.port.firstUsedCell(sheet, ranges);
    if (!used) return true;
    return ask(
      this.view.confirm,
      `The sheet "${sheet}" already holds something at ${used}, where ${what} would go. Write over it?`,
      "Write over it",
    );
  }

  private fieldFor(field: string): HTMLElement | undefined {
    const v = this.view;
    const map: Record<string, HTMLElement> = {
      period: v.period,
      horizon: v.horizon,
      coveragePercent: v.coverage,
      alpha: v.constants.alpha,
      beta: v.constants.beta,
      gamma: v.constants.gamma,
      phi: v.constants.phi,
      areaCell: v.areaCell,
      sheetName: v.sheetName,
    };
    return map[field];
  }

  private setButtons(enabled: boolean): void {
    const v = this.view;
    for (const b of [v.pick, v.write, v.extend, v.verify, v.fit, v.refreshInterval, v.refreshLedgers]) b.disabled = !enabled;
    v.useSelectedCell.disabled = !enabled || !v.toArea.checked;
  }
}

function wroteMessage(d: LedgerDescription): string {
  const k = d.constants;
  const parts = [`alpha ${fixed4(k.alpha)}`];
  if (d.spec.trend !== "none") parts.push(`beta ${fixed4(k.beta)}`);
  if (d.spec.seasonality !== "none") parts.push(`gamma ${fixed4(k.gamma)}`);
  if (d.spec.trend === "damped") parts.push(`phi ${fixed4(k.phi)}`);
  return (
    `Wrote the ledger for "${d.name}" on the sheet "${d.sheet}" from ${d.anchor}: ${d.spec.seasonality} seasonality, ${d.spec.trend} trend, ` +
    `season length ${d.spec.period}; ${parts.join(", ")}. Change alpha or another setting in its yellow cells and every row recomputes.`
  );
}

/** The rectangle around some cells, as an A1 range. */
function boundingRange(cells: { row: number; col: number }[]): string {
  let r1 = Infinity;
  let c1 = Infinity;
  let r2 = -1;
  let c2 = -1;
  for (const c of cells) {
    r1 = Math.min(r1, c.row);
    c1 = Math.min(c1, c.col);
    r2 = Math.max(r2, c.row);
    c2 = Math.max(c2, c.col);
  }
  return `${columnLetters(c1)}${r1 + 1}:${columnLetters(c2)}${r2 + 1}`;
}

function sameActual(a: number | null, b: number | null): boolean {
  if (a === null || b === null) return a === b;
  return Math.abs(a - b) <= 1e-9 * Math.max(1, Math.abs(a), Math.abs(b));
}

function quoteIfNeeded(sheet: string): string {
  return /^[A-Za-z_][A-Za-z0-9_.]*$/.test(sheet) ? sheet : `'${sheet.replace(/'/g, "''")}'`;
}
