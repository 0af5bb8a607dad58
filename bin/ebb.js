#!/usr/bin/env node
// Launcher for the installed `ebb` command: registers tsx (a dependency) so Node can load the
// TypeScript sources directly, then runs the batch command's entry point.
"use strict";
require("tsx/cjs/api").register();
require("../src/cli/main.ts");
