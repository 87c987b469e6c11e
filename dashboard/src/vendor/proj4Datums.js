// proj4's datum table (proj4 2.22.0 lib/constants/Datum.js, MIT) cut to the datums the proj strings
// of analysis/io/projection.ts name with +datum= (WGS84, NAD83); the other grids there give their
// ellipsoid and +towgs84 parameters directly. Swapped in by dashboard/proj4Trim.ts; entries copied
// as published. A +datum= code not listed here falls back to proj4's "no datum shift" path, which
// no definition we ship takes.
var datums = {
  wgs84: {
    towgs84: "0,0,0",
    ellipse: "WGS84",
    datumName: "WGS84",
  },
  nad83: {
    towgs84: "0,0,0",
    ellipse: "GRS80",
    datumName: "North_American_Datum_1983",
  },
};

for (var key in datums) {
  var datum = datums[key];
  if (!datum.datumName) {
    continue;
  }
  datums[datum.datumName] = datum;
}

export default datums;
