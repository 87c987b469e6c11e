import type { Survey } from "../survey/survey.ts";
import { localSegmentLengthM } from "../geometry/ellipsoid.ts";
import { distanceOrigin } from "./distanceOrigin.ts";

/** A station as evidence for a centerline: id, position and salinity (one entry per sample; ids may repeat). */
export interface CenterlineStation {
  id: string;
  lonLat?: [number, number] | undefined;
  salinity?: number | undefined;
}

/** A GeoJSON Feature with the centerline built from stations (RFC 7946, [lon, lat]). */
export interface StationCenterline {
  type: "Feature";
  geometry: { type: "LineString"; coordinates: [number, number][] };
  properties: {
    role: "main";
    /** The saltiest end is the last vertex. */
    mouth: "end";
    source: "stations";
    /** Station ids along the line, river first. */
    stationIds: string[];
    /** Stations left out because they would make the line double back (side basins, off the salinity gradient). */
    leftOut: string[];
    /**
     * Stations left off because the surveys' own along-channel distances put them on a separate arm
     * beyond the mouth (see distanceOrigin); also listed in `leftOut`.
     */
    sideArm?: string[];
  };
}

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 === 1 ? s[m]! : (s[m - 1]! + s[m]!) / 2;
}

function dist(a: [number, number], b: [number, number]): number {
  return localSegmentLengthM(a[0], a[1], b[0], b[1]);
}

/** Chaikin corner cutting (Chaikin 1974), end points kept. */
function chaikin(points: [number, number][], rounds: number): [number, number][] {
  let p = points;
  for (let r = 0; r < rounds && p.length > 2; r++) {
    const out: [number, number][] = [p[0]!];
    for (let i = 0; i < p.length - 1; i++) {
      const [a, b] = [p[i]!, p[i + 1]!];
      if (i > 0) out.push([0.75 * a[0] + 0.25 * b[0], 0.75 * a[1] + 0.25 * b[1]]);
      if (i < p.length - 2) out.push([0.25 * a[0] + 0.75 * b[0], 0.25 * a[1] + 0.75 * b[1]]);
    }
    out.push(p[p.length - 1]!);
    p = out;
  }
  return p;
}

/**
 * Offers a channel centerline built from the station positions, for users who have a station table
 * but no centerline: stations are ordered along the salinity gradient (median salinity over all
 * samples, river first) and walked from the freshest station (of those within the tolerance of
 * the lowest salinity, the one farthest from the saltiest) to the nearest station not fresher
 * than the current one (within `salinityTolerance`, default 0.5) — stations passed by (a side basin
 * fresher than the channel beyond it) are left out; then stations that make the line double back are left out one by one (the
 * vertex whose two legs are longest relative to the direct link, while that ratio exceeds
 * `detourRatio`), and the line is smoothed by Chaikin corner cutting with its ends fixed. The
 * result is a suggestion to check and edit: it follows the stations, not the deep channel.
 *
 * @param stations samples with id, [lon, lat] and salinity (ids may repeat; positions averaged per id)
 * @param options detourRatio (default 2), smoothing rounds (default 2)
 * @returns the centerline Feature (mouth at the saltiest end = last vertex), or undefined with
 *   fewer than 2 stations that have both a position and a salinity
 * @see Chaikin, G.M. (1974) An algorithm for high-speed curve generation, Comput. Graph. Image Process. 3:346–349.
 */
