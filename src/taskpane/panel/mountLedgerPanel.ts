/**
 * The Ebb ledger panel: wires the page (panelView) to a workbook port. The same code runs in
 * the spreadsheet host and in the preview; only the port differs.
 */
import type { WorkbookPort } from "../port";
import { panelStyles } from "./panelStyles";
import { buildPanelView, type PanelView } from "./panelView";
import { LedgerActions } from "./ledgerActions";

export interface LedgerPanel {
  view: PanelView;
  actions: LedgerActions;
}

export function mountLedgerPanel(container: HTMLElement, port: WorkbookPort): LedgerPanel {
  if (!document.getElementById("ebb-panel-styles")) {
    const style = document.createElement("style");
    style.id = "ebb-panel-styles";
    style.textContent = panelStyles;
    document.head.append(style);
  }
  const view = buildPanelView();
  container.replaceChildren(view.root);
  const actions = new LedgerActions(view, port);

  const run = (work: () => Promise<void>) => () => {
    void actions.guard(work);
  };
  view.pick.addEventListener("click", run(() => actions.pickHistory()));
  view.form.addEventListener("submit", (e) => {
    e.preventDefault();
    void actions.guard(() => actions.writeLedgers());
  });
  view.useSelectedCell.addEventListener("click", run(() => actions.useSelectedCell()));
  view.refreshLedgers.addEventListener("click", run(() => actions.refreshLedgerList()));
  view.extend.addEventListener("click", run(() => actions.extendLedger()));
  view.verify.addEventListener("click", run(() => actions.verifyLedger()));
  view.fit.addEventListener("click", run(() => actions.fitLedger()));
  view.refreshInterval.addEventListener("click", run(() => actions.refreshLedger()));

  const syncConstants = (): void => {
    for (const input of Object.values(view.constants)) input.disabled = !view.constantsTyped.checked;
  };
  view.constantsFit.addEventListener("change", syncConstants);
  view.constantsTyped.addEventListener("change", syncConstants);
  const syncDestination = (): void => {
    view.sheetName.disabled = view.toArea.checked;
    view.areaCell.disabled = !view.toArea.checked;
    view.useSelectedCell.disabled = !view.toArea.checked;
  };
  view.toNewSheet.addEventListener("change", syncDestination);
  view.toArea.addEventListener("change", syncDestination);
  syncDestination();

  void actions.guard(() => actions.refreshLedgerList(), false);
  return { view, actions };
}
