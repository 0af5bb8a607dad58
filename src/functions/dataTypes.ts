/**
 * Cells holding the host's data types (a formatted number, an entity, a web image) reach a
 * parameter of type any as objects: { type: "FormattedNumber", basicValue: 12, ... }. A
 * number-like data type counts as its basic value; an error data type as its error code; any
 * other data type gets a plain message (see the platform's custom-functions data types page).
 */
import { badInput } from "../engine";

/** The value a cell stands for: the basic value of a data type, anything else unchanged. */
export function basicValueOf(v: unknown, where: () => string): unknown {
  if (typeof v !== "object" || v === null || Array.isArray(v) || v instanceof Error) return v;
  const o = v as { type?: unknown; basicValue?: unknown; errorType?: unknown };
  if (typeof o.type !== "string" || !("basicValue" in o || "text" in o || "properties" in o)) return v;
  if (o.type === "Error") return { code: typeof o.basicValue === "string" ? o.basicValue : String(o.errorType ?? "an error") };
  const basic = o.basicValue;
  if (typeof basic === "number" || typeof basic === "string" || typeof basic === "boolean") return basic;
  throw badInput(
    "data-type-in-range",
    `${where()} holds a data type (${o.type}), not a number. Put the number itself in the cell (or a formula that takes the number from it).`,
  );
}
