// Builds the `brackline` CLI from TypeScript to plain JavaScript in cli/dist/ with esbuild (ESM, code
// split per command so `brackline --help` loads only the command list). The npm packages the analysis
// uses are bundled in too (see EXTERNAL). Run as `npm run build:cli`;
// cli/bin/brackline.js calls buildCli() when cli/dist/ is missing; `npm run bench` and the built-CLI
// tests call it when cliBuildIsStale() (scripts/ensure.js does the same for `npm start`/`npm test`).
import { readdirSync, rmSync, statSync } from "node:fs";
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

/**
 * Why the packages are bundled: Node loads a CommonJS package imported from ESM (papaparse, jstat,
 * proj4) by first scanning its whole source for its export names with a lexer written in JavaScript,
 * which V8 then optimises on a helper thread; each thread that loads the analysis (this one and every
 * archive worker) paid that again. Bundled, loading the analysis chunk took ~0.14 s of CPU instead of
 * ~0.27 s per thread (bay archive run, 2 cores). Only the demo's polygon library, which the analysis
 * never loads, stays external. `require` is defined for the one CommonJS `require("stream")` call a
 * bundled package makes (papaparse's Node stream input, unused here).
 */
const EXTERNAL = ["@turf/turf"];

/**
 * Builds cli/dist/ (synchronously, about 0.5 s), then deletes the files of earlier builds that this one
 * did not write (esbuild never removes old chunks, whose names change with their content). Nothing is
 * deleted before the build, so a CLI started from cli/dist/ meanwhile keeps its files.
 */
export async function buildCli() {
  const esbuild = await import("esbuild");
  const { metafile } = esbuild.buildSync({
    metafile: true,
    absWorkingDir: ROOT,
    entryPoints: { main: "cli/main.ts", surveyWorker: "cli/archive/surveyWorker.ts" },
    outdir: DIST,
    bundle: true,
    splitting: true,
    format: "esm",
    platform: "node",
    target: "node20",
    external: EXTERNAL,
    banner: {
      js: 'import { createRequire as __bracklineCreateRequire } from "node:module"; const require = __bracklineCreateRequire(import.meta.url);',
    },
    sourcemap: "linked",
    logLevel: "warning",
    legalComments: "eof",
  });
  const written = new Set(Object.keys(metafile.outputs).map((f) => join(ROOT, f)));
  for (const e of readdirSync(DIST, { withFileTypes: true }))
    if (e.isFile() && !written.has(join(DIST, e.name))) rmSync(join(DIST, e.name));
}

if (process.argv[1] === fileURLToPath(import.meta.url)) await buildCli();
