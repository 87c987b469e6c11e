/**
 * Chainage tick marks for the map: a point every `spacingKm` along every branch.
 */
import type { ChannelNetwork } from "./types.ts";
import { locateKm, segmentPoint } from "./alongChannel.ts";
import { localBearingDeg } from "./ellipsoid.ts";
import { normalizeLon } from "./lonLat.ts";

/** Properties of one tick point. */
export interface KmTickProperties {
  /** Chainage [km from the mouth]. */
  km: number;
  /** Display text, e.g. "12 km" or "2.5 km". */
  label: string;
  /** Channel direction looking upstream (increasing km), clockwise from true north [deg, 0–360). */
  bearingDeg: number;
  branchId: string;
}

/** A GeoJSON FeatureCollection of tick points (RFC 7946). */
export interface KmTickCollection {
  type: "FeatureCollection";
  features: {
    type: "Feature";
    geometry: { type: "Point"; coordinates: [number, number] };
    properties: KmTickProperties;
  }[];
}

/**
 * Tick points at multiples of spacingKm along every branch (the main stem from km 0;
 * a tributary from its first multiple above the confluence, so no tick is repeated).
 *
 * @param network from buildChannelNetwork
 * @param spacingKm tick spacing [km] > 0; at most 100,000 ticks in all
 * @returns FeatureCollection of Points with {km, label, bearingDeg, branchId}; longitudes in [−180, 180)
 * @throws RangeError for a non-positive spacing or too many ticks
 */
export function kmTicks(network: ChannelNetwork, spacingKm: number): KmTickCollection {
  if (!(spacingKm > 0) || !Number.isFinite(spacingKm))
    throw new RangeError(`kmTicks: spacingKm must be a positive number; got ${spacingKm}`);
  if (network.totalLengthKm / spacingKm > 100_000)
    throw new RangeError(
      `kmTicks: spacingKm ${spacingKm} gives more than 100,000 ticks over ${network.totalLengthKm.toFixed(1)} km`,
    );
  const text = String(spacingKm);
  const decimals = text.includes("e") ? 6 : Math.min(6, text.split(".")[1]?.length ?? 0);
  const features: KmTickCollection["features"] = [];
  const s = network.segments;
  network.branches.forEach((b, bi) => {
    const first = bi === 0 ? 0 : Math.floor(b.kmStart / spacingKm + 1e-9) + 1;
    for (let k = first; k * spacingKm <= b.kmEnd + 1e-9; k++) {
      const km = Number((k * spacingKm).toFixed(decimals));
      const { seg, t } = locateKm(network, bi, Math.min(km, b.kmEnd));
      const [lon, lat] = segmentPoint(network, seg, t);
      features.push({
        type: "Feature",
        geometry: { type: "Point", coordinates: [normalizeLon(lon), lat] },
        properties: {
          km,
          label: `${km} km`,
          bearingDeg: localBearingDeg(s.lon0[seg]!, s.lat0[seg]!, s.lon1[seg]!, s.lat1[seg]!),
          branchId: b.id,
        },
      });
    }
  });
  return { type: "FeatureCollection", features };
}
