/**
 * Writes the manifest for a production server: every https://localhost:3000/ address of
 * manifest/manifest.xml becomes the base URL given on the command line (the folder that
 * serves the files `npm run build` writes into dist/).
 *
 *   npm run build:manifest -- https://addins.example.com/ebb/            writes dist/manifest.xml
 *   npm run build:manifest -- https://addins.example.com/ebb/ --out x.xml  writes x.xml
 */
const fs = require("fs");
const path = require("path");

const SOURCE = path.join(__dirname, "manifest.xml");
const DEV_BASE = "https://localhost:3000/";

/** The base URL as the manifest needs it (https, ending in "/"), or an Error saying what to type. */
function productionBase(text) {
  const usage = "Give the https address that serves the built files, for example https://addins.example.com/ebb/";
  if (!text) return new Error(`No base URL given. ${usage}`);
  let url;
  try {
    url = new URL(text);
  } catch {
    return new Error(`"${text}" is not a URL. ${usage}`);
  }
  if (url.protocol !== "https:") return new Error(`"${text}" is not an https address; the host loads add-ins over https only. ${usage}`);
  if (url.search || url.hash) return new Error(`"${text}" has a query or a fragment; give the folder only. ${usage}`);
  return url.href.endsWith("/") ? url.href : `${url.href}/`;
}

/** The development manifest with every dev-server address moved to `base`. */
function productionManifest(xml, base) {
  const note = `<!-- Ebb add-in manifest for ${base}, written by npm run build:manifest from manifest/manifest.xml. -->`;
  return xml.replace(/<!--[\s\S]*?-->/, note).split(DEV_BASE).join(base);
}

function main(argv) {
  const outAt = argv.indexOf("--out");
  const out = outAt >= 0 ? argv[outAt + 1] : path.join(__dirname, "..", "dist", "manifest.xml");
  const positional = argv.filter((a, i) => !a.startsWith("--") && (outAt < 0 || i !== outAt + 1));
  const base = productionBase(positional[0]);
  if (base instanceof Error) {
    console.error(base.message);
    return 1;
  }
  if (!out) {
    console.error("--out needs a file name, for example --out dist/manifest.xml");
    return 1;
  }
  try {
    fs.mkdirSync(path.dirname(path.resolve(out)), { recursive: true });
    fs.writeFileSync(out, productionManifest(fs.readFileSync(SOURCE, "utf8"), base));
  } catch (e) {
    console.error(`Could not write ${out}: ${e.message}`);
    return 1;
  }
  console.log(`Wrote ${out} for ${base} (serve the files of dist/ there).`);
  return 0;
}

if (require.main === module) process.exitCode = main(process.argv.slice(2));

module.exports = { productionBase, productionManifest };
