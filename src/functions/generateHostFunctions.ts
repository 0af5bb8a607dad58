/**
 * Writes functions.ts, the spreadsheet host's entry point, from the catalog: one thin wrapper
 * per function with the JSDoc (@customfunction, description, every parameter) from which
 * custom-functions-metadata-plugin generates functions.json in the webpack build.
 *
 *     npx tsx src/functions/generateHostFunctions.ts     # rewrites src/functions/functions.ts
 *
 * test/functions/metadata.test.ts fails when functions.ts and the catalog drift apart.
 */
import { writeFileSync } from "fs";
import { join } from "path";
import { CATALOG, type FunctionSpec, type ParamKind } from "./catalog";

const TYPES: Record<ParamKind, string> = { range: "any[][]", number: "number", word: "string", value: "any" };

/** The TypeScript function name of a catalog entry: AHEAD -> ahead. */
export function wrapperName(spec: FunctionSpec): string {
  return spec.name.toLowerCase();
}

function wrapper(spec: FunctionSpec): string {
  const docs = [
    `/**`,
    ` * ${spec.description}`,
    ` * @customfunction ${spec.name}`,
    ...spec.params.map((p) => ` * @param ${p.name} ${p.help}`),
    ` */`,
  ];
  const params = spec.params.map((p) => `${p.name}${p.optional ? "?" : ""}: ${TYPES[p.kind]}`).join(", ");
  const names = spec.params.map((p) => p.name).join(", ");
  const result = spec.result === "matrix" ? "any[][]" : "number";
  return [
    ...docs,
    `export function ${wrapperName(spec)}(${params}): ${result} {`,
    `  return callHost("${spec.name}", [${names}]);`,
    `}`,
  ].join("\n");
}

export function hostFunctionsSource(): string {
  return [
    `/*`,
    ` * Ebb's worksheet functions for the spreadsheet host (namespace EBB, set in the manifest).`,
    ` * Generated from catalog.ts by generateHostFunctions.ts: edit the catalog, not this file.`,
    ` * custom-functions-metadata-plugin reads the JSDoc below to write functions.json and adds the`,
    ` * CustomFunctions.associate calls when webpack bundles this file.`,
    ` */`,
    `/* eslint-disable @typescript-eslint/no-explicit-any */`,
    `import { callHost } from "./host";`,
    ``,
    CATALOG.map(wrapper).join("\n\n"),
    ``,
  ].join("\n");
}

if (require.main === module) {
  const target = join(__dirname, "functions.ts");
  writeFileSync(target, hostFunctionsSource());
  console.log(`wrote ${target}`);
}
