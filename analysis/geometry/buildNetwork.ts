/**
 * Build a {@link ChannelNetwork} from a GeoJSON centerline.
 */
import { centerlineMouthHint } from "./mouthHint.ts";
import type { ChannelBranch, ChannelNetwork, GeometryWarning, MouthOption } from "./types.ts";
import { readCenterlines, type CenterlineGeoJson, type RawLine } from "./geojsonInput.ts";
import { densifyPolyline, polylineLengthM } from "./polyline.ts";
import { attachBranches, type PlacedBranch } from "./attachBranches.ts";
import { buildSegmentIndex, packSegments } from "./segmentIndex.ts";
import { checkLonLat, wrapNear } from "./lonLat.ts";
import { DEG_TO_RAD, localSegmentLengthM, meridionalRadiusM, primeVerticalRadiusM } from "./ellipsoid.ts";

/** Options of {@link buildChannelNetwork}. */
export interface ChannelNetworkOptions {
  /** Which end of the main stem is the mouth; unstated → first vertex assumed, with a "mouthAssumed" warning (see suggestMouth). */
  mouth?: MouthOption;
  /** Id of the main stem; default: the line with properties.role === "main", else the longest. */
  mainBranchId?: string;
  /** Largest gap between a tributary's end and the branch it joins [m]; default 500. */
  confluenceToleranceM?: number;
  /** Segments longer than this are split for the local-plane formulas [m]; default 500. */
  maxSegmentM?: number;
}

const FN = "buildChannelNetwork";

function chooseMain(lines: RawLine[], lengthsM: number[], wanted: string | undefined): number {
  if (wanted !== undefined) {
    const i = lines.findIndex((l) => l.id === wanted);
    if (i < 0)
      throw new RangeError(
        `${FN}: options.mainBranchId '${wanted}' is not a line id; ids are ${lines.map((l) => `'${l.id}'`).join(", ")}`,
      );
    return i;
  }
  const mains = lines.flatMap((l, i) => (l.isMain ? [i] : []));
  if (mains.length > 1)
    throw new RangeError(
      `${FN}: ${mains.length} lines have properties.role "main" (${mains.map((i) => `'${lines[i]!.id}'`).join(", ")}); mark only one`,
    );
  if (mains.length === 1) return mains[0]!;
  return lengthsM.reduce((best, len, i) => (len > lengthsM[best]! ? i : best), 0);
}

function mouthAtStart(
  main: RawLine,
  mouth: MouthOption | undefined,
  toleranceM: number,
  warnings: GeometryWarning[],
): [boolean, ChannelNetwork["mouthSource"]] {
  if (mouth === undefined) {
    warnings.push({
      code: "mouthAssumed",
      message: `The mouth was not stated; the first vertex of main stem '${main.id}' is assumed to be the mouth. Set it with --mouth start|end|lon,lat on the command line or the Mouth control in the dashboard.`,
    });
    return [true, "assumed"];
  }
  if (mouth === "start" || mouth === "end") return [mouth === "start", mouth];
  if (!Array.isArray(mouth) || mouth.length !== 2)
    throw new TypeError(`${FN}: options.mouth must be "start", "end" or [lon, lat]; got ${JSON.stringify(mouth)}`);
  checkLonLat(FN, "options.mouth", mouth[0], mouth[1]);
  const [a, b] = [main.coords[0]!, main.coords[main.coords.length - 1]!];
  const da = localSegmentLengthM(a[0], a[1], wrapNear(mouth[0], a[0]), mouth[1]);
  const db = localSegmentLengthM(b[0], b[1], wrapNear(mouth[0], b[0]), mouth[1]);
  const d = Math.min(da, db);
  if (d > toleranceM)
    warnings.push({
      code: "mouthFar",
      message: `options.mouth [${mouth[0]}, ${mouth[1]}] is ${(d / 1000).toFixed(2)} km from the nearest end of main stem '${main.id}'; that end is used as the mouth.`,
    });
  return [da <= db, "point"];
}

function toBranch(p: PlacedBranch, isMain: boolean): ChannelBranch {
  const vertexKm = p.dense.vertexPos.map((j) => p.kmStart + p.dense.cumM[j]! / 1000);
  const lengthKm = p.dense.cumM[p.dense.cumM.length - 1]! / 1000;
  return {
    id: p.id,
    ...(p.name !== undefined ? { name: p.name } : {}),
    role: isMain ? "main" : "tributary",
    ...(p.parentId !== undefined ? { parentId: p.parentId } : {}),
    kmStart: p.kmStart,
    kmEnd: p.kmStart + lengthKm,
    lengthKm,
    coordinates: p.coords,
    vertexKm,
    reversed: p.reversed,
  };
}

