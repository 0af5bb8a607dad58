/**
 * Registers manifest/manifest.xml with the desktop spreadsheet host for development
 * ("sideloading"), then opens the host. Used by `npm run start:host` once the https dev
 * server listens; also runnable alone:
 *
 *   node manifest/sideload.js            register and open the host
 *   node manifest/sideload.js --remove   unregister
 *
 * Windows: a value under HKCU\Software\Microsoft\Office\16.0\WEF\Developer naming the
 * manifest file. macOS: a copy of the manifest in the host's "wef" folder. Other systems have
 * no desktop host: the script says so and the dev server keeps running.
 */
const { execFileSync, spawn } = require("child_process");
const fs = require("fs");
const os = require("os");
const path = require("path");

const MANIFEST = path.join(__dirname, "manifest.xml");
const WINDOWS_KEY = "HKCU\\Software\\Microsoft\\Office\\16.0\\WEF\\Developer";
const MAC_WEF = path.join(os.homedir(), "Library", "Containers", "com.microsoft.Excel", "Data", "Documents", "wef");

function addInId() {
  const match = /<Id>([^<]+)<\/Id>/.exec(fs.readFileSync(MANIFEST, "utf8"));
  if (!match) throw new Error(`No <Id> in ${MANIFEST}.`);
  return match[1].trim();
}

function sideload() {
  const id = addInId();
  if (process.platform === "win32") {
    execFileSync("reg", ["add", WINDOWS_KEY, "/v", id, "/t", "REG_SZ", "/d", MANIFEST, "/f"], { stdio: "ignore" });
    console.log(`Ebb: registered ${MANIFEST} for the desktop host. Opening it...`);
    spawn("cmd", ["/c", "start", "", "excel"], { detached: true, stdio: "ignore" }).unref();
  } else if (process.platform === "darwin") {
    fs.mkdirSync(MAC_WEF, { recursive: true });
    fs.copyFileSync(MANIFEST, path.join(MAC_WEF, `${id}.manifest.xml`));
    console.log(`Ebb: copied the manifest to ${MAC_WEF}. Opening the host...`);
    spawn("open", ["-a", "Microsoft Excel"], { detached: true, stdio: "ignore" }).unref();
  } else {
    console.log(
      "Ebb: no desktop spreadsheet host on this system, so nothing was sideloaded. The dev server runs at https://localhost:3000; use `npm start` for the preview workbook.",
    );
    return;
  }
  console.log("Ebb: in the host, open a workbook and type =EBB.AHEAD( in a cell; the Home tab has the Ebb ledger button.");
}

function remove() {
  const id = addInId();
  if (process.platform === "win32") {
    try {
      execFileSync("reg", ["delete", WINDOWS_KEY, "/v", id, "/f"], { stdio: "ignore" });
    } catch {
      // not registered: nothing to remove
    }
  } else if (process.platform === "darwin") {
    fs.rmSync(path.join(MAC_WEF, `${id}.manifest.xml`), { force: true });
  }
  console.log("Ebb: the development registration is removed.");
}

module.exports = { sideload, remove, addInId };

if (require.main === module) {
  if (process.argv.includes("--remove")) remove();
  else sideload();
}
