#!/usr/bin/env node
// Serves the built dashboard (dashboard/dist) on 127.0.0.1 with no dependencies.
// Port from $PORT, else 5178; if that port is taken, any free port. Prints the URL.
// Usage: node scripts/serve.js [--port N] [--dir PATH]
import { createServer } from "node:http";
import { readFile, stat } from "node:fs/promises";
import { extname, join, normalize, resolve, sep } from "node:path";
import { fileURLToPath } from "node:url";

const MIME = {
  ".html": "text/html; charset=utf-8",
  ".js": "text/javascript; charset=utf-8",
  ".mjs": "text/javascript; charset=utf-8",
  ".css": "text/css; charset=utf-8",
  ".json": "application/json; charset=utf-8",
  ".geojson": "application/geo+json; charset=utf-8",
  ".csv": "text/csv; charset=utf-8",
  ".svg": "image/svg+xml",
  ".png": "image/png",
  ".jpg": "image/jpeg",
  ".ico": "image/x-icon",
  ".woff2": "font/woff2",
  ".wasm": "application/wasm",
  ".map": "application/json; charset=utf-8",
  ".txt": "text/plain; charset=utf-8",
};

function argValue(name) {
  const i = process.argv.indexOf(name);
  return i >= 0 ? process.argv[i + 1] : undefined;
}

const repoRoot = resolve(fileURLToPath(new URL("..", import.meta.url)));
const root = resolve(argValue("--dir") ?? join(repoRoot, "dashboard", "dist"));
const requestedPort = Number(argValue("--port") ?? process.env.PORT ?? 5178);
const host = "127.0.0.1";

/** Resolves a URL path inside `root`, or undefined when it would escape it. */
function fileFor(urlPath) {
  let path;
  try {
    path = decodeURIComponent(urlPath.split("?")[0].split("#")[0]);
  } catch {
    return undefined;
  }
  if (path.endsWith("/")) path += "index.html";
  const full = normalize(join(root, path));
  return full === root || full.startsWith(root + sep) ? full : undefined;
}

async function handle(req, res) {
  if (req.method !== "GET" && req.method !== "HEAD") {
    res.writeHead(405, { allow: "GET, HEAD" }).end();
    return;
  }
  const file = fileFor(req.url ?? "/");
  if (!file) {
    res.writeHead(400, { "content-type": "text/plain" }).end("Bad path\n");
    return;
  }
  try {
    const info = await stat(file);
    if (!info.isFile()) throw new Error("not a file");
    const body = await readFile(file);
    res.writeHead(200, {
      "content-type": MIME[extname(file).toLowerCase()] ?? "application/octet-stream",
      "content-length": body.length,
      "cache-control": "no-cache",
      "x-content-type-options": "nosniff",
    });
    res.end(req.method === "HEAD" ? undefined : body);
  } catch {
    res.writeHead(404, { "content-type": "text/plain; charset=utf-8" }).end(`Not found: ${req.url}\n`);
  }
}

function listen(port) {
  return new Promise((resolvePort, reject) => {
    const server = createServer((req, res) => {
      handle(req, res).catch((error) => {
        res.writeHead(500).end(String(error));
      });
    });
    server.once("error", reject);
    server.listen(port, host, () => resolvePort(server));
  });
}

async function main() {
  try {
    await stat(join(root, "index.html"));
  } catch {
    console.error(`serve: ${join(root, "index.html")} not found; build first with \`npm run build\`.`);
    process.exit(1);
  }
  let server;
  try {
    server = await listen(requestedPort);
  } catch (error) {
    if (error && error.code === "EADDRINUSE") {
      console.error(`serve: port ${requestedPort} is in use; using a free port instead.`);
      server = await listen(0);
    } else {
      throw error;
    }
  }
  const { port } = server.address();
  console.log(`Brackline dashboard: http://${host}:${port}/`);
  console.log("Open that address in a browser (it starts on the invented demo estuary). Press Ctrl+C to stop.");
  const stop = () => server.close(() => process.exit(0));
  process.on("SIGINT", stop);
  process.on("SIGTERM", stop);
}

main().catch((error) => {
  console.error(`serve: ${error instanceof Error ? error.message : String(error)}`);
  process.exit(1);
});
