// Stand-in for @maplibre/mlt (the MapLibre Tiles vector-tile format decoder) in the dashboard's MapLibre,
// swapped in by dashboard/maplibreFromSource.ts. MapLibre decodes MLT only for a vector tile source
// whose `encoding` is "mlt"; the dashboard's map has GeoJSON and raster sources only (src/map/style.ts),
// so no tile reaches the decoder. GEOMETRY_TYPE keeps the values of @maplibre/mlt 1.3.0
// (dist/vector/geometry/geometryType.js), which MapLibre's vector_tile_mlt.ts switches on.
export const GEOMETRY_TYPE = Object.freeze({
  POINT: 0,
  LINESTRING: 1,
  POLYGON: 2,
  MULTIPOINT: 3,
  MULTILINESTRING: 4,
  MULTIPOLYGON: 5,
  0: "POINT",
  1: "LINESTRING",
  2: "POLYGON",
  3: "MULTIPOINT",
  4: "MULTILINESTRING",
  5: "MULTIPOLYGON",
});

export function decodeTile() {
  throw new Error(
    "MapLibre Tiles (MLT) vector tiles are not part of the dashboard build (GeoJSON and raster sources only).",
  );
}
