/** "Fit constants into its settings": asks before replacing the constants in use. */
import { fitLedgerConstants, readLedger } from "../../../ledger";
import { ask } from "../confirmStep";
import { yieldToPage } from "../progress";
import { fourDecimals, type ActionContext } from "./actionContext";
import { requireLedger } from "./ledgerList";

export async function fitConstants(ctx: ActionContext): Promise<void> {
  const { port, view, progress } = ctx;
  const loc = await requireLedger(ctx);
  if (!loc) return;
  const read = await port.reader(loc.sheet, loc.cell);
  progress.show(0, 1, `Fitting the constants of the ledger on "${loc.sheet}"`);
  await yieldToPage();
  const before = readLedger(read, { sheet: loc.sheet, cell: loc.cell }).inUse;
  const fit = fitLedgerConstants(read, { sheet: loc.sheet, cell: loc.cell });
  progress.hide();
  const changes = (["alpha", "beta", "gamma", "phi"] as const)
    .map((k) => `${k} ${typeof before[k] === "number" ? fourDecimals(before[k] as number) : String(before[k] ?? "blank")} to ${fourDecimals(fit.constants[k])}`)
    .join(", ");
  const yes = await ask(view.confirm, `Replace the constants in the ledger's settings on "${loc.sheet}" (${changes})?`, "Write the fitted constants");
  if (!yes) {
    ctx.say("The settings were left as they are.");
    return;
  }
  await port.writeCells(fit.sheet, fit.cells);
  port.ledgerShown?.(fit.description);
  ctx.say(`Wrote the fitted constants (${changes}); the ledger has recomputed.`, "done");
}
