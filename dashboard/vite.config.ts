import { createHash } from "node:crypto";
import { readFileSync, readdirSync } from "node:fs";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { defineConfig } from "vite";
import { svelte } from "@sveltejs/vite-plugin-svelte";
import { proj4Trim } from "./proj4Trim.ts";
import { deckTrim } from "./deckTrim.ts";
import { sharedAnalysisWorker } from "./sharedWorker.ts";
import { demoPreload } from "./demoPreload.ts";
import { maplibreFromSource } from "./maplibreFromSource.ts";

const dashboardDir = fileURLToPath(new URL(".", import.meta.url));
const repoDir = fileURLToPath(new URL("..", import.meta.url));

/**
 * Fingerprint of the analysis engine: every source file under analysis/ and the dashboard worker.
 * The worker's result cache (src/worker/resultCache.ts) keys results by it, so a changed estimator
 * never serves a stored result.
 */
function engineFingerprint(): string {
  const h = createHash("sha256");
  for (const dir of ["analysis", "dashboard/src/worker"]) {
    const files = (readdirSync(join(repoDir, dir), { recursive: true }) as string[])
      .filter((f) => f.endsWith(".ts"))
      .sort();
    for (const f of files) h.update(f).update(readFileSync(join(repoDir, dir, f)));
  }
  return h.digest("hex").slice(0, 32);
}

// The dashboard is a static, offline bundle: no CDN, no remote tiles or fonts.
// The demo's data files from data-demo/ ship as data files beside the JavaScript (src/lib/demoData.ts,
// demoPreload.ts). The analysis worker is an entry of this build, sharing its chunks (sharedWorker.ts).
export default defineConfig({
  root: dashboardDir,
  base: "./",
  plugins: [
    proj4Trim,
    deckTrim,
    sharedAnalysisWorker(),
    maplibreFromSource(),
    demoPreload,
    svelte({ configFile: false }),
  ],
  resolve: {
    // jStat as published is one object no bundler can trim; the dashboard ships the functions we call,
    // copied bit for bit (src/vendor/jstatSubset.ts; tests/dashboard/build/jstatSubset.test.ts).
    alias: [{ find: /^jstat$/, replacement: join(dashboardDir, "src", "vendor", "jstatSubset.ts") }],
  },
  define: { __BRACKLINE_ENGINE__: JSON.stringify(engineFingerprint()) },
  worker: { format: "es", plugins: () => [proj4Trim] },
  server: { fs: { allow: [repoDir] } },
  build: {
    outDir: "dist",
    emptyOutDir: true,
    target: "es2022",
    // The demo's data files are fetched as files (src/lib/demoData.ts), never inlined into JavaScript.
    assetsInlineLimit: (file) => (file.includes("/data-demo/") ? false : undefined),
    // maplibre-gl and deck.gl are large by nature; the whole app stays offline.
    chunkSizeWarningLimit: 2500,
  },
});
