/**
 * The preview's workbook: a thin reading and editing layer over the shared HyperFormula instance
 * (every EBB function registered). The grid, the formula bar and the panel's preview port speak
 * to this, never to HyperFormula directly.
 */
import type { HyperFormula, RawCellContent, SimpleCellAddress } from "hyperformula";
import { DetailedCellError } from "hyperformula";
import { a1, quoteSheet } from "./addresses";
import { numberText } from "./cellText";

export type CellKind = "empty" | "number" | "text" | "boolean" | "error";

/** Where a cell sits in a spilled array: not in one, its formula cell, or a cell it spilled into. */
export type SpillRole = "none" | "anchor" | "part";

export interface CellView {
  kind: CellKind;
  /** What the grid shows. */
  text: string;
  /** The value at full precision (numbers), for reading back. */
  value: number | string | boolean | null;
  /** Error code (#N/A, #VALUE!...) and its message, when the cell holds an error. */
  error?: { code: string; message: string };
  spill: SpillRole;
  /** The spilled block this cell belongs to (A1 range on its sheet). */
  spillRange?: string;
  hasFormula: boolean;
}

export interface CellRect {
  top: number;
  left: number;
  bottom: number;
  right: number;
}

type Listener = () => void;

interface ArrayVertexLike {
  getRangeOrUndef(): { start: SimpleCellAddress; end: SimpleCellAddress } | undefined;
  getFormula(service: unknown): unknown;
}

/**
 * The engine's own spill-size rule (the catalog's size rules through the function plugin). The
 * engine does not export it, so it is read here and used only when present: without it the
 * #SPILL! message stays general and a blocked block comes back once its formula is re-entered.
 */
interface EngineInternals {
  _lazilyTransformingAstService?: unknown;
  _crudOperations?: { undoRedo?: { undoStack?: unknown[]; redoStack?: unknown[] }; operations?: { arraySizePredictor?: { checkArraySize(ast: unknown, at: SimpleCellAddress): { width: number; height: number } } } };
}

export class PreviewWorkbook {
  private readonly listeners = new Set<Listener>();
  private readonly sizes = new Map<string, { rows: number; cols: number }>();
  /** Steps for Ctrl+Z and Ctrl+Y: how many of the engine's undo entries each user step made. */
  private readonly done: number[] = [];
  private readonly undone: number[] = [];
  private stepDepth = 0;
  private knownDepth = 0;

  constructor(readonly hf: HyperFormula) {
    const notify = (): void => {
      this.sizes.clear();
      this.listeners.forEach((l) => l());
    };
    hf.on("valuesUpdated", notify);
    hf.on("sheetAdded", notify);
    hf.on("sheetRemoved", notify);
    hf.on("sheetRenamed", notify);
    // The workbook as opened is where undo stops.
    hf.clearUndoStack();
    hf.clearRedoStack();
  }

  /**
   * Run one user step (an edit, a cleared selection, one write of the panel): however many
   * engine operations it takes (a cell, then the blocked results that spill again; a sheet, its
   * names and cells), Ctrl+Z undoes it whole. Steps nest: the outermost one counts.
   */
  step<T>(fn: () => T): T {
    if (this.stepDepth === 0) this.recordStep();
    this.stepDepth++;
    try {
      return fn();
    } finally {
      this.stepDepth--;
      if (this.stepDepth === 0) this.recordStep();
    }
  }

  /** Undo the last user step; false when there is none. */
  undo(): boolean {
    this.recordStep();
    return this.replay(this.done, this.undone, () => this.hf.isThereSomethingToUndo(), () => this.hf.undo());
  }

  /** Redo the last undone step; false when there is none. */
  redo(): boolean {
    return this.replay(this.undone, this.done, () => this.hf.isThereSomethingToRedo(), () => this.hf.redo());
  }

  /** Replay the engine entries of the newest step of `from`, one `apply` each while `can` says so, and move the step to `to`. */
  private replay(from: number[], to: number[], can: () => boolean, apply: () => void): boolean {
    const n = from.pop();
    if (n === undefined) return false;
    for (let i = 0; i < n && can(); i++) apply();
    to.push(n);
    this.knownDepth = this.undoDepth();
    return true;
  }

  /**
   * The engine entries made since the last count become one step: at the end of a step, and
   * before one starts or an undo (changes made outside a step, none expected, so counts stay right).
   */
  private recordStep(): void {
    const extra = this.undoDepth() - this.knownDepth;
    if (extra > 0) {
      this.done.push(extra);
      this.undone.length = 0;
    }
    this.knownDepth = this.undoDepth();
  }

  /** Entries on the engine's undo stack (its public API has only "is there something to undo"). */
  private undoDepth(): number {
    return (this.hf as unknown as EngineInternals)._crudOperations?.undoRedo?.undoStack?.length ?? 0;
  }

