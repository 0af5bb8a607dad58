/**
 * The workbook part of the preview page: formula bar, note line, grid and sheet tabs, kept in
 * step with the PreviewWorkbook.
 */
import { a1 } from "../workbook/addresses";
import { DecorStore } from "../workbook/cellDecor";
import type { CellRect, PreviewWorkbook } from "../workbook/previewWorkbook";
import { el } from "../../taskpane/panel/dom";
import { FormulaBar } from "./formulaBar";
import { GridView } from "./gridView";
import { SheetTabs } from "./sheetTabs";

export class WorkbookView {
  readonly element: HTMLElement;
  readonly grid: GridView;
  private readonly bar: FormulaBar;
  private readonly tabs: SheetTabs;
  private readonly panel: HTMLElement;
  private readonly sheetListeners = new Set<(sheet: string) => void>();
  private readonly selectionListeners = new Set<() => void>();
  private refreshQueued = false;
  private refusal = "";

  constructor(private readonly workbook: PreviewWorkbook, readonly decor: DecorStore = new DecorStore()) {
    this.bar = new FormulaBar(
      (text, dRow, dCol) => this.grid.commitEdit(text, dRow, dCol),
      () => this.grid.focusActive(),
    );
    this.grid = new GridView(workbook, {
      selectionChanged: () => this.onSelection(),
      editing: (text) => this.bar.mirror(text),
      editRefused: (message) => {
        this.refusal = message;
        this.bar.setNote(message, "error");
      },
    }, decor);
    this.tabs = new SheetTabs((name) => this.showSheet(name), "sheet-panel");
    this.panel = el("div", { id: "sheet-panel", class: "sheet-panel", role: "tabpanel" }, this.grid.element);
    this.element = el("div", { class: "workbook-view" }, this.bar.element, this.bar.note, this.panel, this.tabs.element);
    workbook.onChange(() => this.queueRefresh());
  }

  get sheet(): string {
    return this.grid.sheet;
  }

  showSheet(name: string): void {
    this.grid.showSheet(name);
    this.syncTabs();
    this.sheetListeners.forEach((l) => l(name));
  }

  /** Shows a sheet and selects a range on it (the panel uses this to point at cells). */
  select(sheet: string, rect: CellRect, focus = true): void {
    if (sheet !== this.grid.sheet) this.showSheet(sheet);
    this.grid.select(rect, focus);
  }

  onSheetShown(listener: (sheet: string) => void): void {
    this.sheetListeners.add(listener);
  }

  onSelectionChanged(listener: () => void): void {
    this.selectionListeners.add(listener);
  }

  /** Coalesces the many change events of one write into one repaint. */
  private queueRefresh(): void {
    if (this.refreshQueued) return;
    this.refreshQueued = true;
    queueMicrotask(() => {
      this.refreshQueued = false;
      this.syncTabs();
      this.grid.refresh();
      this.onSelection(false);
    });
  }

  private syncTabs(): void {
    const names = this.workbook.sheetNames();
    if (!names.includes(this.grid.sheet) && names.length > 0) {
      this.grid.showSheet(names[0]);
    }
    this.tabs.show(names, this.grid.sheet);
    this.panel.setAttribute("aria-labelledby", this.tabs.activeTabId());
  }

  private onSelection(fromUser = true): void {
    const { row, col } = this.grid.selection.active;
    const rect = this.grid.selectedRect();
    const single = rect.top === rect.bottom && rect.left === rect.right;
    const name = single ? `${this.grid.sheet}!${a1(row, col)}` : `${this.grid.sheet}!${a1(rect.top, rect.left)}:${a1(rect.bottom, rect.right)}`;
    const input = this.workbook.input(this.grid.sheet, row, col);
    this.bar.show(name, input.text, input.spilledFrom !== undefined);
    const view = this.workbook.cell(this.grid.sheet, row, col);
    if (fromUser) this.refusal = "";
    if (this.refusal) this.bar.setNote(this.refusal, "error");
    else if (view.error) this.bar.setNote(`${view.error.code} ${view.error.message}`, "error");
    else if (input.spilledFrom) this.bar.setNote(`Spilled from the formula in ${input.spilledFrom} (${view.spillRange}); edit that cell to change it.`);
    else if (view.spill === "anchor") this.bar.setNote(`This formula's result spills over ${view.spillRange}.`);
    else this.bar.setNote(this.decor.get(this.grid.sheet, row, col)?.note ?? "");
    if (fromUser) this.selectionListeners.forEach((l) => l());
  }
}
