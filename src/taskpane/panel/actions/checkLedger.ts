/** "Check against the engine": lists every cell that differs; each entry selects its cell. */
import { verifyLedger } from "../../../ledger";
import { el } from "../dom";
import type { ActionContext } from "./actionContext";
import { requireLedger } from "./ledgerList";

export async function checkLedger(ctx: ActionContext): Promise<void> {
  const { port, view } = ctx;
  const loc = await requireLedger(ctx);
  if (!loc) return;
  const read = await port.reader(loc.sheet, loc.cell);
  const report = verifyLedger(read, { sheet: loc.sheet, cell: loc.cell });
  view.findingsList.replaceChildren(
    ...report.problems.map((p) => {
      const button = el("button", { type: "button", class: "ebb-finding", text: `${p.address}: ${p.message}` });
      button.dataset.address = p.address;
      button.addEventListener("click", () => void port.select(report.sheet, p.address, true));
      return el("li", {}, button);
    }),
  );
  view.findings.hidden = report.problems.length === 0;
  if (report.expected) port.ledgerShown?.(report.expected);
  if (report.ok) {
    ctx.say(`All ${report.checked} cells of the ledger on "${loc.sheet}" match the engine.`, "done");
  } else {
    const n = report.problems.length;
    const follow = report.downstream.length ? ` ${report.downstream.length} more cell(s) differ only because they read those.` : "";
    ctx.say(`${n} cell${n > 1 ? "s" : ""} of the ledger on "${loc.sheet}" ${n > 1 ? "differ" : "differs"} from the engine; see the list below.${follow}`, "error");
  }
}
