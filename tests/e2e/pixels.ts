/** Reads screenshot pixels (PNG) to check that something was actually drawn. */
import { PNG } from "pngjs";

export interface PixelStats {
  width: number;
  height: number;
  /** Number of distinct colours (quantised to 5 bits per channel). */
  distinctColours: number;
  /** Share of pixels that differ from the most common colour. */
  nonBackgroundShare: number;
}

export function decodePng(bytes: Buffer): PNG {
  return PNG.sync.read(bytes);
}

/** Colour statistics of a PNG, optionally inside a rectangle. */
export function pixelStats(bytes: Buffer, rect?: { x: number; y: number; width: number; height: number }): PixelStats {
  const png = decodePng(bytes);
  const x0 = Math.max(0, Math.floor(rect?.x ?? 0));
  const y0 = Math.max(0, Math.floor(rect?.y ?? 0));
  const x1 = Math.min(png.width, Math.ceil(rect ? rect.x + rect.width : png.width));
  const y1 = Math.min(png.height, Math.ceil(rect ? rect.y + rect.height : png.height));
  const counts = new Map<number, number>();
  let total = 0;
  for (let y = y0; y < y1; y++) {
    for (let x = x0; x < x1; x++) {
      const i = (y * png.width + x) * 4;
      const key = ((png.data[i] >> 3) << 10) | ((png.data[i + 1] >> 3) << 5) | (png.data[i + 2] >> 3);
      counts.set(key, (counts.get(key) ?? 0) + 1);
      total++;
    }
  }
  let top = 0;
  for (const n of counts.values()) top = Math.max(top, n);
  return {
    width: x1 - x0,
    height: y1 - y0,
    distinctColours: counts.size,
    nonBackgroundShare: total === 0 ? 0 : 1 - top / total,
  };
}

/** RGB of one pixel. */
export function pixelAt(bytes: Buffer, x: number, y: number): [number, number, number] {
  const png = decodePng(bytes);
  const i = (Math.round(y) * png.width + Math.round(x)) * 4;
  return [png.data[i], png.data[i + 1], png.data[i + 2]];
}

/** Share of pixels that differ (any channel by more than `threshold`) between two PNGs inside a square. */
export function changedShare(
  before: Buffer,
  after: Buffer,
  centre: [number, number],
  halfSize: number,
  threshold = 24,
): number {
  const a = decodePng(before);
  const b = decodePng(after);
  let changed = 0;
  let total = 0;
  for (let y = Math.round(centre[1] - halfSize); y <= Math.round(centre[1] + halfSize); y++) {
    for (let x = Math.round(centre[0] - halfSize); x <= Math.round(centre[0] + halfSize); x++) {
      if (x < 0 || y < 0 || x >= a.width || y >= a.height || x >= b.width || y >= b.height) continue;
      const i = (y * a.width + x) * 4;
      const j = (y * b.width + x) * 4;
      total++;
      if (
        Math.abs(a.data[i] - b.data[j]) > threshold ||
        Math.abs(a.data[i + 1] - b.data[j + 1]) > threshold ||
        Math.abs(a.data[i + 2] - b.data[j + 2]) > threshold
      ) {
        changed++;
      }
    }
  }
  return total === 0 ? 0 : changed / total;
}
