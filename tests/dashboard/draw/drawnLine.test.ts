import { describe, expect, it } from "vitest";
import { expectWithin } from "../../helpers/tolerance.ts";
import { dedupeVertices, drawnCenterlineGeoJson, type MouthEnd } from "../../../dashboard/src/draw/drawnLine.ts";
import { previewCenterline, tickSpacingKm } from "../../../dashboard/src/worker/drawnPreview.ts";
import type { LonLat } from "../../../dashboard/src/worker/overlay.ts";

/** The worker's preview of a drawn line: the drawn GeoJSON read by the one centerline reader. */
function drawnTicks(vertices: LonLat[], mouth: MouthEnd) {
  return previewCenterline({ name: "drawn.geojson", text: JSON.stringify(drawnCenterlineGeoJson(vertices, mouth)) });
}

describe("drawn centerline", () => {
  it("drawnCenterlineGeoJson() gives an RFC 7946 FeatureCollection (IETF 2016, §3.1.4 LineString, [lon, lat]) with the mouth Point at the chosen end", () => {
    const fc = drawnCenterlineGeoJson(
      [
        [10, 50],
        [10.1, 50.05],
        [10.1, 50.05],
        [10.2, 50.1],
      ],
      "end",
    );
    expect(fc.type).toBe("FeatureCollection");
    const [line, mouth] = fc.features;
    expect(line.geometry.type).toBe("LineString");
    expect(line.geometry.coordinates).toEqual([
      [10, 50],
      [10.1, 50.05],
      [10.2, 50.1],
    ]);
    expect(line.properties.role).toBe("main");
    expect(mouth.geometry).toEqual({ type: "Point", coordinates: [10.2, 50.1] });
    expect(mouth.properties.role).toBe("mouth");
  });

  it("drawnCenterlineGeoJson() throws a RangeError naming itself for fewer than 2 distinct vertices", () => {
    expect(() =>
      drawnCenterlineGeoJson(
        [
          [1, 1],
          [1, 1],
        ],
        "start",
      ),
    ).toThrow(/drawnCenterlineGeoJson/);
  });

  it("dedupeVertices() drops the repeated point a double-click adds", () => {
    expect(
      dedupeVertices([
        [0, 0],
        [0, 0],
        [1, 1],
      ]),
    ).toEqual([
      [0, 0],
      [1, 1],
    ]);
  });

  it("previewCenterline() of a drawn line along 0.1° of the equatorial meridian measures 11.057 km (WGS84 meridian arc, 1° = 110.574 km at the equator, from memory) within 0.02 km, ticks from the mouth", () => {
    const { ticks, lengthKm } = drawnTicks(
      [
        [0, 0],
        [0, 0.1],
      ],
      "start",
    );
    expectWithin(lengthKm, 11.0574, 0.02, "length of 0.1° of meridian at the equator");
    expect(tickSpacingKm(lengthKm)).toBe(1);
    expect(ticks[0].km).toBe(0);
    expectWithin(ticks[0].lonLat[1], 0, 1e-9, "first tick at the mouth (start)");
    expect(ticks.length).toBe(12);
    const flipped = drawnTicks(
      [
        [0, 0],
        [0, 0.1],
      ],
      "end",
    );
    expectWithin(flipped.ticks[0].lonLat[1], 0.1, 1e-9, "first tick at the mouth (end)");
  });
});
