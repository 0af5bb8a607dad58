/**
 * "Update the simulated interval": a multiplicative ledger's interval gaps come from the
 * engine's seeded simulation, which no formula can redo; after a setting changes they are
 * recomputed here (asking first, since they hold numbers).
 */
import { refreshEngineCells } from "../../../ledger";
import { ask } from "../confirmStep";
import type { ActionContext } from "./actionContext";
import { requireLedger } from "./ledgerList";

export async function refreshSimulatedInterval(ctx: ActionContext): Promise<void> {
  const loc = await requireLedger(ctx);
  if (!loc) return;
  const read = await ctx.port.reader(loc.sheet, loc.cell);
  const cells = refreshEngineCells(read, { sheet: loc.sheet, cell: loc.cell });
  if (cells.length === 0) {
    ctx.say(`The ledger on "${loc.sheet}" computes its whole interval with formulas; there is nothing to update.`);
    return;
  }
  const yes = await ask(
    ctx.view.confirm,
    `Replace the ${cells.length} simulated interval numbers of the ledger on "${loc.sheet}" with the engine's values at the settings in use?`,
    "Update them",
  );
  if (!yes) {
    ctx.say("The simulated interval was left as it is.");
    return;
  }
  await ctx.port.writeCells(loc.sheet, cells);
  ctx.say(`Updated ${cells.length} simulated interval numbers on "${loc.sheet}".`, "done");
}
