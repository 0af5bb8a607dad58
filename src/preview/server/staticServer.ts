/** A plain http server for the built preview folder, bound to this machine only. */
import { createReadStream, statSync } from "fs";
import { createServer, type Server } from "http";
import { extname, join, normalize, sep } from "path";

const TYPES: Record<string, string> = {
  ".html": "text/html; charset=utf-8",
  ".js": "text/javascript; charset=utf-8",
  ".map": "application/json; charset=utf-8",
  ".css": "text/css; charset=utf-8",
  ".png": "image/png",
  ".svg": "image/svg+xml",
  ".json": "application/json; charset=utf-8",
};

/** The file under `root` for a URL path, or undefined when it escapes `root` or does not exist. */
export function fileFor(root: string, urlPath: string): string | undefined {
  let path: string;
  try {
    path = decodeURIComponent(urlPath.split("?")[0]);
  } catch {
    return undefined;
  }
  if (path.endsWith("/")) path += "index.html";
  const file = normalize(join(root, path));
  if (file !== root && !file.startsWith(root.endsWith(sep) ? root : root + sep)) return undefined;
  try {
    return statSync(file).isFile() ? file : undefined;
  } catch {
    return undefined;
  }
}

export function createStaticServer(root: string): Server {
  return createServer((req, res) => {
    const file = req.method === "GET" || req.method === "HEAD" ? fileFor(root, req.url ?? "/") : undefined;
    if (!file) {
      res.writeHead(404, { "content-type": "text/plain; charset=utf-8" });
      res.end("Not found.");
      return;
    }
    res.writeHead(200, { "content-type": TYPES[extname(file)] ?? "application/octet-stream", "cache-control": "no-store" });
    if (req.method === "HEAD") res.end();
    else createReadStream(file).pipe(res);
  });
}

/** Listens on 127.0.0.1:port (0 = any free port); rejects with a plain message when the port is taken. */
export function listen(server: Server, port: number): Promise<number> {
  return new Promise((resolvePromise, reject) => {
    server.once("error", (e: NodeJS.ErrnoException) => {
      if (e.code === "EADDRINUSE") {
        reject(new Error(`Port ${port} is already in use. Stop the program using it, or choose another port: PORT=3200 npm start`));
      } else if (e.code === "EACCES") {
        reject(new Error(`Port ${port} needs special permission. Choose a port above 1024: PORT=3200 npm start`));
      } else reject(e);
    });
    server.listen(port, "127.0.0.1", () => {
      const address = server.address();
      resolvePromise(typeof address === "object" && address ? address.port : port);
    });
  });
}
