import { describe, expect, it } from "vitest";
import { buildChannelNetwork, centerlineMouthHint } from "../../analysis/index.ts";
import type { CenterlineGeoJson } from "../../analysis/index.ts";

const line = (coords: number[][], properties: Record<string, unknown>) => ({
  type: "Feature" as const,
  geometry: { type: "LineString" as const, coordinates: coords },
  properties,
});
const point = (coords: number[], properties: Record<string, unknown>) => ({
  type: "Feature" as const,
  geometry: { type: "Point" as const, coordinates: coords },
  properties,
});

describe("centerline markers (RFC 7946 Point features beside the lines)", () => {
  const coords = [
    [0, 45],
    [0.1, 45],
    [0.2, 45],
  ];
  it("buildChannelNetwork() skips Point markers and takes the mouth from a role 'mouth' point (common practice)", () => {
    const fc = {
      type: "FeatureCollection",
      features: [line(coords, { role: "main" }), point([0.2, 45], { role: "mouth" }), point([0, 45], { role: "head" })],
    } as CenterlineGeoJson;
    expect(centerlineMouthHint(fc)).toEqual([0.2, 45]);
    const net = buildChannelNetwork(fc);
    expect(net.mouthLonLat[0]).toBeCloseTo(0.2, 9);
    expect(net.mouthSource).toBe("point");
    expect(net.warnings.map((w) => w.code)).not.toContain("mouthAssumed");
  });

  it("centerlineMouthHint() reads the main line's properties.mouth, and an explicit option wins", () => {
    const fc = {
      type: "FeatureCollection",
      features: [line(coords, { role: "main", mouth: "end" })],
    } as CenterlineGeoJson;
    expect(centerlineMouthHint(fc)).toBe("end");
    expect(buildChannelNetwork(fc).mouthLonLat[0]).toBeCloseTo(0.2, 9);
    expect(buildChannelNetwork(fc, { mouth: "start" }).mouthLonLat[0]).toBeCloseTo(0, 9);
  });

  it("centerlineMouthHint() is undefined when the file says nothing, and the mouth is then assumed with a warning", () => {
    const fc = { type: "FeatureCollection", features: [line(coords, {})] } as CenterlineGeoJson;
    expect(centerlineMouthHint(fc)).toBeUndefined();
    expect(buildChannelNetwork(fc).warnings.map((w) => w.code)).toContain("mouthAssumed");
  });
});
