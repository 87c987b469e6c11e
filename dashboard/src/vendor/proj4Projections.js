// The projections the dashboard's proj4 registers: those of analysis/io/projection.ts
// (EPSG_DEFINITIONS and the computed UTM zones: tmerc, utm with its etmerc, lcc, laea, sterea, aea;
// merc and longlat are proj4's built-ins). Replaces proj4's own list of 33 projections in the
// dashboard build (vite.config.ts); the command line uses proj4 as published.
import tmerc from "proj4/lib/projections/tmerc";
import etmerc from "proj4/lib/projections/etmerc";
import utm from "proj4/lib/projections/utm";
import sterea from "proj4/lib/projections/sterea";
import lcc from "proj4/lib/projections/lcc";
import laea from "proj4/lib/projections/laea";
import aea from "proj4/lib/projections/aea";

export default function includeProjections(proj4) {
  for (const p of [tmerc, etmerc, utm, sterea, lcc, laea, aea]) proj4.Proj.projections.add(p);
}
