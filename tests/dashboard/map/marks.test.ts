import { describe, expect, it } from "vitest";
import { MARK_LAYERS, MARK_SOURCE, markFeatures, markLayers } from "../../../dashboard/src/map/marks.ts";
import { labelLayers } from "../../../dashboard/src/map/labels.ts";
import { buildStyle } from "../../../dashboard/src/map/style.ts";
import type { MapData } from "../../../dashboard/src/map/mapData.ts";

const data: MapData = {
  basemap: undefined,
  channel: {
    paths: [
      {
        branchId: "main",
        path: [
          [0, 0],
          [0, 0.1],
          [0.02, 0.2],
        ],
      },
      { branchId: "stub", path: [[1, 1]] },
    ],
    ticks: [
      { km: 0, lonLat: [0, 0], major: true, label: "0 km", branchId: "main", bearingDeg: 0 },
      { km: 1, lonLat: [0, 0.01], major: false, label: "1 km", branchId: "main", bearingDeg: 0 },
    ],
  },
  overlay: { isohalines: [{ salinity: 10, km: 3, lonLat: [0, 0.03], bearingDeg: 0 }], constituents: {} },
  zone: {
    zonePaths: [
      [
        [0, 0.05],
        [0, 0.08],
      ],
    ],
    zoneKind: "addition",
    maximumPoints: [[0, 0.06]],
  },
  brushPaths: [
    [
      [0, 0.01],
      [0, 0.02],
    ],
  ],
  stations: [],
  constituent: "Ba",
  unit: "nmol/L",
  colouring: "salinity",
};

describe("markFeatures() gives MapLibre the marks deck.gl drew before (no deck.gl shader for them)", () => {
  it("draws the zone, brush and channel lines, then ticks, isohalines and the maximum, lowest first", () => {
    const kinds = markFeatures(data).features.map((f) => f.properties.kind);
    expect(kinds).toEqual(["zone-addition", "brush", "channel", "tick", "tick", "isohaline-marker", "maximum-ring"]);
  });

  it("leaves out a channel path of one point (no line to draw) and keeps the major flag of ticks", () => {
    const fc = markFeatures(data);
    expect(fc.features.filter((f) => f.properties.kind === "channel")).toHaveLength(1);
    expect(fc.features.filter((f) => f.properties.kind === "tick").map((f) => f.properties.major)).toEqual([
      true,
      false,
    ]);
  });

  it("a removal zone is drawn in the removal colour, an empty map has no marks", () => {
    const removal = markFeatures({ ...data, zone: { ...data.zone!, zoneKind: "removal" } });
    expect(removal.features[0]!.properties.kind).toBe("zone-removal");
    const none = markFeatures({ ...data, channel: undefined, overlay: undefined, zone: undefined, brushPaths: [] });
    expect(none.features).toEqual([]);
  });
});

describe("buildStyle() draws the marks above the basemap and under every label", () => {
  it("every mark layer reads the mark source and lies between the place dots and the first label layer", () => {
    const ids = buildStyle({ basemap: undefined }).layers.map((l) => l.id);
    const marks = markLayers().map((l) => l.id);
    expect(marks).toEqual(Object.values(MARK_LAYERS));
    for (const l of markLayers()) expect((l as { source: string }).source).toBe(MARK_SOURCE);
    const firstLabel = Math.min(...labelLayers().map((l) => ids.indexOf(l.id)));
    for (const id of marks) {
      expect(ids.indexOf(id)).toBeGreaterThan(ids.indexOf("place-dots"));
      expect(ids.indexOf(id)).toBeLessThan(firstLabel);
    }
  });
});