  /** Called after any change of values or sheets (edits, the panel's writes). */
  onChange(listener: Listener): () => void {
    this.listeners.add(listener);
    return () => this.listeners.delete(listener);
  }

  sheetNames(): string[] {
    return this.hf.getSheetNames();
  }

  sheetId(name: string): number {
    const id = this.hf.getSheetId(name);
    if (id === undefined) throw new Error(`There is no sheet named "${name}".`);
    return id;
  }

  /**
   * Rows and columns in use on a sheet: up to the last cell holding something. (The engine's own
   * dimensions also count empty cells that a range or name merely refers to, such as the rows a
   * ledger's names reserve for future actuals.)
   */
  size(sheet: string): { rows: number; cols: number } {
    const cached = this.sizes.get(sheet);
    if (cached) return cached;
    const values = this.hf.getSheetValues(this.sheetId(sheet));
    let rows = 0;
    let cols = 0;
    values.forEach((line, r) => {
      for (let c = line.length - 1; c >= 0; c--) {
        const v = line[c];
        if (v !== null && v !== undefined) {
          rows = r + 1;
          cols = Math.max(cols, c + 1);
          break;
        }
      }
    });
    const size = { rows, cols };
    this.sizes.set(sheet, size);
    return size;
  }

  cell(sheet: string, row: number, col: number): CellView {
    const address = { sheet: this.sheetId(sheet), row, col };
    const raw = this.hf.getCellValue(address);
    const hasFormula = this.hf.doesCellHaveFormula(address);
    const role = this.spillRole(address);
    const range = role === "none" ? undefined : this.spillRangeOf(address);
    const base = { spill: role, spillRange: range ? rangeText(range) : undefined, hasFormula };
    if (raw instanceof DetailedCellError) {
      const message = raw.value === "#SPILL!" ? this.spillMessage(address) : raw.message || describeCode(raw.value);
      return { ...base, kind: "error", text: raw.value, value: raw.value, error: { code: raw.value, message } };
    }
    if (raw === null || raw === undefined) return { ...base, kind: "empty", text: "", value: null };
    if (typeof raw === "number") return { ...base, kind: "number", text: numberText(raw), value: raw };
    if (typeof raw === "boolean") return { ...base, kind: "boolean", text: raw ? "TRUE" : "FALSE", value: raw };
    return { ...base, kind: "text", text: String(raw), value: String(raw) };
  }

  /**
   * What the formula bar shows for a cell: its formula, or its typed value. A cell that an array
   * spilled into shows the formula of the array's first cell (it cannot be edited there).
   */
  input(sheet: string, row: number, col: number): { text: string; spilledFrom?: string } {
    const address = { sheet: this.sheetId(sheet), row, col };
    if (this.spillRole(address) === "part") {
      const range = this.spillRangeOf(address);
      if (range) {
        return { text: this.hf.getCellFormula(range.start) ?? "", spilledFrom: a1(range.start.row, range.start.col) };
      }
    }
    const formula = this.hf.getCellFormula(address);
    if (formula !== undefined) return { text: formula };
    const raw = this.hf.getCellSerialized(address);
    if (raw === null || raw === undefined) return { text: "" };
    return { text: typeof raw === "number" ? String(raw) : typeof raw === "boolean" ? (raw ? "TRUE" : "FALSE") : String(raw) };
  }

  /**
   * Sets a cell from what a person typed: "=..." is a formula, a number is a number, empty text
   * clears the cell, anything else is text. Returns a message instead of throwing. With
   * `respill` false the caller calls respillCleared once after a run of edits.
   */
  setInput(sheet: string, row: number, col: number, text: string, respill = true): { ok: true } | { ok: false; message: string } {
    const address = { sheet: this.sheetId(sheet), row, col };
    if (!this.hf.isItPossibleToSetCellContents(address)) {
      return { ok: false, message: `${a1(row, col)} cannot be changed here.` };
    }
    try {
      this.step(() => {
        this.hf.setCellContents(address, [[parseInput(text)]]);
        if (respill) this.respillCleared(sheet);
      });
      return { ok: true };
    } catch (e) {
      return { ok: false, message: `${a1(row, col)} was not changed: ${e instanceof Error ? e.message : String(e)}` };
    }
  }

  /** Reference text for a range on a sheet, as formulas and the panel write it: Sales!B2:B85. */
  reference(sheet: string, rect: CellRect): string {
    const start = a1(rect.top, rect.left);
    const end = a1(rect.bottom, rect.right);
    return `${quoteSheet(sheet)}!${start === end ? start : `${start}:${end}`}`;
  }

