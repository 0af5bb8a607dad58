/**
 * Ebb's worksheet functions as a function plugin of the embedded formula engine (HyperFormula),
 * registered from the same catalog and running the same implementations as the spreadsheet
 * host. Function ids keep the namespace: EBB.AHEAD.
 *
 * The engine reserves a spilled result's area when a formula is entered, from the formula's
 * text alone (the catalog's size rules): a range's size, or a number typed in the formula such
 * as the horizon. A result smaller than the area is padded with blanks; one that would not fit
 * (a horizon given by a cell reference, for example) becomes #VALUE! with a message.
 */
import { ArraySize, FunctionArgumentType, FunctionPlugin, type ImplementedFunctions } from "hyperformula";
import { badInput } from "../../engine";
import { type ArgShape, CATALOG, type FunctionSpec, NAMESPACE } from "../catalog";
import { invoke } from "../invoke";
import type { ArgumentPlaces } from "../places";
import { argumentIn, blockOut, errorOut } from "./values";

/** The parts of the engine's syntax tree read here (the types are not exported by the package). */
interface Node {
  type: string;
  value?: unknown;
  expression?: Node;
  /** CELL_RANGE: its corners; CELL_REFERENCE: the cell (relative to the formula's cell). */
  start?: CellAddressNode;
  end?: CellAddressNode;
  reference?: CellAddressNode;
}
interface CellAddressNode {
  toSimpleCellAddress(base: { sheet: number; row: number; col: number }): { sheet: number; row: number; col: number };
}
interface SheetNames {
  dependencyGraph?: { sheetMapping?: { getSheetName(id: number): string | undefined } };
}
interface Call {
  args: Node[];
}
type State = Parameters<FunctionPlugin["runFunction"]>[1];
type InterpreterValue = ReturnType<FunctionPlugin["runFunction"]>;

/** The number a formula argument is typed as (12, -1, (3)), if it is one. */
function literalOf(node: Node): number | undefined {
  if (node.type === "NUMBER" && typeof node.value === "number") return node.value;
  if (node.type === "PARENTHESIS" && node.expression) return literalOf(node.expression);
  if ((node.type === "MINUS_UNARY_OP" || node.type === "PLUS_UNARY_OP") && typeof node.value === "object" && node.value !== null) {
    const inner = literalOf(node.value as Node);
    return inner === undefined ? undefined : node.type === "MINUS_UNARY_OP" ? -inner : inner;
  }
  return undefined;
}

export const functionId = (spec: FunctionSpec): string => `${NAMESPACE}.${spec.name}`;
const methodName = (spec: FunctionSpec): string => `ebb${spec.name}`;
const sizeMethodName = (spec: FunctionSpec): string => `ebb${spec.name}Size`;

export class EbbFunctionPlugin extends FunctionPlugin {
  static implementedFunctions: ImplementedFunctions = {};

  /** The area reserved for a spilled result, or undefined when the formula's text does not fix it. */
  reservedSize(spec: FunctionSpec, ast: Call, state: State): { rows: number; cols: number } | undefined {
    const shapes: ArgShape[] = ast.args.map((node) => {
      if (node.type === "EMPTY") return { rows: 1, cols: 1, omitted: true };
      const size = this.arraySizeForAst(node as never, state);
      return { rows: size.height, cols: size.width, literal: literalOf(node), omitted: false };
    });
    const size = spec.size?.(shapes);
    if (!size || !(size.rows >= 1 && size.cols >= 1)) return undefined;
    return { rows: Math.min(size.rows, this.config.maxRows), cols: Math.min(size.cols, this.config.maxColumns) };
  }

  /** Where each range argument lies, so messages name the cell (B86) rather than a position. */
  placesOf(spec: FunctionSpec, ast: Call, state: State): ArgumentPlaces {
    const places: ArgumentPlaces = {};
    const base = state.formulaAddress;
    ast.args.forEach((node, i) => {
      const name = spec.params[i]?.name;
      const corners = node.type === "CELL_RANGE" ? [node.start, node.end] : node.type === "CELL_REFERENCE" ? [node.reference, node.reference] : undefined;
      if (!name || !corners || !corners[0] || !corners[1]) return;
      try {
        const a = corners[0].toSimpleCellAddress(base);
        const b = corners[1].toSimpleCellAddress(base);
        const sheet = a.sheet === base.sheet ? undefined : (this as unknown as SheetNames).dependencyGraph?.sheetMapping?.getSheetName(a.sheet);
        places[name] = { ...(sheet ? { sheet } : {}), row: Math.min(a.row, b.row), col: Math.min(a.col, b.col), rows: Math.abs(b.row - a.row) + 1, cols: Math.abs(b.col - a.col) + 1 };
      } catch {
        // A reference the engine cannot place (a deleted sheet): the message keeps its position.
      }
    });
    return places;
  }

  evaluate(spec: FunctionSpec, ast: Call, state: State): InterpreterValue {
    // Arguments are evaluated here rather than through the engine's argument checks, so that an
    // error value or a surplus argument reaches Ebb's coercion and gets Ebb's message.
    const args = ast.args.map((node) => (node.type === "EMPTY" ? undefined : this.evaluateAst(node as never, state)));
    const outcome = invoke(spec, args.map(argumentIn), this.placesOf(spec, ast, state));
    if (!outcome.ok) return errorOut(outcome.error);
    const value = outcome.value;
    if (typeof value === "number") return value;
    const reserved = this.reservedSize(spec, ast, state) ?? { rows: 1, cols: 1 };
    const rows = value.length;
    const cols = Math.max(0, ...value.map((r) => r.length));
    if (rows > reserved.rows || cols > reserved.cols) {
      return errorOut(
        badInput(
          "result-larger-than-reserved",
          `The result has ${rows} x ${cols} cells but this workbook reserved ${reserved.rows} x ${reserved.cols} when the formula was entered. Type the horizon (and the season length) as plain numbers in the formula, not as cell references.`,
        ),
      );
    }
    return blockOut(value, reserved.rows, reserved.cols);
  }
}

for (const spec of CATALOG) {
  const id = functionId(spec);
  EbbFunctionPlugin.implementedFunctions[id] = {
    method: methodName(spec),
    // Declared for the engine's function list; evaluate() reads the arguments itself.
    parameters: spec.params.map((p) => ({ argumentType: FunctionArgumentType.ANY, optionalArg: p.optional === true })),
    ...(spec.result === "matrix" ? { sizeOfResultArrayMethod: sizeMethodName(spec), vectorizationForbidden: true } : {}),
  };
  const proto = EbbFunctionPlugin.prototype as unknown as Record<string, unknown>;
  proto[methodName(spec)] = function (this: EbbFunctionPlugin, ast: Call, state: State) {
    return this.evaluate(spec, ast, state);
  };
  if (spec.result === "matrix") {
    proto[sizeMethodName(spec)] = function (this: EbbFunctionPlugin, ast: Call, state: State) {
      const size = this.reservedSize(spec, ast, state);
      return size ? new ArraySize(size.cols, size.rows) : ArraySize.scalar();
    };
  }
}

/** Function names for every language: the EBB names are the same in all of them. */
export function translations(languages: string[]): Record<string, Record<string, string>> {
  const names = Object.fromEntries(CATALOG.map((spec) => [functionId(spec), functionId(spec)]));
  return Object.fromEntries(languages.map((code) => [code, names]));
}

