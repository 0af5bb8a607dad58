// Entry of a batch worker thread. Worker threads start a fresh module loader, so this plain
// JavaScript file registers tsx (a dependency, as bin/ebb.js does) before loading the
// TypeScript worker; it works the same under `tsx src/cli/main.ts` and the installed `ebb`.
"use strict";
require("tsx/cjs/api").register();
require("./seriesWorker.ts");
