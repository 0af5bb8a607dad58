/**
 * `npm start`: builds the preview page and serves it on plain http at a printed localhost URL.
 * PORT overrides the default port 3100 (PORT=0 picks any free port).
 */
import { buildPreview } from "./build/buildPreview";
import { PREVIEW_OUT } from "./build/webpackPreview";
import { createStaticServer, listen } from "./server/staticServer";

const DEFAULT_PORT = 3100;

function portFromEnv(): number {
  const text = process.env.PORT;
  if (text === undefined || text.trim() === "") return DEFAULT_PORT;
  const port = Number(text);
  if (!Number.isInteger(port) || port < 0 || port > 65535) {
    throw new Error(`PORT must be a whole number from 0 to 65535 (0 = any free port); got "${text}".`);
  }
  return port;
}

async function main(): Promise<void> {
  const port = portFromEnv();
  // Take the port first: a busy port is reported at once, before a build that would be wasted.
  const server = createStaticServer(PREVIEW_OUT);
  const actual = await listen(server, port);
  console.log("Ebb preview: building the page...");
  await buildPreview();
  console.log(`Ebb preview ready: http://localhost:${actual}/`);
  console.log("Open that address in a browser. Press Ctrl+C to stop.");
  const stop = (): void => {
    server.close();
    process.exit(0);
  };
  process.on("SIGINT", stop);
  process.on("SIGTERM", stop);
}

main().catch((e: unknown) => {
  console.error(`Ebb preview could not start: ${e instanceof Error ? e.message : String(e)}`);
  process.exit(1);
});
