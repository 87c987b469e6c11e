// Builds the `brackline` CLI from TypeScript to plain JavaScript in cli/dist/ with esbuild (ESM, code
// split per command so `brackline --help` loads only the command list). Run as `npm run build:cli`;
// cli/bin/brackline.js calls buildCli() when cli/dist/ is missing; `npm run bench` and the built-CLI
// tests call it when cliBuildIsStale() (scripts/ensure.js does the same for `npm start`/`npm test`).
import { readdirSync, statSync } from "node:fs";
import { dirname, join } from "node:path";
import { fileURLToPath } from "node:url";

const ROOT = join(dirname(fileURLToPath(import.meta.url)), "..");
export const DIST = join(ROOT, "cli", "dist");
export const ENTRY_OUT = join(DIST, "main.js");
const SOURCE_DIRS = ["cli", "analysis", join("data-demo", "generator")];

function newestMtimeMs(dir) {
  let newest = 0;
  for (const e of readdirSync(dir, { withFileTypes: true })) {
    if (e.name === "dist" || e.name === "node_modules") continue;
    const p = join(dir, e.name);
    if (e.isDirectory()) newest = Math.max(newest, newestMtimeMs(p));
    else if (e.name.endsWith(".ts")) newest = Math.max(newest, statSync(p).mtimeMs);
  }
  return newest;
}

/** True when cli/dist/main.js is missing or older than any TypeScript source it is built from. */
export function cliBuildIsStale() {
  const built = statSync(ENTRY_OUT, { throwIfNoEntry: false })?.mtimeMs;
  if (built === undefined) return true;
  return SOURCE_DIRS.some((d) => newestMtimeMs(join(ROOT, d)) > built);
}

/** Builds cli/dist/ (synchronously, about 0.2 s). */
export async function buildCli() {
  const esbuild = await import("esbuild");
  esbuild.buildSync({
    absWorkingDir: ROOT,
    entryPoints: { main: "cli/main.ts", surveyWorker: "cli/archive/surveyWorker.ts" },
    outdir: DIST,
    bundle: true,
    splitting: true,
    format: "esm",
    platform: "node",
    target: "node20",
    packages: "external",
    sourcemap: "linked",
    logLevel: "warning",
    legalComments: "none",
  });
}

if (process.argv[1] === fileURLToPath(import.meta.url)) await buildCli();
