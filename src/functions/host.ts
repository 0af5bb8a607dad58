/**
 * Adapter for the spreadsheet host: runs a catalog function on the host's arguments and maps
 * the outcome to the host's values. A failed formula throws CustomFunctions.Error (#VALUE! or
 * #N/A with the message; the host shows messages on those two only), an error inside a block
 * becomes that cell's error, a blank becomes an empty string.
 */
import type { EbbError } from "../engine";
import { specOf } from "./catalog";
import { isEbbError } from "./cells";
import { invoke } from "./invoke";

export function hostError(e: EbbError): CustomFunctions.Error {
  const code = e.kind === "na" ? CustomFunctions.ErrorCode.notAvailable : CustomFunctions.ErrorCode.invalidValue;
  return new CustomFunctions.Error(code, e.message);
}

/** Called by every generated wrapper in functions.ts. */
export function callHost(name: string, args: unknown[]): any {
  const outcome = invoke(specOf(name), args);
  if (!outcome.ok) throw hostError(outcome.error);
  const value = outcome.value;
  if (typeof value === "number") return value;
  return value.map((row) => row.map((c) => (c === null ? "" : isEbbError(c) ? hostError(c) : c)));
}
