import { describe, expect, it } from "vitest";
import { applyMapping } from "../../analysis/io/applyMapping.ts";
import { readGeoJsonPoints } from "../../analysis/io/geojsonPoints.ts";
import { readNetcdfStations } from "../../analysis/io/netcdfStations.ts";
import { readSurveyStream, readSurveyText } from "../../analysis/io/readSurvey.ts";
import { readStationTable } from "../../analysis/io/stationTable.ts";
import { suggestMapping } from "../../analysis/io/suggestMapping.ts";

// Caller mistakes throw TypeError naming the function and argument (project rule); bad file content never throws.
describe("caller mistakes in the io entry points", () => {
  it("readSurveyText() throws TypeError naming the function for a non-string text or a missing fileName", () => {
    expect(() => readSurveyText(undefined as unknown as string, { fileName: "x" })).toThrow(
      /readSurveyText\(\): text must be a string/,
    );
    expect(() => readSurveyText("a,b", {} as { fileName: string })).toThrow(/readSurveyText\(\): options.fileName/);
  });

  it("readStationTable(), readGeoJsonPoints(), readNetcdfStations(), suggestMapping() and applyMapping() name the bad argument", () => {
    expect(() => readStationTable(5 as unknown as string, { fileName: "s" })).toThrow(/readStationTable\(\): text/);
    expect(() => readGeoJsonPoints("{}", null as unknown as { fileName: string })).toThrow(
      /readGeoJsonPoints\(\): options/,
    );
    expect(() => readNetcdfStations("CDF" as unknown as Uint8Array, { fileName: "n" })).toThrow(
      /readNetcdfStations\(\): buffer/,
    );
    expect(() => suggestMapping([1, 2] as unknown as string[])).toThrow(/suggestMapping\(\): headers/);
    expect(() => applyMapping(["a"], [], { shape: "s", columns: [] }, {} as { fileName: string })).toThrow(
      /applyMapping\(\): options.fileName/,
    );
  });

  it("readSurveyStream() rejects a non-iterable source with TypeError", async () => {
    await expect(readSurveyStream(42 as unknown as string[], { fileName: "x" })).rejects.toThrow(
      /readSurveyStream\(\): source/,
    );
  });
});
