import { describe, expect, it } from "vitest";
import { readGeoJsonPoints } from "../../analysis/io/geojsonPoints.ts";
import { expectWithin } from "../helpers/tolerance.ts";

const fc = {
  type: "FeatureCollection",
  features: [
    {
      type: "Feature",
      geometry: { type: "Point", coordinates: [-1.5, 45.1] },
      properties: { station: "A", salinity: 5.5, "Fe (nmol/L)": "<0.5", date_time: "2024-05-01T10:00:00Z" },
    },
    {
      type: "Feature",
      geometry: { type: "Point", coordinates: [-1.4, 45.2, -3] },
      properties: { station: "B", salinity: 20, "Fe (nmol/L)": 12, date_time: "2024-05-01T11:00:00Z" },
    },
    {
      type: "Feature",
      geometry: {
        type: "LineString",
        coordinates: [
          [0, 0],
          [1, 1],
        ],
      },
      properties: { station: "C", salinity: null, "Fe (nmol/L)": 3 },
    },
    {
      type: "Feature",
      geometry: null,
      properties: {
        station: "<script>alert(1)</script>",
        salinity: "NA",
        "Fe (nmol/L)": 4,
        date_time: "2024-05-01T12:00:00Z",
      },
    },
  ],
};

describe("readGeoJsonPoints (RFC 7946 point features as survey rows)", () => {
  it("readGeoJsonPoints() maps properties to columns and Point geometry to [lon, lat] (RFC 7946 §3.1.1 position order)", () => {
    const r = readGeoJsonPoints(JSON.stringify(fc), { fileName: "pts.geojson" });
    const st = r.surveys.flatMap((s) => s.stations);
    expect(r.summary).toMatchObject({ rowsRead: 4, rowsAccepted: 4, rowsRejected: 0 });
    const a = st.find((s) => s.id === "A");
    expectWithin(a?.lonLat?.[0], -1.5, 0, "lon from coordinates[0]");
    expectWithin(a?.lonLat?.[1], 45.1, 0, "lat from coordinates[1]");
    expect(a?.values.Fe.status).toBe("belowDetection");
    expect(st.find((s) => s.id === "C")?.lonLat).toBeUndefined();
    expect(r.issues).toContainEqual(
      expect.objectContaining({ file: "pts.geojson", row: 4, column: "geometry", value: "LineString" }),
    );
    expect(st.find((s) => s.id.startsWith("<script>"))?.salinity.status).toBe("missing");
  });

  it("readGeoJsonPoints() reports invalid JSON and non-collections as file-level errors without throwing", () => {
    const bad = readGeoJsonPoints("{not json", { fileName: "bad.geojson" });
    expect(bad.issues[0]).toMatchObject({ file: "bad.geojson", row: 0, severity: "error" });
    const arr = readGeoJsonPoints([1, 2, 3], { fileName: "arr.geojson" });
    expect(arr.issues.some((i) => i.severity === "error" && i.expected.includes("FeatureCollection"))).toBe(true);
    expect(arr.summary.rowsRead).toBe(0);
  });
});