/**
 * Build the channel network: pick the main stem, orient it from the mouth, attach
 * tributaries at their confluences and index all segments for projection.
 *
 * Chainage x of a point = distance along its branch to the confluence + chainage of
 * the confluence on the branch it joins (recursively down to the mouth). Lengths are
 * on the WGS84 ellipsoid (local tangent plane per ≤ maxSegmentM piece).
 *
 * @param geojson LineString, MultiLineString, Feature or FeatureCollection of lines (RFC 7946), [lon, lat] in degrees
 * @param options mouth (else as the file states it: a Point with properties.role "mouth", or the main
 *   line's properties.mouth "start"/"end"), main stem, confluence tolerance [m], piece length [m]
 * @returns the network (plain data; `warnings` lists notices such as an assumed mouth)
 * @throws TypeError for malformed GeoJSON; RangeError for bad coordinates, |lat| > 85°, a longitude span > 180°,
 *   a branch not joining the network, or bad options
 * @see Butler, H. et al. (2016) IETF RFC 7946; Torge, W. & Müller, J. (2012) Geodesy, 4th ed., ch. 4.
 */
export function buildChannelNetwork(geojson: CenterlineGeoJson, options: ChannelNetworkOptions = {}): ChannelNetwork {
  const toleranceM = options.confluenceToleranceM ?? 500;
  const maxPieceM = options.maxSegmentM ?? 500;
  if (!(toleranceM >= 0)) throw new RangeError(`${FN}: options.confluenceToleranceM must be ≥ 0 m; got ${toleranceM}`);
  if (!(maxPieceM > 0)) throw new RangeError(`${FN}: options.maxSegmentM must be > 0 m; got ${maxPieceM}`);
  const warnings: GeometryWarning[] = [];
  const lines = readCenterlines(geojson);
  const lengths = lines.map((l) => polylineLengthM(l.coords, maxPieceM));
  const mi = chooseMain(lines, lengths, options.mainBranchId);
  const mainLine = lines[mi]!;
  const stated = options.mouth ?? centerlineMouthHint(geojson);
  const [atStart, mouthSource] = mouthAtStart(mainLine, stated, toleranceM, warnings);
  const coords = atStart ? mainLine.coords : [...mainLine.coords].reverse();
  const main: PlacedBranch = {
    id: mainLine.id,
    ...(mainLine.name !== undefined ? { name: mainLine.name } : {}),
    coords,
    dense: densifyPolyline(coords, maxPieceM),
    kmStart: 0,
    reversed: !atStart,
  };
  const placed = attachBranches(
    main,
    lines.filter((_, i) => i !== mi),
    maxPieceM,
    toleranceM,
    warnings,
  );

  let [minLon, maxLon, minLat, maxLat] = [Infinity, -Infinity, Infinity, -Infinity];
  for (const b of placed) {
    for (const [lon, lat] of b.coords) {
      [minLon, maxLon] = [Math.min(minLon, lon), Math.max(maxLon, lon)];
      [minLat, maxLat] = [Math.min(minLat, lat), Math.max(maxLat, lat)];
    }
  }
  if (maxLon - minLon > 180)
    throw new RangeError(
      `${FN}: the centerline spans ${(maxLon - minLon).toFixed(1)}° of longitude (more than 180°); split it into estuary-scale networks`,
    );
  const midLat = 0.5 * (minLat + maxLat) * DEG_TO_RAD;
  const lonScale = (primeVerticalRadiusM(midLat) * Math.cos(midLat)) / meridionalRadiusM(midLat);
  const segments = packSegments(placed);
  const branches = placed.map((p, i) => toBranch(p, i === 0));
  return {
    branches,
    mainBranchId: main.id,
    mouthLonLat: [coords[0]![0], coords[0]![1]],
    mouthSource,
    totalLengthKm: branches.reduce((s, b) => s + b.lengthKm, 0),
    centerLonDeg: 0.5 * (minLon + maxLon),
    segments,
    segmentIndexData: buildSegmentIndex(segments, lonScale),
    indexLonScale: lonScale,
    maxAbsLatDeg: Math.max(Math.abs(minLat), Math.abs(maxLat)),
    warnings,
  };
}
