/**
 * The embedded formula engine with Ebb's worksheet functions: shared by the workbook tests and
 * the preview page.
 */
import { HyperFormula, type ConfigParams, type Sheets } from "hyperformula";
import { EbbFunctionPlugin, translations } from "./plugin";
import { registerStudentQuantile } from "./studentQuantile";

export { EbbFunctionPlugin, functionId } from "./plugin";
export { registerStudentQuantile } from "./studentQuantile";

let registered = false;

/** Registers the EBB functions, and the full-precision T.INV the ledger needs, with the formula engine (once per page or process). */
export function registerEbbFunctions(): void {
  if (registered) return;
  registerStudentQuantile();
  HyperFormula.registerFunctionPlugin(EbbFunctionPlugin, translations(HyperFormula.getRegisteredLanguagesCodes()));
  registered = true;
}

/**
 * A formula-engine workbook where the EBB functions can be typed like built-in ones.
 * @param sheets sheet name -> rows of cell contents (formulas start with "=")
 * @param config engine settings; the GPL-v3 licence key is set unless one is given. The engine
 *   rounds numbers it reports to 10 significant digits unless `smartRounding: false` is given
 *   (the workbook tests compare full precision).
 */
export function createEbbWorkbook(sheets: Sheets = { Sheet1: [] }, config: Partial<ConfigParams> = {}): HyperFormula {
  registerEbbFunctions();
  return HyperFormula.buildFromSheets(sheets, { licenseKey: "gpl-v3", ...config });
}
