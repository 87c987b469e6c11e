import type { Survey } from "../survey/survey.ts";
import { localSegmentLengthM } from "../geometry/ellipsoid.ts";
import { distanceOrigin } from "./distanceOrigin.ts";
import { PLATEAU_SALINITY, riverArmEnd } from "./salinityBreak.ts";
import { maxOf, minOf } from "../survey/arrayExtent.ts";

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
    /** The mouth is the last vertex (the saltiest end, or where a side bay was cut off). */
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
    /**
     * Stations left off because the walk up the salinity gradient ran on past the end of the river's
     * salinity gradient and turned across the estuary's axis into a side bay (see sideArmStart); also
     * listed in `leftOut`.
     */
    pastMouth?: string[];
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
 * `detourRatio`); when the path runs on past the end of the river's salinity gradient and turns
 * across the axis into a side bay (a side bay as salty as the entrance, or saltier after
 * evaporation), it is cut at the mouth (`pastMouth`); and the line is smoothed by Chaikin corner
 * cutting with its ends fixed. The
 * result is a suggestion to check and edit: it follows the stations, not the deep channel.
 *
 * @param stations samples with id, [lon, lat] and salinity (ids may repeat; positions averaged per id)
 * @param options detourRatio (default 2), smoothing rounds (default 2)
 * @returns the centerline Feature (mouth at its last vertex: the saltiest end, or where a side bay was cut off), or undefined with
 *   fewer than 2 stations that have both a position and a salinity
 * @see Chaikin, G.M. (1974) An algorithm for high-speed curve generation, Comput. Graph. Image Process. 3:346–349;
 *   Hudson (1966) for the segmented fit that finds the end of the river's gradient
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
  const pastMouth = pts.splice(sideArmStart(pts)).map((p) => p.id);
  leftOut.unshift(...pastMouth);
  const coords = chaikin(
    pts.map((p) => p.at),
    options.smoothingRounds ?? 2,
  );
  return {
    type: "Feature",
    geometry: { type: "LineString", coordinates: coords },
    properties: {
      role: "main",
      mouth: "end",
      source: "stations",
      stationIds: pts.map((p) => p.id),
      leftOut,
      ...(pastMouth.length > 0 ? { pastMouth } : {}),
    },
  };
}

/**
 * A side bay beyond the mouth (our rule): at least SIDE_ARM_MIN_STATIONS stations; turning away from
 * the river arm's direction — the angle between the line from the river's head to the mouth and the
 * line from the mouth to the path's end exceeds 45° (cosine below SIDE_ARM_MAX_COS); and nearly flat
 * in salinity — within SIDE_ARM_MAX_SPREAD of the path's salinity contrast (at least
 * PLATEAU_SALINITY) of the mouth's plateau, so the outer reach of a river arm that bends but still
 * gets saltier seaward stays on the line.
 */
const SIDE_ARM_MIN_STATIONS = 2;
const SIDE_ARM_MAX_COS = Math.SQRT1_2;
const SIDE_ARM_MAX_SPREAD = 0.1;

/** Cosine of the angle between the directions a→b and b→c (local flat-Earth east/north components). */
function turnCos(a: [number, number], b: [number, number], c: [number, number]): number {
  const k = Math.cos((b[1] * Math.PI) / 180);
  const [ux, uy, vx, vy] = [(b[0] - a[0]) * k, b[1] - a[1], (c[0] - b[0]) * k, c[1] - b[1]];
  return (ux * vx + uy * vy) / (Math.hypot(ux, uy) * Math.hypot(vx, vy) || 1);
}

/**
 * Where a walked station path leaves the estuary for a side bay: the mouth is the riverward edge
 * of the plateau of the saltiest station near the end of the river's steep gradient (riverArmEnd,
 * on the path's own chainage); the stations beyond it are a side bay when they pass the rule above.
 * Returns the index of the first station beyond the mouth, or the path's length when there is no side bay.
 */
function sideArmStart(path: ReadonlyArray<{ at: [number, number]; salinity: number }>): number {
  const chainKm = [0];
  for (let i = 1; i < path.length; i++) chainKm.push(chainKm[i - 1]! + dist(path[i - 1]!.at, path[i]!.at) / 1000);
  const end = riverArmEnd(
    path.map((p, i) => ({ distanceKm: chainKm[i]!, medianSalinity: p.salinity, meanSalinity: p.salinity, n: 1 })),
    -1,
    0,
  );
  if (end === undefined) return path.length;
  const m = end.mouthIndex;
  const last = path.length - 1;
  if (last - m < SIDE_ARM_MIN_STATIONS) return path.length;
  if (turnCos(path[0]!.at, path[m]!.at, path[last]!.at) >= SIDE_ARM_MAX_COS) return path.length;
  const salinity = path.map((p) => p.salinity);
  const spread = Math.max(PLATEAU_SALINITY, SIDE_ARM_MAX_SPREAD * (maxOf(salinity) - minOf(salinity)));
  const top = path[end.topIndex]!.salinity;
  const flat = salinity.slice(m + 1).every((s) => Math.abs(s - top) <= spread);
  return flat ? m + 1 : path.length;
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
