/**
 * "Check against the engine": lists every cell that was changed or differs, in sheet order,
 * each entry selecting its cell; notices about numbers no formula can redo come last, in one line.
 */
import { verifyLedger } from "../../../ledger";
import { el } from "../dom";
import { yieldToPage } from "../progress";
import type { ActionContext } from "./actionContext";
import { requireLedger } from "./ledgerList";

export async function checkLedger(ctx: ActionContext): Promise<void> {
  const { port, view, progress } = ctx;
  const loc = await requireLedger(ctx);
  if (!loc) return;
  progress.show(0, 1, `Checking the ledger on "${loc.sheet}"`);
  await yieldToPage();
  const read = await port.reader(loc.sheet, loc.cell);
  const report = verifyLedger(read, { sheet: loc.sheet, cell: loc.cell });
  view.findingsList.replaceChildren(
    ...report.problems.map((p) => {
      const button = el("button", { type: "button", class: "ebb-finding", text: `${p.address}: ${p.message}` });
      button.dataset.address = p.address;
      button.addEventListener("click", () => void port.select(report.sheet, p.address, true));
      return el("li", {}, button);
    }),
    ...report.notices.map((n) => {
      const button = el("button", { type: "button", class: "ebb-finding ebb-notice", text: `Notice: ${n.message}` });
      button.dataset.address = n.addresses[0];
      button.addEventListener("click", () => void port.select(report.sheet, n.addresses[0], true));
      return el("li", {}, button);
    }),
  );
  view.findings.hidden = report.problems.length === 0 && report.notices.length === 0;
  if (report.expected) port.ledgerShown?.(report.expected);
  if (report.ok) {
    const notice = report.notices.length ? " See the notice below about the simulated interval." : "";
    ctx.say(`All ${report.checked} cells of the ledger on "${loc.sheet}" match the engine.${notice}`, "done");
  } else {
    const n = report.problems.length;
    const d = report.downstream;
    const named = d.slice(0, 6).join(", ") + (d.length > 6 ? `, and ${d.length - 6} more` : "");
    const follow = d.length ? ` ${d.length} more cell${d.length > 1 ? "s" : ""} (${named}) ${d.length > 1 ? "differ" : "differs"} only because ${d.length > 1 ? "they read" : "it reads"} those; ${d.length > 1 ? "they come" : "it comes"} right when the listed cells are mended.` : "";
    ctx.say(`${n} cell${n > 1 ? "s" : ""} of the ledger on "${loc.sheet}" ${n > 1 ? "differ" : "differs"} from the engine; see the list below.${follow}`, "error");
  }
}
