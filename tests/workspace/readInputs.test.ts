import { describe, expect, it } from "vitest";
import { readFileSync } from "node:fs";
import { analyzeInputs, readCenterline, readInputs, type InputFile } from "../../analysis/index.ts";

const file = (path: string): InputFile => ({ name: path.split("/").pop()!, content: readFileSync(path) });
const WET = "data-demo/surveys/wet-2025-03.csv";
const LINE = "data-demo/centerline.geojson";

describe("readInputs() / analyzeInputs()", () => {
  it("readInputs() recognises a survey table and a centerline by content and states the mouth (common practice)", () => {
    const inputs = readInputs([file(WET), file(LINE)]);
    expect(inputs.files.map((f) => f.kind)).toEqual(["surveyText", "centerline"]);
    expect(inputs.surveys).toHaveLength(1);
    expect(inputs.channel?.mouth.source).toBe("point");
    expect(inputs.channel?.mouth.statement).toMatch(/mouth Point/);
    expect(inputs.issues.filter((i) => i.severity === "error")).toEqual([]);
  });

  it("readInputs() names an unrecognised file and what was expected", () => {
    const inputs = readInputs([{ name: "junk.bin", content: new Uint8Array([0, 1, 2, 3, 255, 0, 7]) }]);
    expect(inputs.surveys).toEqual([]);
    expect(inputs.files[0]!.kind).toBe("unknown");
    expect(inputs.issues[0]).toMatchObject({ file: "junk.bin", severity: "error" });
    expect(inputs.issues[0]!.expected).toMatch(/delimited text.*GeoJSON.*netCDF/);
  });

  it("analyzeInputs() returns analyses, overlays and tables from the output spec", () => {
    const results = analyzeInputs(readInputs([file(WET), file(LINE)]), { bootstrapDraws: 50, seed: 1 });
    expect(results.surveys).toHaveLength(1);
    expect(results.channel?.ticks.length).toBeGreaterThan(10);
    expect(results.tables.results[0]).toHaveProperty("effective_river_endmember");
    expect(results.caution).toMatch(/Screening/);
  });
});

describe("readCenterline()", () => {
  const line = (props: Record<string, unknown>, coords: unknown[]): string =>
    JSON.stringify({ type: "Feature", properties: props, geometry: { type: "LineString", coordinates: coords } });
  const coords = [
    [0, 0],
    [0, 0.1],
    [0, 0.2],
  ];

  it('measures from the last vertex when the LineString carries properties.mouth "end"', () => {
    const { channel } = readCenterline(line({ mouth: "end" }, coords), { fileName: "l.geojson" });
    expect(channel?.mouth.source).toBe("property");
    expect(channel?.network.mouthLonLat).toEqual([0, 0.2]);
  });

  it("the explicit option wins over the file", () => {
    const { channel } = readCenterline(line({ mouth: "end" }, coords), { fileName: "l.geojson", mouth: "start" });
    expect(channel?.mouth.source).toBe("option");
    expect(channel?.network.mouthLonLat).toEqual([0, 0]);
  });

  it("suggests the mouth from station salinity when nothing states it, and says so", () => {
    const stations = [
      { lonLat: [0, 0.01] as [number, number], salinity: 1 },
      { lonLat: [0, 0.1] as [number, number], salinity: 10 },
      { lonLat: [0, 0.19] as [number, number], salinity: 30 },
    ];
    const { channel } = readCenterline(line({}, coords), { fileName: "l.geojson", stations });
    expect(channel?.mouth.source).toBe("suggested");
    expect(channel?.network.mouthLonLat).toEqual([0, 0.2]);
    expect(channel?.mouth.statement).toMatch(/suggested from station salinity/);
  });

  it("accepts a byte-order mark and names the feature and index of a null coordinate", () => {
    const ok = readCenterline(`\ufeff${line({}, coords)}`, { fileName: "bom.geojson" });
    expect(ok.issues).toEqual([]);
    const bad = readCenterline(
      line({ name: "Main" }, [
        [0, 0],
        [null, 1],
        [0, 0.2],
      ]),
      { fileName: "n.geojson" },
    );
    expect(bad.channel).toBeUndefined();
    expect(bad.issues[0]).toMatchObject({
      file: "n.geojson",
      column: "feature 0 ('Main') position 1",
      value: "[null,1]",
    });
  });
});
