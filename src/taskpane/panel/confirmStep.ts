/**
 * The ask-first step: before anything is written over cells that hold something, the panel
 * says which cells and waits for a yes. Escape or "Cancel" leaves the workbook untouched.
 */
import { el } from "./dom";

export function ask(box: HTMLElement, question: string, yesLabel: string, noLabel = "Cancel"): Promise<boolean> {
  const before = document.activeElement as HTMLElement | null;
  const yes = el("button", { type: "button", class: "ebb-button danger", id: "ebb-confirm-yes", text: yesLabel });
  const no = el("button", { type: "button", class: "ebb-button", id: "ebb-confirm-no", text: noLabel });
  box.replaceChildren(el("p", { id: "ebb-confirm-text", text: question }), el("div", { class: "ebb-actions" }, yes, no));
  box.hidden = false;
  return new Promise((resolve) => {
    const finish = (answer: boolean): void => {
      box.hidden = true;
      box.replaceChildren();
      before?.focus();
      resolve(answer);
    };
    yes.addEventListener("click", () => finish(true));
    no.addEventListener("click", () => finish(false));
    box.addEventListener("keydown", function onKey(e: KeyboardEvent) {
      if (e.key !== "Escape") return;
      e.preventDefault();
      box.removeEventListener("keydown", onKey);
      finish(false);
    });
    no.focus();
  });
}