  /**
   * Blocked results whose way is now clear spill again at once, as a spreadsheet does (the
   * engine itself only retries when the formula is entered again). Called after every edit.
   */
  respillCleared(sheetName: string): void {
    const sheet = this.sheetId(sheetName);
    const formulas = this.hf.getSheetFormulas(sheet);
    formulas.forEach((line, row) =>
      line.forEach((formula, col) => {
        if (formula === undefined) return;
        const at = { sheet, row, col };
        const value = this.hf.getCellValue(at);
        if (!(value instanceof DetailedCellError) || value.value !== "#SPILL!") return;
        const blockers = this.spillBlockers(at);
        if (blockers && blockers.length === 0) this.hf.setCellContents(at, [[formula]]);
      }),
    );
  }

  /** The cells a formula's result needs (its own first), or undefined when the engine cannot say. */
  private spillArea(at: SimpleCellAddress): CellRect | undefined {
    const engine = this.hf as unknown as EngineInternals;
    const predictor = engine._crudOperations?.operations?.arraySizePredictor;
    const vertex = this.hf.dependencyGraph.getCell(at) as unknown as Partial<ArrayVertexLike> | undefined;
    if (!predictor || !vertex || typeof vertex.getFormula !== "function") return undefined;
    try {
      const size = predictor.checkArraySize(vertex.getFormula(engine._lazilyTransformingAstService), at);
      if (!(size.width >= 1 && size.height >= 1)) return undefined;
      return { top: at.row, left: at.col, bottom: at.row + size.height - 1, right: at.col + size.width - 1 };
    } catch {
      return undefined;
    }
  }

  /** Cells that stand in a blocked result's way: holding something, or part of another block. */
  private spillBlockers(at: SimpleCellAddress): SimpleCellAddress[] | undefined {
    const area = this.spillArea(at);
    if (!area) return undefined;
    const out: SimpleCellAddress[] = [];
    for (let row = area.top; row <= area.bottom; row++) {
      for (let col = area.left; col <= area.right; col++) {
        if (row === at.row && col === at.col) continue;
        const cell = { sheet: at.sheet, row, col };
        const typed = this.hf.getCellSerialized(cell);
        if ((typed !== null && typed !== undefined && typed !== "") || this.hf.isCellPartOfArray(cell)) out.push(cell);
      }
    }
    return out;
  }

  /** #SPILL! in words: the area the result needs and the cells in its way. */
  private spillMessage(at: SimpleCellAddress): string {
    const area = this.spillArea(at);
    const blockers = this.spillBlockers(at);
    if (!area || !blockers || blockers.length === 0) return describeCode("#SPILL!");
    const named = blockers.slice(0, 3).map((c) => a1(c.row, c.col));
    const more = blockers.length > 3 ? ` and ${blockers.length - 3} more` : "";
    const cells = `${named.join(", ")}${more}`;
    const one = blockers.length === 1;
    return `The result needs ${a1(area.top, area.left)}:${a1(area.bottom, area.right)}, and ${cells} ${one ? "is" : "are"} in the way. Clear ${one ? "that cell" : "those cells"} (or move the formula) and the result appears.`;
  }

  private spillRole(address: SimpleCellAddress): SpillRole {
    if (!this.hf.isCellPartOfArray(address)) return "none";
    const type = this.hf.getCellType(address);
    return String(type) === "ARRAYFORMULA" ? "anchor" : "part";
  }

  /** The spilled block a cell belongs to (HyperFormula keeps one vertex per array). */
  private spillRangeOf(address: SimpleCellAddress): { start: SimpleCellAddress; end: SimpleCellAddress } | undefined {
    const vertex = this.hf.dependencyGraph.getCell(address) as unknown as Partial<ArrayVertexLike> | undefined;
    if (!vertex || typeof vertex.getRangeOrUndef !== "function") return undefined;
    return vertex.getRangeOrUndef();
  }
}

function rangeText(r: { start: SimpleCellAddress; end: SimpleCellAddress }): string {
  return `${a1(r.start.row, r.start.col)}:${a1(r.end.row, r.end.col)}`;
}

/** Typed text to cell content: numbers as numbers, "=..." as formulas, "" clears. */
export function parseInput(text: string): RawCellContent {
  const t = text.trim();
  if (t === "") return null;
  if (t.startsWith("=")) return t;
  if (/^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/.test(t)) return Number(t);
  if (/^true$/i.test(t)) return true;
  if (/^false$/i.test(t)) return false;
  return text;
}

/** Plain words for errors that come without a message. */
export function describeCode(code: string): string {
  switch (code) {
    case "#SPILL!":
      return "The result needs more room: clear the cells it would spill into.";
    case "#REF!":
      return "The formula refers to a cell that does not exist.";
    case "#NAME?":
      return "Unknown function or name: check the spelling.";
    case "#DIV/0!":
      return "Division by zero.";
    case "#CYCLE!":
      return "The formula refers to itself, directly or through other cells.";
    case "#N/A":
      return "A value is not available yet.";
    case "#VALUE!":
      return "A value has the wrong type.";
    case "#NUM!":
      return "A number is out of range.";
    default:
      return "The formula could not be computed.";
  }
}
