/**
 * Channel length on the WGS84 ellipsoid.
 */
import type { ChannelNetwork } from "./types.ts";
import { branchIndexOf } from "./alongChannel.ts";

/**
 * Length of the channel network [km].
 *
 * Without branchId: the sum of all branch lengths (the whole network). With branchId:
 * the path length from the mouth to that branch's head (its chainage kmEnd).
 *
 * @param network from buildChannelNetwork
 * @param branchId optional branch
 * @returns length [km]
 * @throws RangeError for an unknown branch
 * @see buildChannelNetwork for how lengths are measured (local tangent plane on WGS84).
 */
export function channelLengthKm(network: ChannelNetwork, branchId?: string): number {
  if (branchId === undefined) return network.totalLengthKm;
  return network.branches[branchIndexOf(network, "channelLengthKm", branchId)]!.kmEnd;
}
