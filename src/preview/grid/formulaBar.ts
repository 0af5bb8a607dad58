/**
 * The formula bar: the selected cell's name, its contents (editable: Enter commits, Escape
 * reverts) and a note line with the error message or where a spilled value comes from.
 */
import { editKey } from "./gridKeys";
import { el } from "../../taskpane/panel/dom";

export class FormulaBar {
  readonly element: HTMLElement;
  readonly note: HTMLElement;
  private readonly name: HTMLOutputElement;
  private readonly input: HTMLInputElement;
  private shown = "";

  constructor(private readonly onCommit: (text: string, dRow: number, dCol: number) => void, private readonly onCancel: () => void) {
    this.name = el("output", { class: "cell-name", id: "cell-name", "aria-label": "Selected cell" });
    this.input = el("input", {
      id: "cell-contents",
      class: "cell-contents",
      type: "text",
      spellcheck: "false",
      autocomplete: "off",
      "aria-describedby": "cell-note",
    });
    const label = el("label", { for: "cell-contents", class: "formula-label", text: "Contents" });
    this.element = el("div", { class: "formula-bar" }, this.name, label, this.input);
    this.note = el("p", { id: "cell-note", class: "cell-note", role: "status", "aria-live": "polite" });
    this.input.addEventListener("keydown", (e) => {
      const k = editKey(e);
      if (k.type === "commit") {
        e.preventDefault();
        this.onCommit(this.input.value, k.dRow, k.dCol);
      } else if (k.type === "cancel") {
        e.preventDefault();
        this.input.value = this.shown;
        this.onCancel();
      }
    });
  }

  /** Shows a cell; `readOnly` for a cell an array spilled into. */
  show(name: string, contents: string, readOnly: boolean): void {
    this.name.value = name;
    this.name.textContent = name;
    this.shown = contents;
    if (document.activeElement !== this.input) this.input.value = contents;
    this.input.readOnly = readOnly;
    this.input.classList.toggle("spilled", readOnly);
  }

  /** Mirrors what is being typed in the cell editor. */
  mirror(text: string): void {
    this.input.value = text;
  }

  setNote(text: string, tone: "plain" | "error" = "plain"): void {
    this.note.textContent = text;
    this.note.classList.toggle("error", tone === "error");
  }
}
