/**
 * Places every accepted record of an underway log on the channel with the geometry bulk API.
 */
import { projectLonLatArrays } from "../geometry/projectBulk.ts";
import type { ChannelNetwork } from "../geometry/types.ts";
import type { UnderwayData } from "./types.ts";

/** Along-channel position of every record (element i belongs to record i). */
export interface UnderwayProjection {
  /** Chainage of the nearest channel point [km from the mouth]; NaN for rejected records. */
  alongChannelKm: Float64Array;
  /** Signed distance to the channel [m], positive = right bank looking seaward; NaN for rejected records. */
  offsetM: Float64Array;
  /** Index into `branchIds`; −1 for rejected records. */
  branchIndex: Int32Array;
  /** Branch ids of the network, in network order. */
  branchIds: string[];
}

/**
 * Projects the records onto the channel: nearest point on any branch, its chainage and the signed
 * cross-channel offset (exact nearest segment; see projectLonLatArrays). Rejected records (no
 * position) stay unplaced.
 *
 * @param data the columns from readUnderwayText / readUnderwayStream
 * @param network from buildChannelNetwork
 * @returns km from the mouth, offset [m] and branch per record
 * @throws RangeError from projectLonLatArrays for positions beyond ±85° latitude
 * @see projectLonLatArrays (analysis/geometry/projectBulk.ts); Torge & Müller (2012) Geodesy, 4th ed., ch. 4.
 */
export function projectUnderway(data: UnderwayData, network: ChannelNetwork): UnderwayProjection {
  const p = projectLonLatArrays(network, data.lonDeg, data.latDeg);
  return {
    alongChannelKm: p.alongChannelKm,
    offsetM: p.offsetM,
    branchIndex: p.branchIndex,
    branchIds: network.branches.map((b) => b.id),
  };
}
