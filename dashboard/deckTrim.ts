import { vendorSwap } from "./vendorSwap.ts";

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
export const deckTrim = vendorSwap("brackline-deck-trim", [
  {
    importer: "/node_modules/@deck.gl/core/dist/",
    swaps: { "@loaders.gl/core": "deckNoLoaders.js", "@loaders.gl/images": "deckNoLoaders.js" },
  },
  {
    importer: "/node_modules/@deck.gl/core/dist/lib/attribute/",
    swaps: { "./attribute-buffer-groups.js": "deckWebgpuBufferGroups.js" },
  },
]);
