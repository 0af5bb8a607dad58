/**
 * The catalog is typed: an implementation that takes more or fewer arguments than its
 * parameter list, or a narrower type than `unknown`, fails to compile. ts-jest type-checks
 * this file, so each `@ts-expect-error` below fails the suite if the mismatch ever compiles.
 */
import { CATALOG, defineFunction, type ParamSpec } from "../../src/functions/catalog";

const P: ParamSpec = { name: "x", kind: "value", help: "x" };
const base = { description: "d", result: "scalar" as const };

describe("defineFunction", () => {
  it("rejects an implementation with fewer, more or narrower arguments than its parameters", () => {
    // @ts-expect-error one argument for two parameters
    defineFunction({ ...base, name: "FEWER", params: [P, P], run: (_a: unknown) => 1 });
    // @ts-expect-error two arguments for one parameter
    defineFunction({ ...base, name: "MORE", params: [P], run: (_a: unknown, _b: unknown) => 1 });
    // @ts-expect-error an implementation must coerce its own input (takes unknown)
    defineFunction({ ...base, name: "NARROW", params: [P], run: (a: number) => a });
    const ok = defineFunction({ ...base, name: "SAME", params: [P, P], run: (a: unknown, b: unknown) => Number(a) + Number(b) });
    expect(ok.run(1, 2)).toBe(3);
  });

  it("declares every catalog entry with an implementation of matching arity", () => {
    // Function.length counts the declared parameters (no defaults are used in implementations).
    for (const spec of CATALOG) expect([spec.name, spec.run.length]).toEqual([spec.name, spec.params.length]);
  });
});
