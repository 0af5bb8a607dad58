/** "Add new actuals": the values below the history a ledger was written from become new rows. */
import { columnLetters } from "../../../ledger/describe/addresses";
import { extendLedger, readLedger, type HistorySource } from "../../../ledger";
import type { LedgerLocation } from "../../port";
import { ask } from "../confirmStep";
import { readCorrectionCells } from "../correctionColumns";
import { pickHistories, type HistoryPick } from "../historyPick";
import { signalNote } from "../signalNote";
import type { ActionContext } from "./actionContext";
import { chooseHistory } from "./chooseHistory";
import { requireLedger } from "./ledgerList";

export async function addNewActuals(ctx: ActionContext): Promise<void> {
  const loc = await requireLedger(ctx);
  if (!loc) return;
  const read = await ctx.port.reader(loc.sheet, loc.cell);
  const { input } = readLedger(read, { sheet: loc.sheet, cell: loc.cell });
  const history = await currentHistoryFor(ctx, loc, input.source);
  if (!history) return;
  const known = Array.from(input.history, (v) => (v === undefined ? null : v));
  const mismatch = known.findIndex((v, t) => !sameActual(v, history.values[t] ?? null));
  if (history.values.length < known.length || mismatch >= 0) {
    const t = mismatch >= 0 ? mismatch : history.values.length;
    ctx.say(
      `The chosen history differs from the one this ledger was written from at period ${t + 1} (${history.sheet}!${columnLetters(history.col)}${history.firstRow + t + 1}). ` +
        "Adding actuals only appends new periods; for a corrected history, write a new ledger.",
      "error",
    );
    return;
  }
  const added = history.values.slice(known.length);
  if (!added.some((v) => v !== null)) {
    ctx.say(`No new actuals below the history (the ledger already has ${known.length} periods). Type them under the last actual, then press the button again.`);
    return;
  }
  // A corrected ledger: the corrections (and reasons) typed beside the new actuals come along.
  let newCorrections: { values: (number | null)[]; reasons?: string[] } | undefined;
  const corr = input.corrections;
  if (corr?.source) {
    const got = await readCorrectionCells(ctx.port, corr.source, corr.reasonSource, known.length, added.length);
    if (!got.ok) {
      ctx.say(got.message, "error");
      return;
    }
    newCorrections = { values: Array.from(got.corrections!.values, (v) => v ?? null), reasons: Array.from(got.corrections!.reasons ?? [], (r) => r ?? "") };
  }
  const ext = extendLedger(read, { sheet: loc.sheet, cell: loc.cell }, added, newCorrections);
  if (!(await clearToWrite(ctx, ext.sheet, [boundingRange(ext.append)], "the new ledger rows"))) {
    ctx.say("Nothing added.");
    return;
  }
  await ctx.port.writeExtension(ext, (done, total) => ctx.progress.show(done, total, `Adding rows: ${Math.round((100 * done) / total)}%`));
  ctx.port.ledgerShown?.(ext.description);
  const count = added.length;
  ctx.say(`Added ${count} period${count > 1 ? "s" : ""} to the ledger on "${loc.sheet}"; the outlook and scorecard now start after period ${known.length + count}.${signalNote(ext.description)}`, "done");
}

/** The history to extend from: the cells the ledger's actuals refer to, else the source of a ledger written this session, else the selection. */
async function currentHistoryFor(ctx: ActionContext, loc: LedgerLocation, referred?: HistorySource): Promise<HistoryPick | undefined> {
  const source = referred ? { ...referred, name: loc.sheet } : ctx.sources.get(loc.tag);
  if (source) {
    const last = await ctx.port.lastUsedRow(source.sheet);
    const block = await ctx.port.read(source.sheet, source.firstRow, source.col, Math.max(1, last - source.firstRow + 1), 1);
    const result = pickHistories({ ...block, values: block.values });
    if (result.ok) return { ...result.picks[0], name: source.name };
    ctx.say(result.message, "error");
    return undefined;
  }
  await chooseHistory(ctx);
  if (ctx.picks.length !== 1) {
    ctx.say("Select the ledger's history column (with the new actuals below it), then press \"Add new actuals\".", "error");
    return undefined;
  }
  return ctx.picks[0];
}

/** True when the ranges are empty, or the person agreed to write over what is there. */
async function clearToWrite(ctx: ActionContext, sheet: string, ranges: string[], what: string): Promise<boolean> {
  const used = await ctx.port.firstUsedCell(sheet, ranges);
  if (!used) return true;
  return ask(ctx.view.confirm, `The sheet "${sheet}" already holds something at ${used}, where ${what} would go. Write over it?`, "Write over it");
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
