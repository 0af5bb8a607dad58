/** Mounts the Ebb ledger panel in the preview page, with the preview's workbook port and the ledger chart. */
import { LedgerChart } from "../chart/ledgerChart";
import type { WorkbookView } from "../grid/workbookView";
import type { PreviewWorkbook } from "../workbook/previewWorkbook";
import { mountLedgerPanel, type LedgerPanel } from "../../taskpane/panel/mountLedgerPanel";
import { PreviewPort } from "./previewPort";

export function mountPreviewPanel(area: HTMLElement, workbook: PreviewWorkbook, view: WorkbookView, workbookArea: HTMLElement): { panel: LedgerPanel; port: PreviewPort } {
  const port = new PreviewPort(workbook, view, view.decor);
  const chart = new LedgerChart(workbook);
  workbookArea.append(chart.element);
  port.onLedgerShown((ledger) => chart.setSpec(ledger.sheet, ledger.chart));
  view.onSheetShown((sheet) => chart.showSheet(sheet));
  chart.showSheet(view.sheet);
  const panel = mountLedgerPanel(area, port);
  return { panel, port };
}
