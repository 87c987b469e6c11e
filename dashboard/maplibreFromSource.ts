import { createRequire } from "node:module";
import { dirname, join } from "node:path";
import { fileURLToPath } from "node:url";
import { transformWithOxc, type Plugin } from "vite";

const maplibreDir = dirname(createRequire(import.meta.url).resolve("maplibre-gl/package.json"));
/** MapLibre's TypeScript sources, published in the package beside its prebuilt bundles. */
const mainEntry = join(maplibreDir, "src", "index.ts");
const workerEntry = join(maplibreDir, "src", "source", "worker.ts");
/** What the map imports for the worker's URL (src/map/MapView.svelte). */
const workerUrlImport = "maplibre-gl/dist/maplibre-gl-worker.mjs?url";
const workerUrlModule = "\0brackline-maplibre-worker-url";
const sourceDir = `${join(maplibreDir, "src")}/`;
/** Stand-in for the MapLibre Tiles decoder, which only vector tile sources with `encoding: "mlt"` reach. */
const noMlt = fileURLToPath(new URL("./src/vendor/maplibreNoMlt.js", import.meta.url));

/**
 * Vite plugin: in `npm run build` MapLibre is built from the TypeScript sources its package ships
 * (`src/`, generated shaders and style code included) instead of its two prebuilt bundles, and its
 * worker (`src/source/worker.ts`, which starts itself in a worker scope) is an entry of the main
 * build. The prebuilt main-thread bundle and worker bundle each carry their own copy of the style
 * specification, expressions, struct arrays and utilities (~1.7 MB raw, ~460 kB gzip together);
 * built as two entries of one build, every module both sides use ships once, in chunks both load
 * (a module worker may import same-origin chunks), and exports nobody calls are dropped.
 * `MapView.svelte` keeps importing `maplibre-gl` and the worker's `?url`; the dev server and the
 * unit tests use the published bundles as before. MapLibre's classes are written for TypeScript's
 * `useDefineForClassFields: false` (a struct array declares `int16: Int16Array` and its base
 * constructor fills it), which its package ships no tsconfig to say, so its sources are compiled
 * here with that setting. The map's sources are GeoJSON and raster only (src/map/style.ts), so the
 * decoder of MapLibre Tiles vector tiles (`@maplibre/mlt`, ~19 kB gzip) is swapped for a stand-in
 * that throws (src/vendor/maplibreNoMlt.js).
 */
export function maplibreFromSource(): Plugin {
  let building = false;
  let workerRef = "";
  return {
    name: "brackline-maplibre-from-source",
    enforce: "pre",
    configResolved(config) {
      building = config.command === "build";
    },
    buildStart() {
      if (building) workerRef = this.emitFile({ type: "chunk", id: workerEntry, name: "maplibre-worker" });
    },
    resolveId(source, importer) {
      if (!building) return null;
      if (source === "@maplibre/mlt" && importer?.startsWith(sourceDir)) return noMlt;
      if (source === "maplibre-gl") return mainEntry;
      if (source === workerUrlImport) return workerUrlModule;
      return null;
    },
    async transform(code, id) {
      if (!building || !id.startsWith(sourceDir) || !id.endsWith(".ts")) return null;
      const out = await transformWithOxc(code, id, {
        lang: "ts",
        target: "es2021",
        typescript: { removeClassFieldsWithoutInitializer: true },
        assumptions: { setPublicClassFields: true },
      });
      return { code: out.code, map: out.map };
    },
    load(id) {
      if (id !== workerUrlModule) return null;
      return `export default import.meta.ROLLDOWN_FILE_URL_${workerRef};\n`;
    },
  };
}
