/** Progress of long work (one ledger per column), and a pause that lets the page repaint and respond. */
import type { PanelView } from "./panelView";

/** Lets the browser handle input and paint before the next piece of work. */
export function yieldToPage(): Promise<void> {
  return new Promise((resolve) => setTimeout(resolve, 0));
}

export class Progress {
  constructor(private readonly view: PanelView) {}

  show(done: number, total: number, text: string): void {
    this.view.progress.hidden = false;
    this.view.progressBar.max = Math.max(1, total);
    this.view.progressBar.value = done;
    this.view.progressText.textContent = text;
  }

  hide(): void {
    this.view.progress.hidden = true;
    this.view.progressText.textContent = "";
  }
}
