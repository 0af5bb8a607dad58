/** Sheet tabs under the grid: a tab list, arrow keys move between tabs. */
import { el } from "../../taskpane/panel/dom";

export class SheetTabs {
  readonly element: HTMLElement;
  private names: string[] = [];
  private active = "";

  constructor(private readonly onPick: (name: string) => void, controls: string) {
    this.element = el("div", { class: "sheet-tabs", role: "tablist", "aria-label": "Sheets" });
    this.element.dataset.controls = controls;
    this.element.addEventListener("keydown", (e) => this.onKey(e));
  }

  /** Redraws when the sheets or the active one changed. */
  show(names: string[], active: string): void {
    if (names.join("\u0000") === this.names.join("\u0000") && active === this.active) return;
    this.names = [...names];
    this.active = active;
    this.element.replaceChildren(
      ...names.map((name, i) => {
        const selected = name === active;
        const tab = el("button", {
          type: "button",
          role: "tab",
          id: `sheet-tab-${i}`,
          class: "sheet-tab",
          "aria-selected": selected ? "true" : "false",
          "aria-controls": this.element.dataset.controls,
          tabindex: selected ? 0 : -1,
          text: name,
        });
        tab.addEventListener("click", () => this.onPick(name));
        return tab;
      }),
    );
  }

  activeTabId(): string {
    return `sheet-tab-${Math.max(0, this.names.indexOf(this.active))}`;
  }

  private onKey(e: KeyboardEvent): void {
    const i = this.names.indexOf(this.active);
    let next = -1;
    if (e.key === "ArrowRight") next = (i + 1) % this.names.length;
    else if (e.key === "ArrowLeft") next = (i - 1 + this.names.length) % this.names.length;
    else if (e.key === "Home") next = 0;
    else if (e.key === "End") next = this.names.length - 1;
    if (next < 0) return;
    e.preventDefault();
    this.onPick(this.names[next]);
    (this.element.querySelector(`#sheet-tab-${next}`) as HTMLElement | null)?.focus();
  }
}
