/**
 * The add-in manifest and icons: office-addin-manifest reads the manifest; it declares one
 * shared runtime for the functions and the panel, the EBB namespace, the "Ebb ledger" button,
 * only defined resources, https://localhost:3000 URLs of files the build emits; the icons are
 * PNG files of the sizes their names say, as assets/make-icons.js draws them.
 */
import { spawnSync } from "child_process";
import { readFileSync } from "fs";
import { join } from "path";

const ROOT = join(__dirname, "../..");
const MANIFEST = join(ROOT, "manifest/manifest.xml");
const xml = readFileSync(MANIFEST, "utf8");
// eslint-disable-next-line @typescript-eslint/no-require-imports
const icons = require("../../assets/make-icons.js") as { png: (s: number, d: Buffer) => Buffer; pixels: (s: number) => Buffer; SIZES: number[] };
// eslint-disable-next-line @typescript-eslint/no-require-imports
const sideload = require("../../manifest/sideload.js") as { addInId: () => string };

const all = (re: RegExp) => Array.from(xml.matchAll(re), (m) => m[1]);
const resource = (id: string) => new RegExp(`id="${id.replace(/\./g, "\\.")}" DefaultValue="([^"]*)"`).exec(xml)?.[1];

test("office-addin-manifest reads the manifest without error", () => {
  const run = spawnSync(process.execPath, [join(ROOT, "node_modules/office-addin-manifest/cli.js"), "info", MANIFEST], { encoding: "utf8" });
  expect(run.status).toBe(0);
  expect(run.stderr).toBe("");
  expect(run.stdout).toContain(`Id: ${sideload.addInId()}`);
  expect(run.stdout).toContain("Name: Ebb");
  expect(run.stdout).toContain("Hosts: Workbook");
});

test("one shared runtime serves the functions, the ribbon and the Ebb ledger panel", () => {
  expect(xml).toMatch(/<Set Name="SharedRuntime" MinVersion="1\.1"\/>/);
  const runtime = /<Runtime resid="([^"]+)" lifetime="long"\/>/.exec(xml)?.[1];
  expect(runtime).toBeDefined();
  expect(/<Page>\s*<SourceLocation resid="([^"]+)"\/>/.exec(xml)?.[1]).toBe(runtime);
  expect(/<FunctionFile resid="([^"]+)"\/>/.exec(xml)?.[1]).toBe(runtime);
  expect(/<TaskpaneId>[^<]+<\/TaskpaneId>\s*<SourceLocation resid="([^"]+)"\/>/.exec(xml)?.[1]).toBe(runtime);
});

test("the functions' namespace is EBB and the button reads Ebb ledger", () => {
  const ns = /<Namespace resid="([^"]+)"\/>/.exec(xml)?.[1];
  expect(resource(ns!)).toBe("EBB");
  const label = /<Control xsi:type="Button"[^>]*>\s*<Label resid="([^"]+)"\/>/.exec(xml)?.[1];
  expect(resource(label!)).toBe("Ebb ledger");
});

test("every referenced resource is defined, and every URL is a file the dev server serves", () => {
  const referenced = new Set(all(/resid="([^"]+)"/g));
  for (const id of referenced) expect(resource(id)).toBeDefined();
  const served = new Set(["functions.js", "functions.json", "taskpane.html", "assets/help.html", ...icons.SIZES.map((s) => `assets/icon-${s}.png`)]);
  for (const url of all(/DefaultValue="(https?:[^"]+)"/g)) {
    expect(url.startsWith("https://localhost:3000/")).toBe(true);
    expect(served.has(url.slice("https://localhost:3000/".length))).toBe(true);
  }
});

test("store readiness: a support page, a real help page to learn more, and the ExcelApi 1.9 the panel needs", () => {
  expect(/<SupportUrl DefaultValue="([^"]+)"\/>/.exec(xml)?.[1]).toBe("https://localhost:3000/assets/help.html");
  const learnMore = /<LearnMoreUrl resid="([^"]+)"\/>/.exec(xml)?.[1];
  expect(resource(learnMore!)).toBe("https://localhost:3000/assets/help.html");
  expect(xml).toMatch(/<Set Name="ExcelApi" MinVersion="1\.9"\/>/);
  const help = readFileSync(join(ROOT, "assets/help.html"), "utf8");
  expect(help).toMatch(/<title>Ebb help<\/title>/);
  expect(help).toMatch(/orders, stock or budgets/); // DESIGN's caution where forecasts feed orders
});

describe("npm run build:manifest", () => {
  const script = join(ROOT, "manifest/production.js");
  const out = join(ROOT, "test-artifacts/manifest-build/manifest.xml");
  const run = (...args: string[]) => spawnSync(process.execPath, [script, ...args], { encoding: "utf8" });

  test("writes the manifest for a production base URL, every address moved, still valid", () => {
    const done = run("https://addins.example.com/ebb", "--out", out);
    expect(done.status).toBe(0);
    expect(done.stdout).toContain("https://addins.example.com/ebb/");
    const built = readFileSync(out, "utf8");
    expect(built).not.toContain("localhost");
    const urls = Array.from(built.matchAll(/DefaultValue="(https?:[^"]+)"/g), (m) => m[1]);
    expect(urls.length).toBe(all(/DefaultValue="(https?:[^"]+)"/g).length);
    for (const url of urls) expect(url.startsWith("https://addins.example.com/ebb/")).toBe(true);
    expect(built).toContain('DefaultValue="https://addins.example.com/ebb/functions.json"');
    const info = spawnSync(process.execPath, [join(ROOT, "node_modules/office-addin-manifest/cli.js"), "info", out], { encoding: "utf8" });
    expect(info.status).toBe(0);
    expect(info.stdout).toContain("Name: Ebb");
  });

  test.each([
    [[], /No base URL given/],
    [["http://addins.example.com/ebb/"], /not an https address/],
    [["addins example"], /is not a URL/],
  ])("refuses %j with a message saying what to type", (args, message) => {
    const done = run(...(args as string[]), "--out", out + ".refused");
    expect(done.status).toBe(1);
    expect(done.stderr).toMatch(message);
    expect(done.stderr).toContain("for example https://");
  });
});

describe.each([16, 32, 64, 80, 128])("assets/icon-%i.png", (size) => {
  const file = readFileSync(join(ROOT, `assets/icon-${size}.png`));
  test("is a PNG of that size (signature and IHDR, PNG specification section 11.2.2)", () => {
    expect(file.subarray(0, 8)).toEqual(Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]));
    expect(file.subarray(12, 16).toString("ascii")).toBe("IHDR");
    expect(file.readUInt32BE(16)).toBe(size);
    expect(file.readUInt32BE(20)).toBe(size);
  });
  test("is what assets/make-icons.js draws (re-run it after changing the drawing)", () => {
    expect(icons.png(size, icons.pixels(size)).equals(file)).toBe(true);
  });
});
