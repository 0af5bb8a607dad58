/** What the grid's parts share: the sheet shown, the selection, and the cell being edited. */
import type { CellPos, Selection } from "./selection";

export interface GridState {
  sheet: string;
  sel: Selection;
  editor?: { input: HTMLInputElement; pos: CellPos };
}

export interface GridEvents {
  /** The selection or the sheet changed. */
  selectionChanged(): void;
  /** A cell is being edited; `text` is what is typed so far (for the formula bar). */
  editing(text: string): void;
  /** An edit was refused (the message says why). */
  editRefused(message: string): void;
}
