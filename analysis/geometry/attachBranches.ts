/**
 * Attach tributary lines to the network: each line joins the already placed branch
 * nearest to one of its ends; that end is its confluence (downstream end), and its
 * chainage starts at the confluence's chainage on the branch it joins.
 */
import type { GeometryWarning } from "./types.ts";
import type { RawLine } from "./geojsonInput.ts";
import { densifyPolyline, type DensePolyline } from "./polyline.ts";
import { NearestSegmentTracker } from "./segmentKernel.ts";
import { wrapNear } from "./lonLat.ts";

/** A branch oriented from its downstream end upstream, with chainage. */
export interface PlacedBranch {
  id: string;
  name?: string;
  parentId?: string;
  coords: [number, number][];
  dense: DensePolyline;
  /** Chainage of the downstream end [km from the mouth]. */
  kmStart: number;
  reversed: boolean;
}

interface JoinCandidate {
  line: RawLine;
  atStart: boolean;
  distM: number;
  km: number;
  parentId: string;
  otherEndDistM: number;
}

function nearestJoin(placed: PlacedBranch[], line: RawLine): JoinCandidate {
  const lon0: number[] = [],
    lat0: number[] = [],
    lon1: number[] = [],
    lat1: number[] = [],
    km0: number[] = [],
    km1: number[] = [],
    owner: number[] = [];
  placed.forEach((b, bi) => {
    const d = b.dense;
    for (let j = 0; j + 1 < d.lon.length; j++) {
      lon0.push(d.lon[j]!);
      lat0.push(d.lat[j]!);
      lon1.push(d.lon[j + 1]!);
      lat1.push(d.lat[j + 1]!);
      km0.push(b.kmStart + d.cumM[j]! / 1000);
      km1.push(b.kmStart + d.cumM[j + 1]! / 1000);
      owner.push(bi);
    }
  });
  const tracker = new NearestSegmentTracker({
    lon0: Float64Array.from(lon0),
    lat0: Float64Array.from(lat0),
    lon1: Float64Array.from(lon1),
    lat1: Float64Array.from(lat1),
  });
  const ends = [line.coords[0]!, line.coords[line.coords.length - 1]!];
  const res = ends.map(([lon, lat]) => {
    tracker.reset(lon, lat);
    for (let i = 0; i < lon0.length; i++) tracker.test(i);
    const i = tracker.bestSeg;
    return {
      distM: Math.sqrt(tracker.bestD2),
      km: km0[i]! + tracker.bestT * (km1[i]! - km0[i]!),
      parentId: placed[owner[i]!]!.id,
    };
  });
  const [s, e] = res as [(typeof res)[0], (typeof res)[0]];
  const atStart = s.distM <= e.distM;
  const best = atStart ? s : e;
  return {
    line,
    atStart,
    distM: best.distM,
    km: best.km,
    parentId: best.parentId,
    otherEndDistM: atStart ? e.distM : s.distM,
  };
}

/**
 * Place every remaining line, nearest join first.
 *
 * @param main the placed main stem
 * @param others the other lines (any orientation)
 * @param maxPieceM densification piece length [m]
 * @param toleranceM largest gap between a line's end and the branch it joins [m]
 * @throws RangeError naming a line that joins nothing within toleranceM
 */
export function attachBranches(
  main: PlacedBranch,
  others: RawLine[],
  maxPieceM: number,
  toleranceM: number,
  warnings: GeometryWarning[],
): PlacedBranch[] {
  const placed = [main];
  const refLon = main.coords[0]![0];
  let remaining = others.map((l) => {
    const shift = wrapNear(l.coords[0]![0], refLon) - l.coords[0]![0];
    return { ...l, coords: l.coords.map(([lon, lat]): [number, number] => [lon + shift, lat]) };
  });
  while (remaining.length > 0) {
    const cands = remaining.map((l) => nearestJoin(placed, l)).sort((a, b) => a.distM - b.distM);
    const c = cands[0]!;
    if (c.distM > toleranceM) {
      const list = cands.map((k) => `'${k.line.id}' (${k.distM.toFixed(0)} m)`).join(", ");
      throw new RangeError(
        `buildChannelNetwork: branch ${list} does not join the network: its nearest end is farther than confluenceToleranceM = ${toleranceM} m from any other branch`,
      );
    }
    if (c.otherEndDistM <= toleranceM) {
      warnings.push({
        code: "branchLoop",
        message: `Branch '${c.line.id}' touches the network at both ends (a loop or side channel); chainage runs from its nearer end at ${c.km.toFixed(3)} km.`,
      });
    }
    const coords = c.atStart ? c.line.coords : [...c.line.coords].reverse();
    placed.push({
      id: c.line.id,
      ...(c.line.name !== undefined ? { name: c.line.name } : {}),
      parentId: c.parentId,
      coords,
      dense: densifyPolyline(coords, maxPieceM),
      kmStart: c.km,
      reversed: !c.atStart,
    });
    remaining = remaining.filter((l) => l !== c.line);
  }
  return placed;
}
