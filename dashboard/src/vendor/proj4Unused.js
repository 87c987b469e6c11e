// Stand-ins for two proj4 dependencies the dashboard never calls: it passes proj strings only
// (no WKT, analysis/io/projection.ts) and no MGRS grid references. Swapped in by vite.config.ts
// (imported as "wkt-parser" → the default export, "mgrs" → `mgrs`).
function unavailable(what) {
  return () => {
    throw new Error(`${what} is not part of the dashboard build; give a proj string or an EPSG code it lists.`);
  };
}
export default unavailable("WKT coordinate system text");
export const mgrs = {
  forward: unavailable("MGRS"),
  inverse: unavailable("MGRS"),
  toPoint: unavailable("MGRS"),
};
