/**
 * Runs one worksheet function from the catalog and never lets anything escape: the outcome is
 * a finite result or an EbbError with a message. Every host adapter goes through here.
 */
import { badInput, EbbError } from "../engine";
import { type Output, finiteNumber, safeBlock } from "./cells";
import type { FunctionSpec } from "./catalog";
import { asEbbError } from "./failures";
import { located, withPlaces, type ArgumentPlaces } from "./places";

export type Outcome = { ok: true; value: Output } | { ok: false; error: EbbError };

export function invoke(spec: FunctionSpec, args: unknown[], places?: ArgumentPlaces): Outcome {
  return withPlaces(places, () => invokeHere(spec, args));
}

function invokeHere(spec: FunctionSpec, args: unknown[]): Outcome {
  try {
    if (args.length > spec.params.length) {
      throw badInput(
        "too-many-arguments",
        `EBB.${spec.name} takes at most ${spec.params.length} arguments (${spec.params.map((p) => p.name).join(", ")}); it was given ${args.length}.`,
      );
    }
    const value = spec.run(...spec.params.map((_, i) => args[i]));
    return { ok: true, value: typeof value === "number" ? finiteNumber(value, "result") : safeBlock(value) };
  } catch (e) {
    return { ok: false, error: located(asEbbError(e)) };
  }
}
