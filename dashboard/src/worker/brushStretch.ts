/**
 * The channel stretch of a brushed salinity range: salinity interval → km intervals on the
 * survey's S(x) → lines along the channel, all through analysis/geometry.
 */
import { channelStretch, salinityIntervalToKm } from "../../../analysis/index.ts";
import type { ChannelNetwork, SalinityProfile } from "../../../analysis/index.ts";
import type { LonLat } from "./overlay.ts";

/** A brushed salinity range placed on the channel. */
export interface BrushedStretch {
  km: Array<[number, number]>;
  paths: LonLat[][];
}

/** Km intervals and paths of the channel where the salinity lies within the brushed range. */
export function brushStretch(
  network: ChannelNetwork | undefined,
  profile: SalinityProfile | undefined,
  brush: [number, number] | null,
): BrushedStretch {
  if (!network || !profile || !brush) return { km: [], paths: [] };
  const km = salinityIntervalToKm(profile, brush).intervalsKm;
  const paths: LonLat[][] = [];
  for (const iv of km) {
    const g = channelStretch(network, iv, network.mainBranchId);
    if (g?.type === "LineString") paths.push(g.coordinates as LonLat[]);
    else if (g?.type === "MultiLineString") paths.push(...(g.coordinates as LonLat[][]));
  }
  return { km, paths };
}
