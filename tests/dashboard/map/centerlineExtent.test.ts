// centerlineExtent (dashboard/src/map/centerlineExtent.ts): the extent of a centerline file's lines, where the map
// opens before the worker has read the data (common practice: a GeoJSON bounding box, RFC 7946 [lon, lat]).
import { describe, expect, it } from "vitest";
import { readFileSync } from "node:fs";
import { centerlineExtent, EXTENT_MAX_CHARS } from "../../../dashboard/src/map/centerlineExtent.ts";

const file = (doc: unknown) => ({ name: "centerline.geojson", text: JSON.stringify(doc) });
const line = (coordinates: unknown) => ({
  type: "Feature",
  properties: {},
  geometry: { type: "LineString", coordinates },
});

describe("centerlineExtent (where the map opens before the worker has read the data)", () => {
  it("spans every line of a FeatureCollection and leaves points out", () => {
    const doc = {
      type: "FeatureCollection",
      features: [
        line([
          [-1, 50],
          [-0.5, 50.2],
        ]),
        {
          type: "Feature",
          properties: {},
          geometry: {
            type: "MultiLineString",
            coordinates: [
              [
                [-0.6, 50.1],
                [-0.2, 50.4],
              ],
            ],
          },
        },
        { type: "Feature", properties: { role: "mouth" }, geometry: { type: "Point", coordinates: [5, 60] } },
      ],
    };
    expect(centerlineExtent(file(doc))).toEqual([
      [-1, 50],
      [-0.2, 50.4],
    ]);
  });

  it("takes a bare geometry or a single feature", () => {
    const geometry = {
      type: "LineString",
      coordinates: [
        [2, 3],
        [4, 5],
      ],
    };
    expect(centerlineExtent(file(geometry))).toEqual([
      [2, 3],
      [4, 5],
    ]);
    expect(centerlineExtent(file({ type: "Feature", properties: {}, geometry }))).toEqual([
      [2, 3],
      [4, 5],
    ]);
  });

  it("is undefined without a usable line: no file, not JSON, no lines, one point, coordinates off the globe", () => {
    expect(centerlineExtent(undefined)).toBeUndefined();
    expect(centerlineExtent({ name: "c.geojson", text: "not json" })).toBeUndefined();
    expect(centerlineExtent(file({ type: "FeatureCollection", features: [] }))).toBeUndefined();
    expect(centerlineExtent(file(line([[1, 1]])))).toBeUndefined();
    expect(
      centerlineExtent(
        file(
          line([
            [500, 1],
            [600, 2],
          ]),
        ),
      ),
    ).toBeUndefined();
    expect(
      centerlineExtent(
        file(
          line([
            ["a", 1],
            [null, 2],
          ]),
        ),
      ),
    ).toBeUndefined();
  });

  it("leaves files larger than EXTENT_MAX_CHARS to the worker", () => {
    const text =
      JSON.stringify(
        line([
          [0, 0],
          [1, 1],
        ]),
      ) + " ".repeat(EXTENT_MAX_CHARS);
    expect(centerlineExtent({ name: "big.geojson", text })).toBeUndefined();
  });

  it("spans the demo centerline's lines (invented demo data)", () => {
    const text = readFileSync(new URL("../../../data-demo/centerline.geojson", import.meta.url), "utf8");
    const [[w, s], [e, n]] = centerlineExtent({ name: "centerline.geojson", text })!;
    expect(w).toBeLessThan(e);
    expect(s).toBeLessThan(n);
  });
});
