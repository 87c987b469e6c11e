/**
 * Minimal GeoJSON (RFC 7946) types for centerlines, and reading them into named lines.
 *
 * @see Butler, H. et al. (2016) The GeoJSON Format, IETF RFC 7946, §3.1.4–3.1.5, §3.2–3.3.
 */
import { checkLonLat, unwrapLine, wrapNear } from "./lonLat.ts";

export type Position = [number, number] | number[];
export interface LineStringGeometry {
  type: "LineString";
  coordinates: Position[];
}
export interface MultiLineStringGeometry {
  type: "MultiLineString";
  coordinates: Position[][];
}
/** Point markers (mouth, head) may sit beside the lines; they are not channel lines. */
export interface PointGeometry {
  type: "Point" | "MultiPoint";
  coordinates: Position | Position[];
}
export interface LineFeature {
  type: "Feature";
  id?: string | number;
  geometry: LineStringGeometry | MultiLineStringGeometry | PointGeometry | null;
  properties: Record<string, unknown> | null;
}
export interface LineFeatureCollection {
  type: "FeatureCollection";
  features: LineFeature[];
}
/** Any centerline input: a LineString, MultiLineString, Feature of one, or FeatureCollection of lines. */
export type CenterlineGeoJson = LineStringGeometry | MultiLineStringGeometry | LineFeature | LineFeatureCollection;

/** One polyline read from the input, before orientation. */
export interface RawLine {
  id: string;
  name?: string;
  isMain: boolean;
  coords: [number, number][];
}

const FN = "buildChannelNetwork";

function toLine(what: string, pts: Position[]): [number, number][] {
  if (!Array.isArray(pts)) throw new TypeError(`${FN}: ${what} must be an array of positions; got ${typeof pts}`);
  const out: [number, number][] = [];
  pts.forEach((p, i) => {
    const lon = Number(p[0]);
    const lat = Number(p[1]);
    checkLonLat(FN, `${what} position ${i}`, lon, lat);
    const prev = out[out.length - 1];
    if (prev === undefined || prev[0] !== lon || prev[1] !== lat) out.push([lon, lat]); // drop repeated vertices
  });
  return unwrapLine(out);
}

/** Join parts whose end meets the next part's start modulo 360° (an antimeridian split, RFC 7946 §3.1.9). */
function joinParts(parts: [number, number][][]): [number, number][][] {
  const out: [number, number][][] = [];
  for (const part of parts) {
    const last = out[out.length - 1];
    const end = last?.[last.length - 1];
    const start = part[0];
    if (
      last &&
      end &&
      start &&
      Math.abs(end[1] - start[1]) < 1e-9 &&
      Math.abs(wrapNear(start[0], end[0]) - end[0]) < 1e-9
    ) {
      const shift = wrapNear(start[0], end[0]) - start[0];
      for (const [lon, lat] of part.slice(1)) last.push([lon + shift, lat]);
    } else out.push(part.map(([lon, lat]) => [lon, lat]));
  }
  return out;
}

function readGeometry(g: LineStringGeometry | MultiLineStringGeometry, what: string): [number, number][][] {
  if (g.type === "LineString") return [toLine(what, g.coordinates)];
  if (g.type === "MultiLineString") return joinParts(g.coordinates.map((c, k) => toLine(`${what} part ${k}`, c)));
  throw new TypeError(
    `${FN}: ${what} must be a LineString or MultiLineString; got type ${String((g as { type: unknown }).type)}`,
  );
}

/**
 * Read every polyline of a centerline GeoJSON, naming each one. Point and MultiPoint features
 * in a FeatureCollection (mouth or head markers) are skipped here and read by {@link centerlineMouthHint}.
 *
 * @throws TypeError for a non-line geometry or malformed input; RangeError for bad coordinates
 */
export function readCenterlines(input: CenterlineGeoJson): RawLine[] {
  if (input === null || typeof input !== "object")
    throw new TypeError(`${FN}: geojson must be an object; got ${String(input)}`);
  const features: LineFeature[] =
    input.type === "FeatureCollection"
      ? input.features
      : input.type === "Feature"
        ? [input]
        : [{ type: "Feature", geometry: input, properties: null }];
  if (!Array.isArray(features)) throw new TypeError(`${FN}: FeatureCollection.features must be an array`);
  const lines: RawLine[] = [];
  features.forEach((f, i) => {
    if (!f.geometry) throw new TypeError(`${FN}: feature ${i} has no geometry`);
    const marker = f.geometry.type === "Point" || f.geometry.type === "MultiPoint";
    if (marker && input.type === "FeatureCollection") return; // mouth/head markers, see mouthHint.ts
    const props = f.properties ?? {};
    const name = typeof props["name"] === "string" ? props["name"] : undefined;
    const idProp = props["id"] ?? name ?? f.id;
    const baseId = idProp === undefined || idProp === null ? `branch-${i}` : String(idProp);
    const parts = readGeometry(
      f.geometry as LineStringGeometry | MultiLineStringGeometry,
      `feature ${i} ('${baseId}')`,
    );
    parts.forEach((coords, k) => {
      if (coords.length < 2)
        throw new RangeError(
          `${FN}: feature ${i} ('${baseId}') part ${k} needs at least 2 distinct positions; got ${coords.length}`,
        );
      const id = parts.length > 1 ? `${baseId}#${k}` : baseId;
      lines.push({ id, ...(name !== undefined ? { name } : {}), isMain: props["role"] === "main", coords });
    });
  });
  if (lines.length === 0) throw new RangeError(`${FN}: geojson contains no lines`);
  const seen = new Set<string>();
  for (const l of lines) {
    if (seen.has(l.id))
      throw new RangeError(`${FN}: branch id '${l.id}' occurs more than once; give each line a unique properties.id`);
    seen.add(l.id);
  }
  return lines;
}
