/**
 * What the panel's buttons do, one action per file in ./actions: pick a history, write ledgers,
 * add new actuals, check a ledger against the engine, fit its constants, update a simulated
 * interval. This class runs them one at a time. Every write asks first when a target cell
 * holds anything.
 */
import type { LedgerLocation, WorkbookPort } from "../port";
import { ActionContext, type MessageTone } from "./actions/actionContext";
import { addNewActuals } from "./actions/addNewActuals";
import { checkLedger } from "./actions/checkLedger";
import { chooseHistory, useSelectedCell } from "./actions/chooseHistory";
import { fitConstants } from "./actions/fitConstants";
import { refreshLedgerList } from "./actions/ledgerList";
import { refreshSimulatedInterval } from "./actions/refreshInterval";
import { writeLedgers } from "./actions/writeLedgers";
import { messageOf } from "./messages";
import type { PanelView } from "./panelView";

export class LedgerActions {
  private readonly ctx: ActionContext;
  private busy = false;

  constructor(private readonly view: PanelView, port: WorkbookPort) {
    this.ctx = new ActionContext(view, port);
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
      this.ctx.progress.hide();
      this.busy = false;
      this.view.root.removeAttribute("aria-busy");
      this.setButtons(true);
    }
  }

  say(text: string, tone: MessageTone = "plain"): void {
    this.ctx.say(text, tone);
  }

  /** "Use the selected cells": one history per selected column; a single cell means its whole column. */
  pickHistory(): Promise<void> {
    return chooseHistory(this.ctx);
  }

  useSelectedCell(): Promise<void> {
    return useSelectedCell(this.ctx);
  }

  /** "Write ledger": one ledger per chosen history. */
  writeLedgers(): Promise<void> {
    return writeLedgers(this.ctx);
  }

  /** Fills the list of ledgers found in the workbook; keeps (or sets) the chosen one. */
  refreshLedgerList(choose?: LedgerLocation): Promise<void> {
    return refreshLedgerList(this.ctx, choose);
  }

  /** "Add new actuals". */
  extendLedger(): Promise<void> {
    return addNewActuals(this.ctx);
  }

  /** "Check against the engine". */
  verifyLedger(): Promise<void> {
    return checkLedger(this.ctx);
  }

  /** "Fit constants into its settings". */
  fitLedger(): Promise<void> {
    return fitConstants(this.ctx);
  }

  /** "Update the simulated interval". */
  refreshLedger(): Promise<void> {
    return refreshSimulatedInterval(this.ctx);
  }

  private setButtons(enabled: boolean): void {
    const v = this.view;
    for (const b of [v.pick, v.write, v.extend, v.verify, v.fit, v.refreshInterval, v.refreshLedgers]) b.disabled = !enabled;
    v.useSelectedCell.disabled = !enabled || !v.toArea.checked;
  }
}
