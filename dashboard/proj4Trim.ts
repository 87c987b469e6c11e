import { join } from "node:path";
import { fileURLToPath } from "node:url";
import type { Plugin } from "vite";

const vendor = fileURLToPath(new URL("./src/vendor/", import.meta.url));

/**
 * Vite plugin: proj4 with only what the dashboard calls (analysis/io/projection.ts: proj strings of
 * the listed EPSG codes). proj4's list of 33 projections is swapped for ours
 * (src/vendor/proj4Projections.js), its datum table for the two datums our strings name
 * (src/vendor/proj4Datums.js), WKT parsing and MGRS for stand-ins that throw. The command line
 * uses proj4 as published; tests/dashboard/proj4Trim.test.ts checks both give the same coordinates.
 */
export const proj4Trim: Plugin = {
  name: "brackline-proj4-trim",
  enforce: "pre",
  resolveId(source, importer) {
    if (!importer?.includes("/node_modules/proj4/")) return null;
    if (source === "../projs" || source === "../projs.js") return join(vendor, "proj4Projections.js");
    if (source === "./constants/Datum" || source === "./constants/Datum.js") return join(vendor, "proj4Datums.js");
    if (source === "wkt-parser") return join(vendor, "proj4Unused.js");
    if (source === "mgrs") return join(vendor, "proj4Mgrs.js");
    return null;
  },
};
