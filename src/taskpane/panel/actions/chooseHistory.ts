/** "Use the selected cells" and "Use the selected cell": reading the selection into the form. */
import { columnLetters } from "../../../ledger/describe/addresses";
import { describePick, foundPeriod, pickHistories, shortHistoryWarning } from "../historyPick";
import type { ActionContext } from "./actionContext";

/** One history per selected column; a single cell means its whole column. */
export async function chooseHistory(ctx: ActionContext): Promise<void> {
  const { port, view } = ctx;
  let block = await port.selection();
  const rows = block.values.length;
  const cols = rows ? block.values[0].length : 0;
  if (rows === 1 && cols === 1) {
    const last = await port.lastUsedRow(block.sheet);
    if (last >= 0) block = await port.read(block.sheet, 0, block.left, last + 1, 1);
  }
  const result = pickHistories(block);
  if (!result.ok) {
    ctx.picks = [];
    view.historySummary.textContent = result.message;
    ctx.say(result.message, "error");
    return;
  }
  // A selection below row 1 without its header: the series is named by the column's heading.
  if (block.top > 0) {
    const headings = await port.read(block.sheet, 0, block.left, 1, block.values[0].length);
    for (const pick of result.picks) {
      const h = headings.values[0]?.[pick.col - block.left];
      if (pick.headerRow === undefined && typeof h === "string" && h.trim() !== "" && !Number.isFinite(Number(h))) pick.name = h.trim();
    }
  }
  ctx.picks = result.picks;
  const first = result.picks[0];
  const found = foundPeriod(first.values);
  view.periodFound.textContent =
    found > 1 ? `Found in the history: ${found}.` : "No repeating season found in the history (1); type the season length if you know it.";
  if (!ctx.periodTyped) view.period.value = found > 1 ? String(found) : "";
  view.historySummary.textContent =
    result.picks.length === 1
      ? `History: ${describePick(first)}.`
      : `${result.picks.length} histories, one ledger each on its own sheet: ${result.picks.map((p) => p.name).join("; ")}.`;
  const period = ctx.periodTyped && Number(view.period.value) > 0 ? Number(view.period.value) : found;
  const warning = result.picks.map((p) => shortHistoryWarning(p, period)).find((w) => w !== undefined);
  if (warning) {
    view.historySummary.textContent += ` ${warning}`;
    ctx.say(warning, "error");
    return;
  }
  ctx.say(result.picks.length === 1 ? "History chosen. Check the settings, then write the ledger." : "Histories chosen. Each gets its own ledger sheet.");
}

/** Puts the selected cell into the "top-left cell" field of the destination. */
export async function useSelectedCell(ctx: ActionContext): Promise<void> {
  const block = await ctx.port.selection();
  const letters = columnLetters(block.left);
  ctx.view.areaCell.value = `${quoteIfNeeded(block.sheet)}!${letters}${block.top + 1}`;
}

function quoteIfNeeded(sheet: string): string {
  return /^[A-Za-z_][A-Za-z0-9_.]*$/.test(sheet) ? sheet : `'${sheet.replace(/'/g, "''")}'`;
}
