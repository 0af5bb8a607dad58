/** What every panel action works with: the page, the workbook port, and this session's choices. */
import type { LedgerLocation, WorkbookPort } from "../../port";
import type { HistoryPick } from "../historyPick";
import type { PanelView } from "../panelView";
import { Progress } from "../progress";

export type MessageTone = "plain" | "error" | "done";

export class ActionContext {
  /** Histories chosen with "Use the selected cells". */
  picks: HistoryPick[] = [];
  /** Where each ledger written in this session took its history from (by tag), for adding actuals. */
  readonly sources = new Map<string, HistoryPick>();
  /** Ledgers found in the workbook, in the order of the panel's list. */
  ledgerList: LedgerLocation[] = [];
  /** True once the person typed a season length, so a found one does not replace it. */
  periodTyped = false;
  readonly progress: Progress;

  constructor(readonly view: PanelView, readonly port: WorkbookPort) {
    this.progress = new Progress(view);
    view.period.addEventListener("input", () => (this.periodTyped = view.period.value.trim() !== ""));
  }

  say(text: string, tone: MessageTone = "plain"): void {
    this.view.message.textContent = text;
    this.view.message.dataset.tone = tone;
  }
}

/** A smoothing constant as the panel's messages show it. */
export const fourDecimals = (v: number): string => (Number.isFinite(v) ? v.toFixed(4) : String(v));
