/**
 * Mouse and keyboard on the grid: click, shift-click and drag select; a column header selects
 * its used part, and shift-click on another header stretches that to every column between;
 * keys move, stretch, clear, undo and redo or start an edit (see gridKeys for the mapping).
 */
import type { PreviewWorkbook } from "../workbook/previewWorkbook";
import type { CellEditor } from "./cellEditor";
import { gridAction } from "./gridKeys";
import type { GridEvents, GridState } from "./gridState";
import type { GridTable } from "./gridTable";
import { moved, rectOf, single, type Selection } from "./selection";

export interface GridInputParts {
  workbook: PreviewWorkbook;
  state: GridState;
  table: GridTable;
  editor: CellEditor;
  events: GridEvents;
  /** Selects, grows the table when needed, focuses the active cell and tells the page. */
  setSelection(next: Selection): void;
}

export function listenToGridInput(parts: GridInputParts): void {
  const { table, editor } = parts;
  let dragging = false;
  table.element.addEventListener("keydown", (e) => onKey(parts, e));
  table.element.addEventListener("mousedown", (e) => onMouseDown(parts, e, () => (dragging = true)));
  table.element.addEventListener("mouseover", (e) => {
    if (dragging) onDragOver(parts, e);
  });
  table.element.addEventListener("dblclick", (e) => {
    if (table.posOf(e.target)) editor.start();
  });
  window.addEventListener("mouseup", () => (dragging = false));
}

function onMouseDown(parts: GridInputParts, e: MouseEvent, startDrag: () => void): void {
  const { table, editor, state } = parts;
  if (e.button !== 0) return;
  const head = (e.target as HTMLElement).closest("th.col-head") as HTMLElement | null;
  if (head) {
    e.preventDefault();
    editor.commitOpen();
    selectColumn(parts, Number(head.dataset.col), e.shiftKey);
    return;
  }
  const pos = table.posOf(e.target);
  if (!pos) return;
  if (editor.owns(e.target)) return;
  editor.commitOpen();
  e.preventDefault();
  startDrag();
  parts.setSelection(e.shiftKey ? { anchor: state.sel.anchor, active: pos } : single(pos));
}

function onDragOver(parts: GridInputParts, e: MouseEvent): void {
  const { sel } = parts.state;
  const pos = parts.table.posOf(e.target);
  if (pos && (pos.row !== sel.active.row || pos.col !== sel.active.col)) {
    parts.setSelection({ anchor: sel.anchor, active: pos });
  }
}

function onKey(parts: GridInputParts, e: KeyboardEvent): void {
  const { editor, state, table } = parts;
  if (editor.isOpen) return; // the editor handles its own keys
  const action = gridAction(e);
  switch (action.type) {
    case "move":
      e.preventDefault();
      parts.setSelection(moved(state.sel, action.dRow, action.dCol, action.extend, table.rows + 1000, table.cols + 100));
      break;
    case "edit":
      e.preventDefault();
      editor.start(action.initial);
      break;
    case "clear":
      e.preventDefault();
      clearSelection(parts);
      break;
    case "select-column":
      e.preventDefault();
      selectColumn(parts, state.sel.active.col);
      break;
    case "undo":
    case "redo":
      e.preventDefault();
      if (!(action.type === "undo" ? parts.workbook.undo() : parts.workbook.redo())) parts.events.editRefused(action.type === "undo" ? "Nothing to undo." : "Nothing to redo.");
      break;
  }
}

/**
 * The used part of a column: from row 1 to the sheet's last used row. With `extend` (shift-click
 * on a header) it reaches from the column the selection started in to this one: B then F is B1:F85.
 */
function selectColumn(parts: GridInputParts, col: number, extend = false): void {
  const last = Math.max(0, parts.workbook.size(parts.state.sheet).rows - 1);
  const from = extend ? parts.state.sel.anchor.col : col;
  parts.setSelection({ anchor: { row: last, col: from }, active: { row: 0, col } });
}

function clearSelection(parts: GridInputParts): void {
  // One step: Ctrl+Z brings the whole selection back.
  parts.workbook.step(() => clearCells(parts));
}

function clearCells(parts: GridInputParts): void {
  const { workbook, state, events } = parts;
  const r = rectOf(state.sel);
  for (let row = r.top; row <= r.bottom; row++) {
    for (let col = r.left; col <= r.right; col++) {
      const view = workbook.cell(state.sheet, row, col);
      if (view.spill === "part") continue; // cleared with its formula cell
      const result = workbook.setInput(state.sheet, row, col, "", false);
      if (!result.ok) events.editRefused(result.message);
    }
  }
  workbook.respillCleared(state.sheet);
}
