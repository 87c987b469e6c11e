/**
 * The offline basemap (GeoJSON FeatureCollection, RFC 7946): one land polygon with the
 * estuary cut out, one water polygon (open sea + funnel-shaped estuary + tributary), two marsh
 * polygons and named places (`kind: "place"`). All invented.
 *
 * The estuary's drawn width is the model width A(x)/h(x) plus a funnel flare near the mouth,
 * 2.5 km·exp(−x/4 km); the channel polygon runs 1.5 km into the sea and 3 km past the head,
 * so the water polygon contains the whole centerline. Polygon operations use @turf/turf.
 */
import { difference, featureCollection, intersect, polygon, union } from "@turf/turf";
import type { Feature, MultiPolygon, Polygon } from "geojson";
import { DEMO_CHANNEL, widthM } from "./channel.ts";
import { AXIS, NORMAL, pointAlong, type ChannelLine, type Tributary } from "./centerline.ts";
import { roundLonLat, toLonLat } from "./localFrame.ts";
import { INVENTED_DATA_NOTE, INVENTED_NAMES } from "./names.ts";

type Xy = [number, number];

/** Drawn channel width [km] at xKm from the mouth (negative x = seaward of the mouth). */
export function drawnWidthKm(xKm: number): number {
  if (xKm < 0) return drawnWidthKm(0) + 0.5 * -xKm;
  return widthM(DEMO_CHANNEL, xKm) / 1000 + 2.5 * Math.exp(-xKm / 4);
}

function toRing(local: Xy[]): [number, number][] {
  const ring = local.map((p) => roundLonLat(toLonLat(p[0], p[1]), 5));
  ring.push(ring[0]);
  return ring;
}

/** A band polygon around a polyline with half-width w(i)/2 at vertex i. */
function band(points: Xy[], widthKm: (i: number) => number): Feature<Polygon> {
  const left: Xy[] = [];
  const right: Xy[] = [];
  for (let i = 0; i < points.length; i++) {
    const a = points[Math.max(0, i - 1)];
    const b = points[Math.min(points.length - 1, i + 1)];
    const len = Math.hypot(b[0] - a[0], b[1] - a[1]);
    const n: Xy = [(b[1] - a[1]) / len, -(b[0] - a[0]) / len];
    const h = widthKm(i) / 2;
    left.push([points[i][0] + n[0] * h, points[i][1] + n[1] * h]);
    right.push([points[i][0] - n[0] * h, points[i][1] - n[1] * h]);
  }
  return polygon([toRing([...left, ...right.reverse()])]);
}

function along(axis: Xy, normal: Xy, a: number, s: number): Xy {
  return [a * axis[0] + s * normal[0], a * axis[1] + s * normal[1]];
}

/** Seaward displacement [km] of the invented coastline at s km along it from the mouth. */
function coastOffsetKm(s: number): number {
  const taper = Math.min(1, Math.abs(s) / 4);
  return taper * (0.5 * Math.sin(s / 3.1) + 0.25 * Math.sin(s / 1.3 + 1)) + 2.2 * Math.exp(-(((s - 7.5) / 1.6) ** 2));
}

function ellipse(center: Xy, tangent: Xy, semiAlongKm: number, semiAcrossKm: number): Feature<Polygon> {
  const n: Xy = [tangent[1], -tangent[0]];
  const pts: Xy[] = [];
  for (let k = 0; k < 36; k++) {
    const t = (2 * Math.PI * k) / 36;
    const a = semiAlongKm * Math.cos(t);
    const b = semiAcrossKm * Math.sin(t);
    pts.push([center[0] + a * tangent[0] + b * n[0], center[1] + a * tangent[1] + b * n[1]]);
  }
  return polygon([toRing(pts)]);
}

function sideOf(main: ChannelLine, xKm: number, sideKm: number): { local: Xy; tangent: Xy } {
  const { local, tangent } = pointAlong(main, xKm);
  const n: Xy = [tangent[1], -tangent[0]];
  return { local: [local[0] + n[0] * sideKm, local[1] + n[1] * sideKm], tangent };
}

function place(name: string, placeKind: string, p: Xy): object {
  return {
    type: "Feature",
    properties: { kind: "place", placeKind, name, note: INVENTED_DATA_NOTE },
    geometry: { type: "Point", coordinates: roundLonLat(toLonLat(p[0], p[1]), 5) },
  };
}

