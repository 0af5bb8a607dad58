/**
 * T.INV at full precision for the embedded formula engine. The engine's own T.INV agrees with
 * base R's qt to only about 1e-8 (3.9e-8 at 0.975 on 400 degrees), coarser than the 1e-9 a
 * ledger's check allows, so a ledger's interval (whose quantile is a T.INV cell) would be
 * reported as changed in the preview although nothing was. The spreadsheet host and LibreOffice
 * compute T.INV to about 1e-15 and need nothing. Same arguments and errors as the built-in:
 * T.INV(probability, degrees), probability strictly between 0 and 1, degrees truncated, at least 1.
 */
import studentQuantile from "@stdlib/stats-base-dists-t-quantile";
import { FunctionArgumentType, FunctionPlugin, HyperFormula, type ImplementedFunctions } from "hyperformula";

type State = Parameters<FunctionPlugin["runFunction"]>[1];
type InterpreterValue = ReturnType<FunctionPlugin["runFunction"]>;

export class StudentQuantilePlugin extends FunctionPlugin {
  static implementedFunctions: ImplementedFunctions = {
    "T.INV": {
      method: "studentQuantile",
      parameters: [
        { argumentType: FunctionArgumentType.NUMBER, greaterThan: 0, lessThan: 1 },
        { argumentType: FunctionArgumentType.NUMBER, minValue: 1 },
      ],
    },
  };

  studentQuantile(ast: { args: unknown[] }, state: State): InterpreterValue {
    return this.runFunction(ast.args as never, state, this.metadata("T.INV"), (p: number, degrees: number) => studentQuantile(p, Math.trunc(degrees)));
  }
}

/** Puts the full-precision T.INV in place of the engine's own (once per page or process). */
export function registerStudentQuantile(): void {
  if (HyperFormula.getFunctionPlugin("T.INV") === StudentQuantilePlugin) return;
  HyperFormula.unregisterFunction("T.INV");
  HyperFormula.registerFunctionPlugin(StudentQuantilePlugin);
}
