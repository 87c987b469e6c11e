import { join } from "node:path";
import { fileURLToPath } from "node:url";
import type { Plugin } from "vite";

const vendor = fileURLToPath(new URL("./src/vendor/", import.meta.url));

/**
 * Vite plugin: deck.gl without its WebGPU-only attribute packing. `@deck.gl/core` imports
 * `AttributeBufferGroups`, and with it `@luma.gl/gpgpu` (GPU expression evaluators and their WebGL,
 * WebGPU and CPU operations), but constructs it only when the device is WebGPU; the dashboard's
 * deck.gl is a MapboxOverlay on MapLibre's WebGL context. The class is swapped for a stand-in that
 * throws (src/vendor/deckWebgpuBufferGroups.js); WebGL drawing is unchanged. deck.gl's core also
 * imports loaders.gl, only to fetch layer props given as URL strings; the dashboard's layers take
 * arrays, so `@loaders.gl/core` and `@loaders.gl/images` are swapped for stand-ins
 * (src/vendor/deckNoLoaders.js: registering is a no-op, loading rejects).
 */
export const deckTrim: Plugin = {
  name: "brackline-deck-trim",
  enforce: "pre",
  resolveId(source, importer) {
    if (!importer?.includes("/node_modules/@deck.gl/core/dist/")) return null;
    if (source === "@loaders.gl/core" || source === "@loaders.gl/images") return join(vendor, "deckNoLoaders.js");
    if (!importer.includes("/dist/lib/attribute/")) return null;
    if (source === "./attribute-buffer-groups.js") return join(vendor, "deckWebgpuBufferGroups.js");
    return null;
  },
};
