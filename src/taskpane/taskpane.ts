/**
 * The Ebb ledger panel in the spreadsheet host: the shared panel code with the host's workbook
 * port. (The preview page mounts the same panel with its own port.)
 */
import { mountLedgerPanel } from "./panel/mountLedgerPanel";
import { ExcelPort } from "./ports/excelPort";

function root(): HTMLElement | null {
  return document.getElementById("ebb-ledger-root");
}

function start(): void {
  const container = root();
  if (container) mountLedgerPanel(container, new ExcelPort());
}

function outsideHost(): void {
  const status = document.getElementById("ebb-status");
  if (status) status.textContent = "This page is the Ebb ledger panel of the spreadsheet add-in. Open it from the spreadsheet program, or run `npm start` for the preview.";
}

// office.js is absent when the page is opened outside the host (or offline): say so instead of failing.
if (typeof Office !== "undefined" && typeof Office.onReady === "function") {
  Office.onReady((info) => (info.host === Office.HostType.Excel ? start() : outsideHost()));
} else if (typeof document !== "undefined") {
  document.addEventListener("DOMContentLoaded", outsideHost);
}