export function centerlineFromStations(
  stations: readonly CenterlineStation[],
  options: { detourRatio?: number; smoothingRounds?: number; salinityTolerance?: number } = {},
): StationCenterline | undefined {
  const ratioLimit = options.detourRatio ?? 2;
  if (!(ratioLimit > 1)) throw new RangeError(`centerlineFromStations(): detourRatio must be > 1, got ${ratioLimit}`);
  const byId = new Map<string, { lon: number[]; lat: number[]; sal: number[] }>();
  for (const s of stations) {
    if (s.lonLat === undefined || s.salinity === undefined || !Number.isFinite(s.salinity)) continue;
    if (!Number.isFinite(s.lonLat[0]) || !Number.isFinite(s.lonLat[1])) continue;
    const e = byId.get(s.id) ?? { lon: [], lat: [], sal: [] };
    e.lon.push(s.lonLat[0]);
    e.lat.push(s.lonLat[1]);
    e.sal.push(s.salinity);
    byId.set(s.id, e);
  }
  const pts = [...byId.entries()]
    .map(([id, e]) => ({
      id,
      at: [median(e.lon), median(e.lat)] as [number, number],
      salinity: median(e.sal),
    }))
    .sort((a, b) => a.salinity - b.salinity || a.id.localeCompare(b.id));
  if (pts.length < 2) return undefined;
  const leftOut: string[] = [];
  // Walk up the salinity gradient: from the freshest station, always to the nearest station that is
  // not fresher than the current one (within the tolerance); stations passed by are left out.
  const tol = options.salinityTolerance ?? 0.5;
  // Start: of the stations within the tolerance of the lowest salinity, the one farthest from the saltiest.
  const saltiest = pts[pts.length - 1]!;
  const start = pts
    .filter((p) => p.salinity <= pts[0]!.salinity + tol)
    .reduce((a, b) => (dist(b.at, saltiest.at) > dist(a.at, saltiest.at) ? b : a));
  const path = [start];
  let rest = pts.filter((p) => p !== start);
  while (rest.length > 0) {
    const cur = path[path.length - 1]!;
    const ahead = rest.filter((p) => p.salinity >= cur.salinity - tol);
    for (const p of rest) if (p.salinity < cur.salinity - tol) leftOut.push(p.id);
    if (ahead.length === 0) break;
    const next = ahead.reduce((a, b) => (dist(cur.at, b.at) < dist(cur.at, a.at) ? b : a));
    path.push(next);
    rest = ahead.filter((p) => p !== next);
  }
  pts.splice(0, pts.length, ...path);
  for (;;) {
    let worst = -1;
    let worstRatio = ratioLimit;
    for (let i = 1; i < pts.length - 1; i++) {
      const direct = Math.max(dist(pts[i - 1]!.at, pts[i + 1]!.at), 1);
      const ratio = (dist(pts[i - 1]!.at, pts[i]!.at) + dist(pts[i]!.at, pts[i + 1]!.at)) / direct;
      if (ratio > worstRatio) [worst, worstRatio] = [i, ratio];
    }
    if (worst < 0) break;
    leftOut.push(pts[worst]!.id);
    pts.splice(worst, 1);
  }
  const coords = chaikin(
    pts.map((p) => p.at),
    options.smoothingRounds ?? 2,
  );
  return {
    type: "Feature",
    geometry: { type: "LineString", coordinates: coords },
    properties: { role: "main", mouth: "end", source: "stations", stationIds: pts.map((p) => p.id), leftOut },
  };
}

/**
 * {@link centerlineFromStations} over every station of the surveys (accepted measured salinity only),
 * for the dashboard's draw tool and the CLI. When the surveys also carry along-channel distances
 * counted from the head of a second arm (the salinity maximum inside the distance range, see
 * {@link distanceOrigin}), the stations on that arm are left off the line (listed in `sideArm`), so
 * the line ends at the mouth rather than running on into the side bay.
 *
 * @param surveys the imported surveys
 * @returns the offered centerline, or undefined with fewer than 2 positioned stations with salinity
 */
export function centerlineFromSurveys(surveys: readonly Survey[]): StationCenterline | undefined {
  const samples = surveys.flatMap((s) =>
    s.stations.map((st) => ({
      id: st.id,
      lonLat: st.lonLat,
      salinity: st.salinity.status === "measured" && st.salinity.accepted ? st.salinity.value : undefined,
      distanceKm: (st as { distanceKm?: number }).distanceKm,
    })),
  );
  const pairs = samples.flatMap((p) =>
    p.distanceKm !== undefined && p.salinity !== undefined ? [[p.distanceKm, p.salinity] as const] : [],
  );
  const origin = distanceOrigin(pairs);
  const arm = new Set<string>();
  if (origin?.kind === "interior")
    for (const p of samples)
      if (p.distanceKm !== undefined && (p.distanceKm - origin.mouthKm) * origin.riverSide < 0) arm.add(p.id);
  const line = centerlineFromStations(samples.filter((p) => !arm.has(p.id)));
  if (line === undefined || arm.size === 0) return line;
  const sideArm = [...arm];
  line.properties.leftOut = [...sideArm, ...line.properties.leftOut];
  line.properties.sideArm = sideArm;
  return line;
}
