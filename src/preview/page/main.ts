/** The preview page: the demo workbook with live EBB functions, and the Ebb ledger panel beside it. */
import csvText from "../demo/larkmere-demo.csv";
import { WorkbookView } from "../grid/workbookView";
import { openDemoWorkbook } from "../workbook/openWorkbook";
import { SALES_SHEET } from "../workbook/demoWorkbook";
import { PREVIEW_CSS } from "./previewStyles";
import { mountPreviewPanel } from "../panelPort/mountPreviewPanel";

function start(): void {
  const style = document.createElement("style");
  style.textContent = PREVIEW_CSS;
  document.head.append(style);
  const notice = document.getElementById("demo-notice");
  if (notice) notice.textContent = EBB_DEMO_NOTICE;

  const { workbook, demo } = openDemoWorkbook(csvText, EBB_DEMO_NOTICE);
  const view = new WorkbookView(workbook);
  for (const [sheet, widths] of Object.entries(demo.widths)) view.grid.setColumnWidths(sheet, widths);
  for (const [sheet, cells] of Object.entries(demo.headers)) view.decor.addRoles(sheet, cells.map((c) => ({ ...c, role: "header" })));
  const area = document.getElementById("workbook") as HTMLElement;
  area.replaceChildren(view.element);
  view.showSheet(SALES_SHEET);

  const panelArea = document.getElementById("ebb-ledger") as HTMLElement;
  const { panel, port } = mountPreviewPanel(panelArea, workbook, view, area);

  // For people poking around in the browser console, and for the end-to-end tests.
  (window as unknown as { ebbPreview: unknown }).ebbPreview = { workbook, view, panel, port };
  document.body.dataset.ready = "true";
}

start();
