// Benchmark: gzip size of the JavaScript the dashboard ships (dashboard/dist), all of it and the
// part the first page load fetches, against the map libraries alone (maplibre-gl with its worker
// and the deck.gl modules the map uses: LineLayer, PathLayer, ScatterplotLayer; text is drawn by
// MapLibre since the labels moved to symbol layers) built by the same Vite in the same run. The demo's
// data files (fetched, not JavaScript) get a row of their own so nothing leaves the table unseen.
// The baseline is the map libraries as published (MapLibre's two prebuilt bundles), the issue's
// measure. The dashboard builds MapLibre from its TypeScript sources, its worker sharing chunks with
// the page (dashboard/maplibreFromSource.ts): the same map libraries built that way are printed too,
// and a row counts what a cold start fetches in all, the page's scripts and the workers it starts at
// once with everything they import, since the first-load row leaves workers out and so no longer
// compares like with like once MapLibre's worker code moved into a chunk the page loads.
import { mkdirSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { basename, join } from "node:path";
import { gzipSync } from "node:zlib";
import { build } from "vite";
import type { BenchCase, BenchRow } from "../benchCase.ts";
import { DIST, REPO, ensureDist, filesUnder } from "../fixtures/dashboardDist.ts";
import { maplibreFromSource } from "../../dashboard/maplibreFromSource.ts";

const isJs = (p: string) => p.endsWith(".js") || p.endsWith(".mjs");
/** The demo's data files, shipped beside the JavaScript and fetched at start (src/lib/demoData.ts). */
const isDemoData = (p: string) => /\.(csv|geojson)$/.test(p);
const gz = (p: string) => gzipSync(readFileSync(p), { level: 9 }).length;
const kB = (bytes: number) => bytes / 1000;

/** Scripts index.html loads at once: the module entry and its modulepreload links. */
function initialScripts(): string[] {
  const html = readFileSync(join(DIST, "index.html"), "utf8");
  const refs = [...html.matchAll(/<(?:script[^>]*\ssrc|link[^>]*rel="modulepreload"[^>]*\shref)="([^"]+)"/g)].map(
    (m) => m[1]!,
  );
  return refs.filter((r) => isJs(r)).map((r) => join(DIST, r.replace(/^\.\//, "")));
}

/** Workers the dashboard starts at once: MapLibre's (built from source or prebuilt) and the analysis worker. */
const isStartWorker = (p: string) => /^(analysis\.worker|maplibre-worker|maplibre-gl-worker)-/.test(basename(p));

/** The scripts `entries` load, with every chunk they import statically (not `import()`), transitively. */
function withStaticImports(entries: string[]): string[] {
  const seen = new Set<string>();
  const visit = (p: string) => {
    if (seen.has(p)) return;
    seen.add(p);
    const code = readFileSync(p, "utf8");
    for (const m of code.matchAll(/(?:\bfrom|\bimport)\s*["']\.\/([^"']+\.m?js)["']/g))
      visit(join(DIST, "assets", m[1]!));
  };
  entries.forEach(visit);
  return [...seen];
}

/**
 * Builds an app that only imports the map libraries, with the dashboard's Vite settings; `fromSource`
 * builds MapLibre as the dashboard does, otherwise from its published prebuilt bundles. Returns the
 * gzip size of all its JavaScript, worker included.
 */
async function mapLibrariesOnly(fromSource: boolean): Promise<number> {
  const cache = join(REPO, "node_modules", ".cache");
  mkdirSync(cache, { recursive: true });
  const root = mkdtempSync(join(cache, "brackline-maplibs-"));
  try {
    writeFileSync(join(root, "index.html"), '<!doctype html><script type="module" src="./main.js"></script>');
    writeFileSync(
      join(root, "main.js"),
      [
        'import * as maplibregl from "maplibre-gl";',
        'import workerUrl from "maplibre-gl/dist/maplibre-gl-worker.mjs?url";',
        'import { MapboxOverlay } from "@deck.gl/mapbox";',
        'import { LineLayer, PathLayer, ScatterplotLayer } from "@deck.gl/layers";',
        "maplibregl.setWorkerUrl(workerUrl);",
        "globalThis.__libs = [maplibregl.Map, MapboxOverlay, LineLayer, PathLayer, ScatterplotLayer];",
      ].join("\n"),
    );
    await build({
      root,
      configFile: false,
      logLevel: "silent",
      plugins: fromSource ? [maplibreFromSource()] : [],
      base: "./",
      build: { outDir: join(root, "dist"), target: "es2022", emptyOutDir: true, chunkSizeWarningLimit: 1e5 },
    });
    return filesUnder(join(root, "dist"))
      .filter(isJs)
      .reduce((s, p) => s + gz(p), 0);
  } finally {
    rmSync(root, { recursive: true, force: true });
  }
}

export const bundleSizeBench: BenchCase = {
  name: "bundle-size",
  async run(): Promise<BenchRow[]> {
    ensureDist();
    const all = filesUnder(DIST).filter(isJs);
    const total = all.reduce((s, p) => s + gz(p), 0);
    const initial = initialScripts().reduce((s, p) => s + gz(p), 0);
    const libs = await mapLibrariesOnly(false);
    const libsFromSource = await mapLibrariesOnly(true);
    const startScripts = withStaticImports([...initialScripts(), ...all.filter(isStartWorker)]);
    const coldStart = startScripts.reduce((s, p) => s + gz(p), 0);
    const largest = all
      .map((p) => ({ name: basename(p).replace(/-[\w-]{8}\.(m?js)$/, ".$1"), size: gz(p) }))
      .sort((a, b) => b.size - a.size)
      .slice(0, 4)
      .map((f) => `${f.name} ${Math.round(kB(f.size))}`)
      .join(", ");
    const note = `${all.length} files (.js and .mjs, workers included); gzip level 9 (node:zlib); largest kB: ${largest}`;
    const demoData = filesUnder(DIST).filter(isDemoData);
    const demoDataSize = demoData.reduce((s, p) => s + gz(p), 0);
    return [
      {
        name: "shipped dashboard JavaScript, gzip",
        value: kB(total),
        unit: "kB",
        baseline: { name: "map libraries alone (maplibre-gl + worker, deck.gl)", value: kB(libs) },
        ratio: total / libs,
        ratioLabel: "of the map libraries",
        goal: "≤ 850 kB",
        note: `${note}; the map libraries with MapLibre built as the dashboard builds it: ${Math.round(kB(libsFromSource))} kB`,
      },
      {
        name: "JavaScript of the first page load (entry + modulepreload), gzip",
        value: kB(initial),
        unit: "kB",
        baseline: { name: "map libraries alone", value: kB(libs) },
        ratio: initial / libs,
        ratioLabel: "of the map libraries",
        goal: "≤ 1.05× the map libraries",
        note:
          "workers and lazily loaded chunks excluded; the page now loads the MapLibre code its worker shares " +
          `(${(initial / libsFromSource).toFixed(2)}× the map libraries built as the dashboard builds MapLibre)`,
      },
      {
        name: "JavaScript a cold start fetches: first load + the workers started at once (MapLibre, analysis), gzip",
        value: kB(coldStart),
        unit: "kB",
        baseline: { name: "map libraries alone", value: kB(libs) },
        ratio: coldStart / libs,
        ratioLabel: "of the map libraries",
        note: `${startScripts.length} files: entry, modulepreloads, worker entries and the chunks they import`,
      },
      {
        name: "demo data files beside the JavaScript (not counted above), gzip",
        value: kB(demoDataSize),
        unit: "kB",
        note: `${demoData.length} files (.csv, .geojson); the demo reads the combined survey file, centerline and basemap`,
      },
    ];
  },
};
