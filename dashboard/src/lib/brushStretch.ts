/**
 * The channel stretch of a brushed salinity range: salinity interval → km intervals on the
 * survey's S(x) → lines along the channel, all through analysis/geometry.
 */
import { buildChannelNetwork, channelStretch, salinityIntervalToKm } from "../../../analysis/index.ts";
import type { CenterlineGeoJson, ChannelNetwork, SalinityProfile } from "../../../analysis/index.ts";
import type { LonLat } from "../worker/overlay.ts";

/** The network of a centerline file, or undefined when it cannot be read (the worker reports why). */
export function networkOf(text: string | undefined): ChannelNetwork | undefined {
  if (!text) return undefined;
  try {
    return buildChannelNetwork(JSON.parse(text) as CenterlineGeoJson);
  } catch {
    return undefined;
  }
}

/** Km intervals and paths of the channel where the salinity lies within the brushed range. */
export function brushStretch(
  network: ChannelNetwork | undefined,
  profile: SalinityProfile | undefined,
  brush: [number, number] | null,
): { km: Array<[number, number]>; paths: LonLat[][] } {
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