/** Builds the basemap FeatureCollection. */
export function basemapGeojson(main: ChannelLine, tributary: Tributary): object {
  const lengthKm = main.cumKm[main.cumKm.length - 1];
  // main channel band: 1.5 km seaward extension + centerline + 3 km beyond the head
  const mainPts: Xy[] = [];
  const mainX: number[] = [];
  for (const d of [1.5, 1.0, 0.5]) {
    mainPts.push(along(AXIS, NORMAL, -d, 0));
    mainX.push(-d);
  }
  main.localKm.forEach((p, i) => {
    mainPts.push(p);
    mainX.push(main.cumKm[i]);
  });
  const last = pointAlong(main, lengthKm);
  for (const d of [1, 2, 3]) {
    mainPts.push([last.local[0] + d * last.tangent[0], last.local[1] + d * last.tangent[1]]);
    mainX.push(lengthKm + d);
  }
  const mainBand = band(mainPts, (i) => drawnWidthKm(mainX[i]));
  // tributary band, from 0.4 km inside the main channel to 0.4 km past its upstream end
  const tp = tributary.line.localKm;
  const t0: Xy = [tp[0][0] - (0.4 * (tp[1][0] - tp[0][0])) / 0.2, tp[0][1] - (0.4 * (tp[1][1] - tp[0][1])) / 0.2];
  const tn = tp.length - 1;
  const tEnd: Xy = [tp[tn][0] + (tp[tn][0] - tp[tn - 1][0]) * 2, tp[tn][1] + (tp[tn][1] - tp[tn - 1][1]) * 2];
  const tribPts: Xy[] = [t0, ...tp, tEnd];
  const tribBand = band(tribPts, (i) => 0.09 - (0.04 * i) / tribPts.length);
  // coastline, land box and sea box
  const coast: Xy[] = [];
  for (let s = -45; s <= 45.001; s += 0.5) coast.push(along(AXIS, NORMAL, -coastOffsetKm(s), s));
  const landBox = polygon([toRing([...coast, along(AXIS, NORMAL, 75, 45), along(AXIS, NORMAL, 75, -45)])]);
  const seaBox = polygon([toRing([...coast, along(AXIS, NORMAL, -30, 45), along(AXIS, NORMAL, -30, -45)])]);
  const channels = union(featureCollection([mainBand, tribBand]));
  if (!channels) throw new Error("basemapGeojson(): channel union failed");
  const land = difference(featureCollection([landBox, channels]));
  const water = union(featureCollection([seaBox, mainBand, tribBand]));
  if (!land || !water) throw new Error("basemapGeojson(): land/water polygon operation failed");
  const marshes: Feature<Polygon | MultiPolygon>[] = [];
  const marshSpecs: Array<[string, number, number]> = [
    [INVENTED_NAMES.marshLower, 11, 1],
    [INVENTED_NAMES.marshUpper, 27, -1],
  ];
  for (const [name, xKm, side] of marshSpecs) {
    const off = side * (drawnWidthKm(xKm) / 2 + 0.75);
    const { local, tangent } = sideOf(main, xKm, off);
    const m = intersect(featureCollection([ellipse(local, tangent, 1.3, 0.6), land]));
    if (m) marshes.push({ ...m, properties: { kind: "marsh", name, note: INVENTED_DATA_NOTE } });
  }
  const town = sideOf(main, 24, -(drawnWidthKm(24) / 2 + 0.8)).local;
  const quay = sideOf(main, lengthKm - 0.3, drawnWidthKm(lengthKm) / 2 + 0.3).local;
  const headland = along(AXIS, NORMAL, -coastOffsetKm(7.5) + 0.3, 7.5);
  return {
    type: "FeatureCollection",
    disclaimer: INVENTED_DATA_NOTE,
    features: [
      { ...land, properties: { kind: "land", name: "Invented coast", note: INVENTED_DATA_NOTE } },
      { ...water, properties: { kind: "water", name: INVENTED_NAMES.estuary, note: INVENTED_DATA_NOTE } },
      ...marshes,
      place(INVENTED_NAMES.town, "town", town),
      place(INVENTED_NAMES.quay, "quay", quay),
      place(INVENTED_NAMES.headland, "headland", headland),
    ],
  };
}
