import { readFileSync } from "node:fs";
import type { Rnd } from "./random.ts";
import { HOSTILE_TEXT, int, pick } from "./random.ts";

/** The invented demo centerline (data-demo/). */
export const DEMO_CENTERLINE = JSON.parse(
  readFileSync(new URL("../../../data-demo/centerline.geojson", import.meta.url), "utf8"),
) as {
  type: "FeatureCollection";
  features: Array<{ type: "Feature"; geometry: { type: string; coordinates: unknown }; properties: unknown }>;
};

/** The demo's main line as [lon, lat] vertices. */
export function demoLine(): [number, number][] {
  const f = DEMO_CENTERLINE.features.find((x) => x.geometry.type === "LineString");
  return (f?.geometry.coordinates ?? []) as [number, number][];
}

const swap = (c: unknown): unknown =>
  Array.isArray(c) && typeof c[0] === "number" ? [c[1], c[0], ...c.slice(2)] : Array.isArray(c) ? c.map(swap) : c;

/** The demo centerline with every position written [lat, lon]. */
export function swappedCenterline(): unknown {
  const g = structuredClone(DEMO_CENTERLINE);
  for (const f of g.features) f.geometry.coordinates = swap(f.geometry.coordinates);
  return g;
}

const feature = (geometry: unknown, properties: unknown = {}): unknown => ({ type: "Feature", geometry, properties });

/**
 * One seeded malformed centerline of the kinds the campaign tried (45 shapes): empty or one-point
 * lines, non-numbers, out-of-range or swapped coordinates, repeated vertices, zero-length lines,
 * wrong geometry types, hostile properties, and valid lines as a control.
 */
export function malformedCenterline(r: Rnd, kind?: "good" | "swapped"): unknown {
  const line = demoLine();
  if (kind === "good") return DEMO_CENTERLINE;
  if (kind === "swapped") return swappedCenterline();
  const variants: Array<() => unknown> = [
    () => DEMO_CENTERLINE,
    () => swappedCenterline(),
    () => feature({ type: "LineString", coordinates: [] }),
    () => feature({ type: "LineString", coordinates: [line[0]] }),
    () => feature({ type: "LineString", coordinates: [line[0], line[0], line[0]] }),
    () => feature({ type: "LineString", coordinates: line.map(([x, y]) => [String(x), y]) }),
    () => feature({ type: "LineString", coordinates: line.map(([x, y], i) => (i === 3 ? [NaN, y] : [x, y])) }),
    () => feature({ type: "LineString", coordinates: line.map(([x, y]) => [x * 100, y * 100]) }),
    () => feature({ type: "LineString", coordinates: line.map(([x, y]) => [x, y, 0, 1, 2]) }),
    () => feature({ type: "LineString", coordinates: [...line, ...[...line].reverse()] }),
    () => feature({ type: "MultiLineString", coordinates: [[], line, [line[0]]] }),
    () => feature({ type: "Polygon", coordinates: [line] }),
    () => feature({ type: "Point", coordinates: line[0] }),
    () => feature(null),
    () =>
      feature({ type: "LineString", coordinates: line }, { name: pick(r, HOSTILE_TEXT), mouth: pick(r, HOSTILE_TEXT) }),
    () => ({ type: "FeatureCollection", features: [] }),
    () => ({ type: "FeatureCollection", features: [null, 3, "x"] }),
    () => ({ type: "FeatureCollection" }),
    () => [line],
    () => "LINESTRING(0 0, 1 1)",
    () => feature({ type: "LineString", coordinates: line.map(([x, y]) => [x + 360, y]) }),
    () => feature({ type: "LineString", coordinates: line.map(([x, y]) => [x, y + int(r, 2) * 1e-12]) }),
  ];
  return pick(r, variants)();
}
