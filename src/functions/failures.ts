/**
 * Every failure a worksheet function can meet, as an EbbError: the engine's own errors pass
 * through; anything unexpected becomes a #VALUE!-class error with its message, never an
 * exception thrown at the host.
 */
import { EbbError } from "../engine";

export function asEbbError(e: unknown): EbbError {
  if (e instanceof EbbError) return e;
  const detail = e instanceof Error ? e.message : String(e);
  return new EbbError(
    "value",
    "unexpected",
    `Ebb could not compute this result (${detail}). Check the inputs; if they look right, report this message with the data.`,
  );
}
