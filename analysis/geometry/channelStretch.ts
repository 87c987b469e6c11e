/**
 * A stretch of channel between two chainages as GeoJSON, for drawing a highlighted
 * reach (e.g. a reaction zone converted from salinity to km).
 */
import type { ChannelNetwork } from "./types.ts";
import type { LineStringGeometry, MultiLineStringGeometry } from "./geojsonInput.ts";
import { branchIndexOf, locateKm, pathPieces, segmentPoint, type PathPiece } from "./alongChannel.ts";

function pieceLine(network: ChannelNetwork, piece: PathPiece, km1: number, km2: number): [number, number][] {
  const from = Math.max(km1, piece.kmFrom);
  const to = Math.min(km2, piece.kmTo);
  if (!(from < to)) return [];
  const a = locateKm(network, piece.branchIndex, from);
  const b = locateKm(network, piece.branchIndex, to);
  const s = network.segments;
  const line: [number, number][] = [segmentPoint(network, a.seg, a.t)];
  for (let i = a.seg; i < b.seg; i++) line.push([s.lon1[i]!, s.lat1[i]!]);
  line.push(segmentPoint(network, b.seg, b.t));
  return line;
}

function joined(lines: [number, number][][]): [number, number][] {
  const out: [number, number][] = [];
  for (const l of lines) {
    for (const p of l) {
      const last = out[out.length - 1];
      if (!last || last[0] !== p[0] || last[1] !== p[1]) out.push(p);
    }
  }
  return out;
}

/**
 * The channel between chainages km1 and km2 as a GeoJSON geometry (RFC 7946).
 *
 * With a branchId: the path from the mouth to that branch's head, clipped to
 * [km1, km2], as one LineString (below a confluence it follows the branch joined).
 * Without: every branch's own reach within [km1, km2]; a LineString when one piece,
 * else a MultiLineString. Longitudes are unwrapped (continuous across ±180°).
 *
 * @param network from buildChannelNetwork
 * @param kmRange [km1, km2] chainages [km from the mouth], km1 ≤ km2
 * @param branchId optional branch whose path is drawn
 * @returns the geometry, or undefined when the range does not overlap the channel
 * @throws RangeError for km1 > km2, non-finite values or an unknown branch
 */
export function channelStretch(
  network: ChannelNetwork,
  kmRange: [number, number],
  branchId?: string,
): LineStringGeometry | MultiLineStringGeometry | undefined {
  const [km1, km2] = kmRange;
  if (!Number.isFinite(km1) || !Number.isFinite(km2) || km1 > km2)
    throw new RangeError(`channelStretch: kmRange must be finite [km1, km2] with km1 ≤ km2; got [${km1}, ${km2}]`);
  if (branchId !== undefined) {
    const bi = branchIndexOf(network, "channelStretch", branchId);
    const line = joined(pathPieces(network, bi).map((p) => pieceLine(network, p, km1, km2)));
    return line.length >= 2 ? { type: "LineString", coordinates: line } : undefined;
  }
  const lines = network.branches
    .map((b, bi) => pieceLine(network, { branchIndex: bi, kmFrom: b.kmStart, kmTo: b.kmEnd }, km1, km2))
    .filter((l) => l.length >= 2);
  if (lines.length === 0) return undefined;
  return lines.length === 1
    ? { type: "LineString", coordinates: lines[0]! }
    : { type: "MultiLineString", coordinates: lines };
}
