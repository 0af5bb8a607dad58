/** "Write ledger": one ledger per chosen history, asking first before writing over anything. */
import { defaultTag, describeLedger, uniqueTag, type LedgerDescription, type LedgerInput } from "../../../ledger";
import { ask } from "../confirmStep";
import { readCorrections } from "../correctionColumns";
import { messageOf } from "../messages";
import { signalNote } from "../signalNote";
import { formValues, type PanelView } from "../panelView";
import { yieldToPage } from "../progress";
import { parseArea, readForm, sheetNameFor } from "../readForm";
import { fourDecimals, type ActionContext } from "./actionContext";
import { refreshLedgerList } from "./ledgerList";

/** Long runs show progress and yield to the page between series. */
export async function writeLedgers(ctx: ActionContext): Promise<void> {
  const { port, view, progress } = ctx;
  if (ctx.picks.length === 0) {
    ctx.say("Choose the history first: select its column and press \"Use the selected cells\".", "error");
    view.pick.focus();
    return;
  }
  const values = formValues(view);
  const form = readForm(values);
  if (!form.ok) {
    ctx.say(form.message, "error");
    fieldFor(view, form.field)?.focus();
    return;
  }
  let area: { sheet: string; cell: string } | undefined;
  if (values.destination === "area") {
    if (ctx.picks.length > 1) {
      ctx.say("An area holds one ledger. Choose \"A new sheet\" to write one ledger per column.", "error");
      return;
    }
    area = parseArea(values.areaCell, ctx.picks[0].sheet);
    if (!area) {
      ctx.say("Top-left cell: type a cell such as H2 or Sheet1!H2, or press \"Use the selected cell\".", "error");
      view.areaCell.focus();
      return;
    }
  }
  const correcting = (values.correctionsColumn ?? "").trim() !== "" || (values.reasonsColumn ?? "").trim() !== "";
  if (correcting && ctx.picks.length > 1) {
    ctx.say("A corrections column belongs to one history. Choose one column, or clear the corrections and reasons columns.", "error");
    view.correctionsColumn.focus();
    return;
  }
  const written: LedgerDescription[] = [];
  const total = ctx.picks.length;
  for (let i = 0; i < total; i++) {
    const pick = ctx.picks[i];
    if (total > 1) progress.show(i, total, `Fitting ${i + 1} of ${total}: ${pick.name}`);
    await yieldToPage();
    const taken = await port.sheetNames();
    const sheet = area?.sheet ?? (total === 1 && values.sheetName.trim() ? values.sheetName.trim() : sheetNameFor(pick.name, taken));
    const cell = (area?.cell ?? "A1").replace(/\$/g, "").toUpperCase();
    // A tag of its own, unless this replaces the ledger at the same place (then asked below).
    const ledgers = await port.ledgers();
    const replaced = ledgers.find((l) => l.sheet === sheet && l.cell.toUpperCase() === cell);
    const tag = replaced ? replaced.tag : uniqueTag(defaultTag(sheet, cell), ledgers.map((l) => l.tag));
    const input: LedgerInput = {
      history: pick.values,
      name: pick.name,
      settings: { ...form.value.settings },
      horizon: form.value.horizon,
      coverage: form.value.coverage,
      anchor: { sheet, cell },
      tag,
      // The actuals refer to the history's cells: a corrected history recomputes the ledger.
      source: { sheet: pick.sheet, col: pick.col, firstRow: pick.firstRow },
    };
    if (correcting) {
      const read = await readCorrections(port, pick, values.correctionsColumn ?? "", values.reasonsColumn ?? "");
      if (!read.ok) {
        ctx.say(read.message, "error");
        view.correctionsColumn.focus();
        return;
      }
      if (read.corrections) input.corrections = read.corrections;
    }
    let desc: LedgerDescription;
    try {
      desc = describeLedger(input);
    } catch (e) {
      ctx.say(`${pick.name}: ${messageOf(e, pick)}${i > 0 ? ` (${i} ledger${i > 1 ? "s" : ""} written before this one)` : ""}`, "error");
      return;
    }
    const report = (done: number, all: number) => progress.show(done, all, `Writing the ledger for ${pick.name}: ${Math.round((100 * done) / all)}%`);
    let outcome = await port.writeLedger(desc, false, report);
    if (outcome.status === "needs-confirmation") {
      const over = replaced ? ` This replaces the ledger already at ${sheet}!${cell}.` : "";
      const yes = await ask(view.confirm, `Ledger for "${pick.name}": ${outcome.message}${over}`, "Write over it");
      if (!yes) {
        ctx.say(`Nothing written for "${pick.name}".${written.length ? ` ${written.length} ledger(s) were written before it.` : ""}`);
        return;
      }
      outcome = await port.writeLedger(desc, true, report);
    }
    ctx.sources.set(desc.tag, pick);
    port.ledgerShown?.(desc);
    written.push(desc);
    await yieldToPage();
  }
  if (total > 1) progress.show(total, total, `Wrote ${total} ledgers.`);
  const last = written[written.length - 1];
  await refreshLedgerList(ctx, last ? { sheet: last.sheet, cell: last.anchor, tag: last.tag } : undefined);
  await port.select(last.sheet, last.anchor, false);
  // A caution about an outlook is not a plain success: it stays in the ordinary tone.
  const cautioned = written.some((d) => d.cautions.length > 0);
  const several = () => `Wrote ${written.length} ledgers: ${written.map((d) => `"${d.sheet}"`).join(", ")}.${written.flatMap((d) => d.cautions.map((c) => ` "${d.sheet}": ${c}`)).join("")}`;
  ctx.say(written.length === 1 ? wroteMessage(last) : several(), cautioned ? "plain" : "done");
}

/** The form field a refusal is about, to move the focus there. */
function fieldFor(view: PanelView, field: string): HTMLElement | undefined {
  const map: Record<string, HTMLElement> = {
    period: view.period,
    horizon: view.horizon,
    coveragePercent: view.coverage,
    alpha: view.constants.alpha,
    beta: view.constants.beta,
    gamma: view.constants.gamma,
    phi: view.constants.phi,
    areaCell: view.areaCell,
    sheetName: view.sheetName,
  };
  return map[field];
}

function wroteMessage(d: LedgerDescription): string {
  const k = d.constants;
  const parts = [`alpha ${fourDecimals(k.alpha)}`];
  if (d.spec.trend !== "none") parts.push(`beta ${fourDecimals(k.beta)}`);
  if (d.spec.seasonality !== "none") parts.push(`gamma ${fourDecimals(k.gamma)}`);
  if (d.spec.trend === "damped") parts.push(`phi ${fourDecimals(k.phi)}`);
  return (
    `Wrote the ledger for "${d.name}" on the sheet "${d.sheet}" from ${d.anchor}: ${d.spec.seasonality === "none" ? "no" : d.spec.seasonality} seasonality, ${d.spec.trend === "none" ? "no" : d.spec.trend} trend, ` +
    `season length ${d.spec.period}; ${parts.join(", ")}.${correctedNote(d)}${signalNote(d)} Change alpha or another setting in its yellow cells and every row recomputes.${d.cautions.map((c) => ` ${c}`).join("")}`
  );
}

/** On a corrected ledger: how many periods the updates take from the corrections column. */
function correctedNote(d: LedgerDescription): string {
  if (!d.corrections) return "";
  const n = d.corrections.count;
  return ` ${n} period${n === 1 ? "" : "s"} corrected: the updates use the correction, and the Actual column keeps the recorded figure.`;
}
