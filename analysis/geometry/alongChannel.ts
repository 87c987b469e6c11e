/**
 * Positions along the channel by chainage: the path from a branch to the mouth and
 * the point at a given km.
 */
import type { ChannelNetwork } from "./types.ts";
import { normalizeLon } from "./lonLat.ts";

/** One stretch of the path from the mouth to a branch head: a branch and its km range. */
export interface PathPiece {
  branchIndex: number;
  kmFrom: number;
  kmTo: number;
}

/** Index of a branch by id (default: the main stem). @throws RangeError for an unknown id */
export function branchIndexOf(network: ChannelNetwork, fn: string, branchId?: string): number {
  if (branchId === undefined) return 0;
  const i = network.branches.findIndex((b) => b.id === branchId);
  if (i < 0)
    throw new RangeError(
      `${fn}: branchId '${branchId}' is not in the network; ids are ${network.branches.map((b) => `'${b.id}'`).join(", ")}`,
    );
  return i;
}

/**
 * The path from the mouth to the head of a branch, as pieces (main stem first):
 * each ancestor from its own start to the confluence of the next, then the branch itself.
 */
export function pathPieces(network: ChannelNetwork, branchIndex: number): PathPiece[] {
  const pieces: PathPiece[] = [];
  let b = network.branches[branchIndex]!;
  pieces.push({ branchIndex, kmFrom: b.kmStart, kmTo: b.kmEnd });
  while (b.parentId !== undefined) {
    const junctionKm = b.kmStart;
    const pi = network.branches.findIndex((x) => x.id === b.parentId);
    b = network.branches[pi]!;
    pieces.unshift({ branchIndex: pi, kmFrom: b.kmStart, kmTo: junctionKm });
  }
  return pieces;
}

/** First and one-past-last packed segment of a branch. */
export function branchSegmentRange(network: ChannelNetwork, branchIndex: number): [number, number] {
  const br = network.segments.branch;
  const lower = (v: number): number => {
    let [lo, hi] = [0, br.length];
    while (lo < hi) {
      const mid = (lo + hi) >> 1;
      if (br[mid]! < v) lo = mid + 1;
      else hi = mid;
    }
    return lo;
  };
  return [lower(branchIndex), lower(branchIndex + 1)];
}

/** The segment of a branch holding chainage km and the position t (0..1) on it; km is clamped to the branch. */
export function locateKm(network: ChannelNetwork, branchIndex: number, km: number): { seg: number; t: number } {
  const { km0, km1 } = network.segments;
  const [start, end] = branchSegmentRange(network, branchIndex);
  let [lo, hi] = [start, end - 1];
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (km1[mid]! < km) lo = mid + 1;
    else hi = mid;
  }
  const span = km1[lo]! - km0[lo]!;
  const t = span > 0 ? Math.min(1, Math.max(0, (km - km0[lo]!) / span)) : 0;
  return { seg: lo, t };
}

/** [lon, lat] at position t of packed segment seg; longitude kept unwrapped. */
export function segmentPoint(network: ChannelNetwork, seg: number, t: number): [number, number] {
  const s = network.segments;
  return [s.lon0[seg]! + t * (s.lon1[seg]! - s.lon0[seg]!), s.lat0[seg]! + t * (s.lat1[seg]! - s.lat0[seg]!)];
}

/**
 * The channel point at a chainage, on the path from the mouth to a branch's head.
 *
 * @param network from buildChannelNetwork
 * @param km chainage [km from the mouth], 0 ≤ km ≤ head of the branch
 * @param branchId branch whose path is followed (default: main stem); below a tributary's
 *   confluence the point lies on the branch it joins
 * @returns [lon, lat] [deg], longitude in [−180, 180)
 * @throws RangeError for an unknown branch or km outside [0, branch head]
 */
export function pointAtKm(network: ChannelNetwork, km: number, branchId?: string): [number, number] {
  const bi = branchIndexOf(network, "pointAtKm", branchId);
  const head = network.branches[bi]!.kmEnd;
  if (!(km >= 0 && km <= head))
    throw new RangeError(
      `pointAtKm: km must lie in [0, ${head.toFixed(3)}] for branch '${network.branches[bi]!.id}'; got ${km}`,
    );
  const piece = pathPieces(network, bi).find((p) => km <= p.kmTo)!;
  const { seg, t } = locateKm(network, piece.branchIndex, km);
  const [lon, lat] = segmentPoint(network, seg, t);
  return [normalizeLon(lon), lat];
}
