/**
 * Typed engine errors. `kind` maps to the host's error values: "value" -> #VALUE!,
 * "na" -> #N/A (not enough history yet, the normal state of a rolling table's first rows).
 * The message always says what is wrong and what to do.
 */
export type EbbErrorKind = "value" | "na";

/** Where in an input an error lies: the 0-based position in the series, and which input ("history" unless said). */
export interface ErrorPlace {
  index: number;
  argument?: string;
}

export class EbbError extends Error {
  readonly kind: EbbErrorKind;
  readonly code: string;
  /** The input cell the message is about, so a host that knows the range can name its address. */
  readonly at?: ErrorPlace;
  constructor(kind: EbbErrorKind, code: string, message: string, at?: ErrorPlace) {
    super(message);
    this.name = "EbbError";
    this.kind = kind;
    this.code = code;
    if (at) this.at = at;
  }
}

/** #VALUE!-class error: the input is wrong and must be changed. */
export function badInput(code: string, message: string, at?: ErrorPlace): EbbError {
  return new EbbError("value", code, message, at);
}

/** #N/A-class error: more history is needed (the normal state of a rolling table's first rows). */
export function notEnough(needed: number, has: number, what = "values", advice = "Add more history."): EbbError {
  const noun = needed === 1 && what === "values" ? "value" : what;
  return new EbbError("na", "not-enough-history", `Needs ${needed} ${noun}, has ${has}. ${advice}`);
}
