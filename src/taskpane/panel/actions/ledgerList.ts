/** The panel's list of ledgers in the workbook, and which one the other buttons act on. */
import { el } from "../dom";
import type { LedgerLocation } from "../../port";
import type { ActionContext } from "./actionContext";

/** Fills the list of ledgers found in the workbook; keeps (or sets) the chosen one. */
export async function refreshLedgerList(ctx: ActionContext, choose?: LedgerLocation): Promise<void> {
  const before = chosenLedger(ctx);
  ctx.ledgerList = await ctx.port.ledgers();
  const list = ctx.view.ledgerList;
  list.replaceChildren(
    ...(ctx.ledgerList.length
      ? ctx.ledgerList.map((l, i) => el("option", { value: String(i), text: `${l.sheet}, from ${l.cell}` }))
      : [el("option", { value: "", text: "No ledger yet" })]),
  );
  const want = choose ?? before;
  const index = want ? ctx.ledgerList.findIndex((l) => l.tag === want.tag) : -1;
  list.value = String(Math.max(0, index));
}

function chosenLedger(ctx: ActionContext): LedgerLocation | undefined {
  const i = Number(ctx.view.ledgerList.value);
  return Number.isInteger(i) ? ctx.ledgerList[i] : undefined;
}

/** The chosen ledger, or undefined (with a message) when the workbook has none. */
export async function requireLedger(ctx: ActionContext): Promise<LedgerLocation | undefined> {
  if (ctx.ledgerList.length === 0) await refreshLedgerList(ctx);
  const chosen = chosenLedger(ctx);
  if (!chosen) ctx.say("There is no ledger in this workbook yet. Write one first.", "error");
  return chosen;
}
