// setSourceData (dashboard/src/map/sourceData.ts) sends a GeoJSON source its data only when they
// differ from what that same source last got; a source re-created by a style change is filled anew.
import type { Map as MapLibreMap } from "maplibre-gl";
import type { FeatureCollection } from "geojson";
import { describe, expect, it } from "vitest";
import { setSourceData } from "../../../dashboard/src/map/sourceData.ts";

function fakeMap() {
  const sources = new Map<string, { sent: FeatureCollection[]; setData(d: FeatureCollection): void }>();
  const add = (id: string) => {
    const s = { sent: [] as FeatureCollection[], setData: (d: FeatureCollection) => void s.sent.push(d) };
    sources.set(id, s);
    return s;
  };
  const map = { getSource: (id: string) => sources.get(id) } as unknown as MapLibreMap;
  return { map, add };
}

const fc = (n: number): FeatureCollection => ({
  type: "FeatureCollection",
  features: [{ type: "Feature", properties: { n }, geometry: { type: "Point", coordinates: [n, 0] } }],
});

describe("setSourceData", () => {
  it("sends new data, skips the same data again, sends changed data", () => {
    const { map, add } = fakeMap();
    const labels = add("labels");
    expect(setSourceData(map, "labels", fc(1))).toBe(true);
    expect(setSourceData(map, "labels", fc(1))).toBe(false);
    expect(setSourceData(map, "labels", fc(2))).toBe(true);
    expect(labels.sent).toHaveLength(2);
  });

  it("a re-created source (new style) gets the data even when unchanged; a missing source is skipped", () => {
    const { map, add } = fakeMap();
    add("labels");
    setSourceData(map, "labels", fc(1));
    const again = add("labels");
    expect(setSourceData(map, "labels", fc(1))).toBe(true);
    expect(again.sent).toHaveLength(1);
    expect(setSourceData(map, "absent", fc(1))).toBe(false);
  });
});
