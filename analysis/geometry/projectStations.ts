/**
 * Project survey stations onto the channel network, with warnings for stations off
 * the channel, beyond its ends, or without a usable position. Nothing is dropped.
 */
import type { ChannelNetwork, GeometryWarning, StationProjection } from "./types.ts";
import { projectLonLatArrays } from "./projectBulk.ts";
import { MAX_ABS_LAT_DEG } from "./lonLat.ts";

/** The part of a station the geometry needs (the survey `Station` type fits). */
export interface StationPosition {
  id: string;
  /** [lon, lat] in decimal degrees (WGS84); undefined when unknown. */
  lonLat?: [number, number] | undefined;
}

/** Options of {@link projectStations}. */
export interface ProjectStationsOptions {
  /** Stations farther than this from the channel are flagged offChannel [m]; default 2000. */
  offChannelThresholdM?: number;
}

/** Projections in input order plus the warnings raised. */
export interface StationProjectionResult {
  projections: StationProjection[];
  warnings: GeometryWarning[];
}

/**
 * Project stations: chainage from the mouth [km], signed cross-channel offset [m]
 * (positive = right bank looking seaward), branch and nearest channel point.
 *
 * @param network from buildChannelNetwork
 * @param stations stations with id and optional [lon, lat] [deg]
 * @param options offChannelThresholdM [m] (default 2000)
 * @returns one projection per station in input order (undefined fields and offChannel = true
 *   for stations without a usable position) and warnings naming each flagged station
 * @throws RangeError when offChannelThresholdM is not a positive number
 * @see projectLonLatArrays for the method.
 */
export function projectStations(
  network: ChannelNetwork,
  stations: readonly StationPosition[],
  options: ProjectStationsOptions = {},
): StationProjectionResult {
  const limitM = options.offChannelThresholdM ?? 2000;
  if (!(limitM > 0) || !Number.isFinite(limitM))
    throw new RangeError(
      `projectStations: options.offChannelThresholdM must be a positive number of metres; got ${limitM}`,
    );
  const warnings: GeometryWarning[] = [];
  const lon = new Float64Array(stations.length).fill(Number.NaN);
  const lat = new Float64Array(stations.length).fill(Number.NaN);
  stations.forEach((st, i) => {
    const ll = st.lonLat;
    if (!ll) {
      warnings.push({
        code: "noPosition",
        message: `Station '${st.id}' has no position; it is kept but not placed along the channel.`,
      });
    } else if (!Number.isFinite(ll[0]) || !Number.isFinite(ll[1]) || Math.abs(ll[1]) > MAX_ABS_LAT_DEG) {
      warnings.push({
        code: "invalidPosition",
        message: `Station '${st.id}' has position [${ll[0]}, ${ll[1]}], which is not a valid [lon, lat] within ±${MAX_ABS_LAT_DEG}° latitude; it is kept but not placed.`,
      });
    } else {
      lon[i] = ll[0];
      lat[i] = ll[1];
    }
  });
  const bulk = projectLonLatArrays(network, lon, lat);
  const projections = stations.map((st, i): StationProjection => {
    const b = bulk.branchIndex[i]!;
    if (b < 0)
      return {
        id: st.id,
        alongChannelKm: undefined,
        offsetM: undefined,
        branchId: undefined,
        nearestLonLat: undefined,
        offChannel: true,
      };
    const offsetM = bulk.offsetM[i]!;
    const branchId = network.branches[b]!.id;
    const offChannel = Math.abs(offsetM) > limitM;
    if (offChannel) {
      warnings.push({
        code: "offChannel",
        message: `Station '${st.id}' lies ${Math.abs(offsetM).toFixed(0)} m from the channel (branch '${branchId}'), more than the ${limitM} m threshold; check its position or the centerline.`,
      });
    }
    const beyond = bulk.beyondEndM[i]!;
    if (beyond > 1) {
      const where =
        bulk.alongChannelKm[i]! < 1e-9 ? "seaward of the mouth" : `beyond the upstream end of branch '${branchId}'`;
      warnings.push({
        code: "beyondChannelEnd",
        message: `Station '${st.id}' lies ${beyond.toFixed(0)} m ${where}; its chainage is that of the channel end.`,
      });
    }
    return {
      id: st.id,
      alongChannelKm: bulk.alongChannelKm[i]!,
      offsetM,
      branchId,
      nearestLonLat: [bulk.nearestLon[i]!, bulk.nearestLat[i]!],
      offChannel,
    };
  });
  return { projections, warnings };
}
