/** What a key press on the grid means, apart from the DOM (so the mapping stays readable). */

export type GridAction =
  | { type: "move"; dRow: number; dCol: number; extend: boolean }
  | { type: "edit"; initial?: string }
  | { type: "clear" }
  | { type: "select-column" }
  | { type: "undo" }
  | { type: "redo" }
  | { type: "none" };

export interface KeyLike {
  key: string;
  shiftKey: boolean;
  ctrlKey: boolean;
  metaKey: boolean;
  altKey: boolean;
}

/**
 * Keys while a cell is selected (not being edited). Tab is left to the browser here, so the
 * keyboard can leave the grid; inside the editor Tab commits and moves right.
 */
export function gridAction(e: KeyLike): GridAction {
  const extend = e.shiftKey;
  switch (e.key) {
    case "ArrowUp":
      return { type: "move", dRow: -1, dCol: 0, extend };
    case "ArrowDown":
      return { type: "move", dRow: 1, dCol: 0, extend };
    case "ArrowLeft":
      return { type: "move", dRow: 0, dCol: -1, extend };
    case "ArrowRight":
      return { type: "move", dRow: 0, dCol: 1, extend };
    case "PageDown":
      return { type: "move", dRow: 20, dCol: 0, extend };
    case "PageUp":
      return { type: "move", dRow: -20, dCol: 0, extend };
    case "Enter":
    case "F2":
      return { type: "edit" };
    case "Delete":
    case "Backspace":
      return { type: "clear" };
    case " ":
      if (e.ctrlKey) return { type: "select-column" };
      break;
  }
  // Ctrl+Z undoes the last step (an edit, a clear, a write of the panel); Ctrl+Y or Ctrl+Shift+Z redoes it (Cmd on a Mac).
  if ((e.ctrlKey || e.metaKey) && !e.altKey) {
    const k = e.key.toLowerCase();
    if (k === "z") return { type: e.shiftKey ? "redo" : "undo" };
    if (k === "y") return { type: "redo" };
  }
  if (e.key.length === 1 && !e.ctrlKey && !e.metaKey && !e.altKey) return { type: "edit", initial: e.key };
  return { type: "none" };
}

/** Keys inside the cell editor or the formula bar: where to go after the edit. */
export type EditKey = { type: "commit"; dRow: number; dCol: number } | { type: "cancel" } | { type: "none" };

export function editKey(e: KeyLike): EditKey {
  if (e.key === "Enter") return { type: "commit", dRow: e.shiftKey ? -1 : 1, dCol: 0 };
  if (e.key === "Tab") return { type: "commit", dRow: 0, dCol: e.shiftKey ? -1 : 1 };
  if (e.key === "Escape") return { type: "cancel" };
  return { type: "none" };
}
