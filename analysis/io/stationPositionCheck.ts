import type { ImportIssue } from "../survey/survey.ts";
import type { ImportedStation } from "./importSummary.ts";
import { makeIssue } from "./importSummary.ts";
import { normaliseStationId } from "./stationIds.ts";

/** Positions of one station id further apart than this are reported [km] (common practice: a ship keeps station within a few hundred metres). */
export const STATION_POSITION_TOLERANCE_KM = 1;

const EARTH_RADIUS_KM = 6371.0088;

function distanceKm(a: readonly [number, number], b: readonly [number, number]): number {
  const rad = Math.PI / 180;
  const dLat = (b[1] - a[1]) * rad;
  const dLon = (b[0] - a[0]) * rad;
  const h = Math.sin(dLat / 2) ** 2 + Math.cos(a[1] * rad) * Math.cos(b[1] * rad) * Math.sin(dLon / 2) ** 2;
  return 2 * EARTH_RADIUS_KM * Math.asin(Math.min(1, Math.sqrt(h)));
}

/**
 * Reports station ids that appear at conflicting positions: the first row giving a position is
 * compared with every later row of the same (normalised) id, and the first one more than
 * {@link STATION_POSITION_TOLERANCE_KM} away is named with both rows and both positions (one warning
 * per id). Distances use the haversine formula on a sphere of the mean Earth radius.
 *
 * @param stations imported rows (with lonLat [lon, lat] where known)
 * @param file file name for the issues
 * @param column station column header
 * @returns one warning per conflicting station id
 * @see Moritz, H. (2000) Geodetic Reference System 1980, J. Geodesy 74: 128–133 (mean radius 6371.0088 km)
 */
export function conflictingStationPositions(
  stations: readonly ImportedStation[],
  file: string,
  column: string,
): ImportIssue[] {
  const first = new Map<string, ImportedStation>();
  const reported = new Set<string>();
  const issues: ImportIssue[] = [];
  for (const st of stations) {
    if (st.lonLat === undefined) continue;
    const id = normaliseStationId(st.id).id;
    const f = first.get(id);
    if (f === undefined || f.lonLat === undefined) {
      first.set(id, st);
      continue;
    }
    if (reported.has(id)) continue;
    const d = distanceKm(f.lonLat, st.lonLat);
    if (!(d > STATION_POSITION_TOLERANCE_KM)) continue;
    reported.add(id);
    const fmt = (p: readonly [number, number]): string => `${p[1]}, ${p[0]}`;
    issues.push(
      makeIssue(
        file,
        st.sourceRow,
        column,
        st.id,
        `one position per station id: station ${st.id} is at ${fmt(st.lonLat)} (lat, lon) on row ${st.sourceRow} but at ${fmt(f.lonLat)} on row ${f.sourceRow}, ${d.toFixed(1)} km apart — check the id or the coordinates`,
        "warning",
      ),
    );
  }
  return issues;
}
