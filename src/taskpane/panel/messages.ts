import { EbbError } from "../../engine";

/** A message for anything thrown: Ebb's own messages as they are, others with a plain lead-in. */
export function messageOf(e: unknown): string {
  if (e instanceof EbbError) return e.message;
  if (e instanceof Error) return `Something went wrong: ${e.message}`;
  return `Something went wrong: ${String(e)}`;
}
