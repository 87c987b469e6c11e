import { vendorSwap } from "./vendorSwap.ts";

/**
 * Vite plugin: proj4 with only what the dashboard calls (analysis/io/projection.ts: proj strings of
 * the listed EPSG codes). proj4's list of 33 projections is swapped for ours
 * (src/vendor/proj4Projections.js), its datum table for the two datums our strings name
 * (src/vendor/proj4Datums.js), WKT parsing and MGRS for stand-ins that throw. The command line
 * uses proj4 as published; tests/dashboard/proj4Trim.test.ts checks both give the same coordinates.
 */
export const proj4Trim = vendorSwap("brackline-proj4-trim", [
  {
    importer: "/node_modules/proj4/",
    swaps: {
      "../projs": "proj4Projections.js",
      "../projs.js": "proj4Projections.js",
      "./constants/Datum": "proj4Datums.js",
      "./constants/Datum.js": "proj4Datums.js",
      "wkt-parser": "proj4Unused.js",
      mgrs: "proj4Mgrs.js",
    },
  },
]);
