// Stand-in for deck.gl's AttributeBufferGroups (@deck.gl/core/dist/lib/attribute/attribute-buffer-groups.js),
// swapped in by dashboard/deckTrim.ts. deck.gl constructs it only on a WebGPU device, to pack grouped
// attributes into extra WebGPU vertex buffers through @luma.gl/gpgpu; the dashboard's deck.gl draws
// through MapLibre's WebGL context (MapboxOverlay), so it is never constructed, and the original would
// only bring @luma.gl/gpgpu (~25 kB gzip) into the build.
export default class AttributeBufferGroups {
  constructor() {
    throw new Error("deck.gl's WebGPU attribute buffer groups are not part of the dashboard build (WebGL only).");
  }
}
