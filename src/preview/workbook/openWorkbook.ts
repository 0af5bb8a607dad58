/** Opens the demo workbook on the shared HyperFormula engine with every EBB function registered. */
import { createEbbWorkbook } from "../../functions/hyperformula";
import { buildDemoWorkbook, type DemoWorkbook } from "./demoWorkbook";
import { PreviewWorkbook } from "./previewWorkbook";

export function openDemoWorkbook(csvText: string, notice: string): { workbook: PreviewWorkbook; demo: DemoWorkbook } {
  const demo = buildDemoWorkbook(csvText, notice);
  // No output rounding: the grid shows what the engine computed, to the last digit (the engine's
  // default rounds exported numbers to 10 significant digits).
  // Room for a session's undo steps (a ledger write is a few entries; an edit one or two).
  const hf = createEbbWorkbook(demo.sheets, { smartRounding: false, undoLimit: 5000 });
  return { workbook: new PreviewWorkbook(hf), demo };
}
