import { describe, expect, it } from "vitest";
import { readFileSync } from "node:fs";
import { inspectFile, geoJsonKind, isNetcdfMagic } from "../../../dashboard/src/worker/inspectFile.ts";
import { importFile } from "../../../dashboard/src/worker/importFile.ts";
import { expectWithin } from "../../helpers/tolerance.ts";
import { QUIRKY_CSV, file } from "./fixtures.ts";

describe("inspectFile() recognises a dropped file by its content", () => {
  it("semicolon text with decimal commas: survey table, headers, preview rows, S_field not recognised (common practice: ';' with ',' decimals)", async () => {
    const i = await inspectFile(file("quirky.csv", QUIRKY_CSV));
    expect(i.kind).toBe("surveyText");
    expect(i.dialect).toEqual({ delimiter: ";", decimalComma: true });
    expect(i.headers[5]).toBe("S_field");
    expect(i.previewRows[0][6]).toBe("<0,05");
    expect(i.suggested?.columns[5].role).toBe("ignore");
    expect(i.suggested?.columns[6]).toMatchObject({ role: "constituent", name: "Fe", unit: "nmol/L" });
  });

  it("a table of station ids and positions only is a station table", async () => {
    const i = await inspectFile(file("stations.csv", "station,latitude,longitude\nA1,45.0,-35.3\n"));
    expect(i.kind).toBe("stationTable");
  });

  it("GeoJSON with a LineString is a centerline, with Points a survey (RFC 7946 geometry types)", async () => {
    const line = {
      type: "FeatureCollection",
      features: [
        {
          type: "Feature",
          properties: {},
          geometry: {
            type: "LineString",
            coordinates: [
              [0, 0],
              [1, 1],
            ],
          },
        },
      ],
    };
    const points = {
      type: "FeatureCollection",
      features: [{ type: "Feature", properties: {}, geometry: { type: "Point", coordinates: [0, 0] } }],
    };
    expect(geoJsonKind(line)).toBe("centerline");
    expect(geoJsonKind(points)).toBe("surveyGeoJson");
    expect((await inspectFile(file("line.geojson", JSON.stringify(line)))).kind).toBe("centerline");
  });

  it("netCDF classic and netCDF-4 signatures (Unidata netCDF format spec: 'CDF' + version byte; HDF5 signature)", async () => {
    expect(isNetcdfMagic(new Uint8Array([0x43, 0x44, 0x46, 0x01]))).toBe(true);
    expect(isNetcdfMagic(new Uint8Array([0x89, 0x48, 0x44, 0x46]))).toBe(true);
    expect(isNetcdfMagic(new TextEncoder().encode("a,b"))).toBe(false);
    expect((await inspectFile(file("x.nc", new Uint8Array([0x43, 0x44, 0x46, 0x01, 0])))).kind).toBe("surveyNetcdf");
  });

  it("an empty file and broken JSON are not recognised, with the reason", async () => {
    expect((await inspectFile(file("e.csv", ""))).message).toMatch(/empty/);
    expect((await inspectFile(file("b.json", "{ nope"))).message).toMatch(/not valid JSON/);
  });
});

describe("importFile() reads with the confirmed mapping and reports every problem", () => {
  it("after mapping S_field to salinity: 5 rows read, 4 accepted, 1 rejected, the bad Fe cell listed with row 4 and its text", async () => {
    const i = await inspectFile(file("quirky.csv", QUIRKY_CSV));
    const mapping = structuredClone(i.suggested!);
    mapping.columns[5].role = "salinity";
    const fractions: number[] = [];
    const o = await importFile(file("quirky.csv", QUIRKY_CSV), { kind: "surveyText", mapping }, (f) =>
      fractions.push(f),
    );
    expect(o.summary?.rowsRead).toBe(5);
    expect(o.summary?.rowsAccepted).toBe(4);
    expect(o.summary?.rowsRejected).toBe(1);
    expect(Object.values(o.summary?.rejectedByReason ?? {})).toEqual([1]);
    const bad = o.issues.find((x) => x.column === "Fe (nmol/L)");
    expect(bad).toMatchObject({ file: "quirky.csv", row: 4, value: "abc", severity: "error" });
    const st = o.surveys[0].stations.find((s) => s.id === "N01");
    expectWithin(st?.salinity.value ?? NaN, 33.2, 1e-12, "decimal-comma salinity of N01");
    expect(st?.values.Fe).toMatchObject({ status: "belowDetection", original: "<0,05" });
    expect(fractions.at(-1)).toBe(1);
  });

  it("a centerline is checked by building the channel; the demo centerline is accepted", async () => {
    const text = readFileSync(new URL("../../../data-demo/centerline.geojson", import.meta.url), "utf8");
    const o = await importFile(file("centerline.geojson", text), { kind: "centerline" });
    expect(o.issues).toEqual([]);
    expect(o.centerline).toBeDefined();
    const broken = await importFile(file("c.geojson", '{"type":"FeatureCollection","features":[]}'), {
      kind: "centerline",
    });
    expect(broken.issues[0].expected).toMatch(/usable channel centerline/);
  });

  it("a large file is streamed: progress comes in several increasing steps and ends at 1 (common practice)", async () => {
    const lines = ["survey,station,date_time,latitude,longitude,salinity,Fe (nmol/L)"];
    for (let i = 0; i < 40000; i++) {
      lines.push(`big,B${i},2025-11-04T08:00:00Z,45.0${i % 10},-35.3,${(i % 35) + 0.5},${i % 50}`);
    }
    const fractions: number[] = [];
    const o = await importFile(file("big.csv", lines.join("\n")), { kind: "surveyText" }, (f) => fractions.push(f));
    expect(o.summary?.rowsRead).toBe(40000);
    expect(fractions.length).toBeGreaterThan(3);
    expect(fractions.every((f, i) => i === 0 || f >= fractions[i - 1])).toBe(true);
    expect(fractions.at(-1)).toBe(1);
  });

  it("multi-byte UTF-8 split across stream slices is decoded intact (WHATWG Encoding, TextDecoder stream mode)", async () => {
    const lines = ["survey,station,date_time,latitude,longitude,salinity,Fe (nmol/L)"];
    for (let i = 0; i < 30000; i++) lines.push(`s,Stéµ${i},2025-11-04T08:00:00Z,45.01,-35.3,${(i % 35) + 0.5},1`);
    const o = await importFile(file("utf8.csv", lines.join("\n")), { kind: "surveyText" });
    const ids = o.surveys.flatMap((sv) => sv.stations.map((st) => st.id));
    expect(ids.length).toBe(30000);
    expect(ids.filter((id) => !/^Stéµ\d+$/.test(id))).toEqual([]);
  });
});
