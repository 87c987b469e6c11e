import geodesic from "geographiclib-geodesic";
import proj4 from "proj4";
import { describe, expect, it } from "vitest";
import { EPSG_DEFINITIONS, projDefinition, projectedToLonLat } from "../../analysis/io/projection.ts";
import { expectWithin } from "../helpers/tolerance.ts";

const geod = geodesic.Geodesic.WGS84;
/** Meridian arc from the equator to latitude φ on WGS84 [m], from geographiclib (Karney 2013). */
const meridianArcM = (latDeg: number): number => geod.Inverse(0, 0, latDeg, 0).s12!;

describe("projectedToLonLat (proj4 with built-in EPSG definitions)", () => {
  it("projectedToLonLat() EPSG:32633 on the central meridian: northing = 0.9996 × meridian arc (UTM definition; arc from geographiclib, Karney 2013) within 1e-6°", () => {
    const ll = projectedToLonLat(500000, 0.9996 * meridianArcM(45), 32633);
    expectWithin(ll?.[0], 15, 1e-6, "lon on zone 33 central meridian");
    expectWithin(ll?.[1], 45, 1e-6, "lat 45");
  });

  it("projectedToLonLat() EPSG:32733 (south, false northing 10 000 000 m; UTM definition) within 1e-6°", () => {
    const ll = projectedToLonLat(500000, 10_000_000 - 0.9996 * meridianArcM(30), 32733);
    expectWithin(ll?.[0], 15, 1e-6, "lon");
    expectWithin(ll?.[1], -30, 1e-6, "lat -30");
  });

  it("projectedToLonLat() EPSG:25832 false origin (500 000, 0) is 9°E on the equator (ETRS89 UTM 32N definition)", () => {
    const ll = projectedToLonLat(500000, 0, 25832);
    expectWithin(ll?.[0], 9, 1e-9, "lon");
    expectWithin(ll?.[1], 0, 1e-9, "lat");
  });

  it("projectedToLonLat() EPSG:2154 Lambert-93 false origin (700 000, 6 600 000) is 3°E 46.5°N (EPSG:2154 parameters, from memory)", () => {
    const ll = projectedToLonLat(700000, 6600000, 2154);
    expectWithin(ll?.[0], 3, 1e-9, "lon");
    expectWithin(ll?.[1], 46.5, 1e-9, "lat");
  });

  it("EPSG:27700 projection parameters reproduce the Ordnance Survey worked example E 651409.903, N 313177.270 ↔ 52°39′27.2531″N 1°43′4.5177″E on Airy 1830 (OS 'A guide to coordinate systems in Great Britain', from memory) within 1e-7°", () => {
    const noShift = EPSG_DEFINITIONS[27700].replace(/\+towgs84=\S+ /, "");
    const [lon, lat] = proj4(noShift, "+proj=longlat +ellps=airy +no_defs", [651409.903, 313177.27]);
    expectWithin(lon, 1 + 43 / 60 + 4.5177 / 3600, 1e-7, "OSGB36 longitude");
    expectWithin(lat, 52 + 39 / 60 + 27.2531 / 3600, 1e-7, "OSGB36 latitude");
  });

  it("projectedToLonLat() EPSG:27700 with the Helmert shift lands within 0.003° of the OSGB36 position (datum shift ≈ 100 m; common practice)", () => {
    const ll = projectedToLonLat(651409.903, 313177.27, 27700);
    expectWithin(ll?.[0], 1 + 43 / 60 + 4.5177 / 3600, 3e-3, "WGS84 longitude near OSGB36");
    expectWithin(ll?.[1], 52 + 39 / 60 + 27.2531 / 3600, 3e-3, "WGS84 latitude near OSGB36");
  });

  it("projDefinition() computes generic UTM zones and rejects unknown codes; projectedToLonLat() throws RangeError for non-finite input", () => {
    expect(projDefinition(32601)).toContain("+zone=1 ");
    expect(projDefinition(32760)).toContain("+zone=60 +south");
    expect(projDefinition(32661)).toBeUndefined();
    expect(projDefinition(12345)).toBeUndefined();
    expect(projectedToLonLat(1, 2, 12345)).toBeUndefined();
    expect(() => projectedToLonLat(Number.NaN, 0, 32633)).toThrow(RangeError);
  });
});
