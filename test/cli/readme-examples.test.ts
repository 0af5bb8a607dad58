/**
 * The README's batch-command examples are what the command prints: each indented block that
 * starts with `$ npm run --silent ebb -- ...` is run here on the same invented demo file, and the
 * block's lines must be the command's output (a line starting "ebb: " is the caution on standard
 * error). The JSON example shows one product's entry, which must equal that product's entry in
 * the output; the demo table's block shows the beginning of `demo --horizon 3`, up to "...".
 * A changed figure anywhere in the product therefore fails here until the README is rerun.
 */
import { readFileSync } from "fs";
import { join } from "path";
import { REPO, runEbb } from "./runEbb";

const README = readFileSync(join(REPO, "README.md"), "utf8").split(/\r?\n/);

interface Example {
  line: number;
  args: string[];
  expected: string[];
}

/** The indented lines after README line i, indent removed, up to the first line that is not indented. */
function blockAfter(i: number): string[] {
  const out: string[] = [];
  for (let j = i + 1; j < README.length && (README[j].startsWith("    ") || README[j].trim() === ""); j++) out.push(README[j].slice(4));
  while (out.length && out[out.length - 1].trim() === "") out.pop();
  return out;
}

const PROMPT = "    $ npm run --silent ebb -- ";
const examples: Example[] = README.flatMap((l, i) => (l.startsWith(PROMPT) ? [{ line: i + 1, args: l.slice(PROMPT.length).trim().split(/\s+/), expected: blockAfter(i) }] : []));

test("the README has batch-command examples to check", () => {
  expect(examples.length).toBeGreaterThanOrEqual(5);
});

describe.each(examples.map((e) => [`README line ${e.line}: ebb ${e.args.join(" ")}`, e] as const))("%s", (_, example) => {
  test("prints what the README shows", () => {
    const run = runEbb(example.args);
    expect(run.status).toBe(0);
    const shown = example.expected;
    if (shown[0]?.startsWith("{")) {
      // One product's entry of the JSON output.
      const expected = JSON.parse(shown.join("\n")) as { series: { name: string }[] };
      const actual = JSON.parse(run.stdout) as { series: { name: string }[] };
      expect(expected.series.length).toBeGreaterThan(0);
      for (const entry of expected.series) expect(actual.series.find((s) => s.name === entry.name)).toEqual(entry);
      return;
    }
    const errLines = shown.filter((l) => l.startsWith("ebb: "));
    const outLines = shown.filter((l) => !l.startsWith("ebb: "));
    expect(run.stdout.trimEnd().split(/\r?\n/)).toEqual(outLines);
    for (const l of errLines) expect(run.stderr).toContain(l);
  });
});

test("the demo table's beginning is what `demo --horizon 3` prints", () => {
  const at = README.findIndex((l) => l.startsWith("    Ebb demo: Larkmere"));
  expect(at).toBeGreaterThan(0);
  const shown = [README[at].slice(4), ...blockAfter(at)];
  const cut = shown.indexOf("...");
  expect(cut).toBeGreaterThan(3);
  const run = runEbb(["demo", "--horizon", "3"]);
  expect(run.status).toBe(0);
  expect(run.stdout.split(/\r?\n/).slice(0, cut).map((l) => l.trimEnd())).toEqual(shown.slice(0, cut).map((l) => l.trimEnd()));
});
