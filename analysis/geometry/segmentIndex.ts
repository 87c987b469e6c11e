/**
 * Pack branch segments into typed arrays and index their boxes with flatbush
 * (a static packed Hilbert R-tree).
 *
 * @see Agafonkin, V. flatbush (npm package, v4), https://github.com/mourner/flatbush
 */
import Flatbush from "flatbush";
import type { ChannelSegments } from "./types.ts";
import type { PlacedBranch } from "./attachBranches.ts";

/** Pack the dense pieces of every branch (branch order kept; branch 0 is the main stem). */
export function packSegments(branches: PlacedBranch[]): ChannelSegments {
  const n = branches.reduce((sum, b) => sum + b.dense.lon.length - 1, 0);
  const s: ChannelSegments = {
    lon0: new Float64Array(n),
    lat0: new Float64Array(n),
    lon1: new Float64Array(n),
    lat1: new Float64Array(n),
    km0: new Float64Array(n),
    km1: new Float64Array(n),
    branch: new Int32Array(n),
    atMouth: new Uint8Array(n),
    atHead: new Uint8Array(n),
  };
  let k = 0;
  branches.forEach((b, bi) => {
    const d = b.dense;
    const last = d.lon.length - 2;
    for (let j = 0; j <= last; j++, k++) {
      s.lon0[k] = d.lon[j]!;
      s.lat0[k] = d.lat[j]!;
      s.lon1[k] = d.lon[j + 1]!;
      s.lat1[k] = d.lat[j + 1]!;
      s.km0[k] = b.kmStart + d.cumM[j]! / 1000;
      s.km1[k] = b.kmStart + d.cumM[j + 1]! / 1000;
      s.branch[k] = bi;
      s.atMouth[k] = bi === 0 && j === 0 ? 1 : 0;
      s.atHead[k] = j === last ? 1 : 0;
    }
  });
  return s;
}

/**
 * Build the flatbush index over segment boxes, x = lon·lonScale, y = lat [deg].
 *
 * @returns the index's serialized data (structured-clone friendly)
 */
export function buildSegmentIndex(s: ChannelSegments, lonScale: number): ArrayBuffer {
  const n = s.lon0.length;
  const index = new Flatbush(n);
  for (let i = 0; i < n; i++) {
    const x0 = s.lon0[i]! * lonScale;
    const x1 = s.lon1[i]! * lonScale;
    const y0 = s.lat0[i]!;
    const y1 = s.lat1[i]!;
    index.add(Math.min(x0, x1), Math.min(y0, y1), Math.max(x0, x1), Math.max(y0, y1));
  }
  index.finish();
  return index.data as ArrayBuffer;
}

const cache = new WeakMap<ArrayBuffer, Flatbush>();

/** The flatbush index of a network, rebuilt from its serialized data once and cached. */
export function segmentIndexOf(data: ArrayBuffer): Flatbush {
  let index = cache.get(data);
  if (!index) {
    index = Flatbush.from(data);
    cache.set(data, index);
  }
  return index;
}
