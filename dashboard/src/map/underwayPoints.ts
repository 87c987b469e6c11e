/**
 * An underway log's aggregated points (one per grid cell, at most the software WebGL budget) as
 * binary attributes coloured by mean salinity with the shared cividis scale (panels/lib/palette.ts):
 * built once per point set, no per-point objects. Plain TypeScript: the deck.gl layer
 * (underwayLayer.ts) is loaded with deck.gl only when a log is shown.
 */
import { color } from "d3-color";
import { salinityColour, salinityDomain } from "../panels/lib/palette.ts";
import type { UnderwayPoints } from "../worker/underwayProtocol.ts";

/** Most underway points handed to deck.gl (software WebGL stays interactive; TOOLCHAIN notes). */
export const MAX_UNDERWAY_POINTS = 20_000;

const LUT_SIZE = 256;
let lut: Uint8Array | undefined;

/** RGB lookup over the salinity domain (256 steps of the palette's cividis colour). */
function salinityLut(): Uint8Array {
  if (lut) return lut;
  const [lo, hi] = salinityDomain;
  lut = new Uint8Array(LUT_SIZE * 3);
  for (let i = 0; i < LUT_SIZE; i++) {
    const c = color(salinityColour(lo + ((hi - lo) * i) / (LUT_SIZE - 1)))?.rgb();
    lut.set([c?.r ?? 150, c?.g ?? 150, c?.b ?? 150], i * 3);
  }
  return lut;
}

/** Positions (float32 pairs) and colours (RGBA bytes) of the points, for binary deck.gl attributes. */
export function underwayAttributes(
  points: UnderwayPoints,
  alpha = 230,
): { positions: Float32Array; colours: Uint8Array } {
  const n = points.lonDeg.length;
  const positions = new Float32Array(n * 2);
  const colours = new Uint8Array(n * 4);
  const table = salinityLut();
  const [lo, hi] = salinityDomain;
  for (let i = 0; i < n; i++) {
    positions[2 * i] = points.lonDeg[i]!;
    positions[2 * i + 1] = points.latDeg[i]!;
    const s = points.salinity[i]!;
    if (Number.isNaN(s)) colours.set([150, 150, 150, alpha], 4 * i);
    else {
      const k = Math.round(((Math.min(hi, Math.max(lo, s)) - lo) / (hi - lo)) * (LUT_SIZE - 1));
      colours.set([table[3 * k]!, table[3 * k + 1]!, table[3 * k + 2]!, alpha], 4 * i);
    }
  }
  return { positions, colours };
}
