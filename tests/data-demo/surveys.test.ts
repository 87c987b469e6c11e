import { readFileSync } from "node:fs";
import Papa from "papaparse";
import { lineString, point, pointToLineDistance } from "@turf/turf";
import { describe, expect, it } from "vitest";
import { expectWithin } from "../helpers/tolerance.ts";

const read = (rel: string) => readFileSync(new URL(`../../data-demo/${rel}`, import.meta.url), "utf8");
const COLUMNS = [
  "survey",
  "station",
  "date_time",
  "latitude",
  "longitude",
  "depth_m",
  "salinity",
  "temperature_C",
  "pH",
  "discharge (m³/s)",
  "Fe (nmol/L)",
  "Mn (nmol/L)",
  "Cu (nmol/L)",
  "Ni (nmol/L)",
  "Cd (nmol/L)",
  "Ba (nmol/L)",
  "Si (µmol/L)",
  "NO3 (µmol/L)",
  "PO4 (µmol/L)",
  "Cu_flag",
];
type Row = Record<string, string>;
function parse(rel: string): { fields: string[]; rows: Row[] } {
  const r = Papa.parse<Row>(read(rel), { header: true, skipEmptyLines: true });
  expect(r.errors, `${rel} parse errors`).toEqual([]);
  return { fields: r.meta.fields ?? [], rows: r.data };
}
const wet = parse("surveys/wet-2025-03.csv");
const dry = parse("surveys/dry-2025-09.csv");
const combined = parse("surveys/both-surveys.csv");
const centerline = JSON.parse(read("centerline.geojson")) as {
  features: Array<{ properties: { role: string }; geometry: { coordinates: [number, number][] } }>;
};
const main = lineString(centerline.features.find((f) => f.properties.role === "main")!.geometry.coordinates);
// ISO 8601 date-time with seconds and an explicit zone (ISO 8601-1:2019 extended format, common practice)
const ISO_WITH_ZONE = /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}:\d{2}(Z|[+-]\d{2}:\d{2})$/;

describe("demo survey CSV files (invented data)", () => {
  it("every survey file has exactly the documented columns, in order, and no comment lines", () => {
    for (const f of [wet, dry, combined]) expect(f.fields).toEqual(COLUMNS);
    for (const rel of ["surveys/wet-2025-03.csv", "surveys/dry-2025-09.csv", "surveys/both-surveys.csv"]) {
      expect(
        read(rel)
          .split("\n")
          .some((l) => l.startsWith("#")),
        rel,
      ).toBe(false);
    }
  });

  it("each survey has 25–40 stations with ids W01.. / D01.. and both-surveys.csv is their concatenation", () => {
    for (const [f, p] of [
      [wet, "W"],
      [dry, "D"],
    ] as const) {
      expectWithin(f.rows.length, 32.5, 7.5, `${p} station count`);
      f.rows.forEach((r, i) => expect(r.station).toBe(`${p}${String(i + 1).padStart(2, "0")}`));
    }
    expect(combined.rows).toEqual([...wet.rows, ...dry.rows]);
  });

  it("date_time values are ISO 8601 in 2025 with a zone designator and increase along each survey", () => {
    for (const f of [wet, dry]) {
      let last = -Infinity;
      for (const r of f.rows) {
        expect(r.date_time, r.station).toMatch(ISO_WITH_ZONE);
        const t = Date.parse(r.date_time);
        expect(new Date(t).getUTCFullYear()).toBe(2025);
        expect(t > last, r.station).toBe(true);
        last = t;
      }
    }
  });

  it("exactly one Cu value is flagged 4 (IOC scheme) and it is ≥ 2.5× its neighbours; all other flags are 1", () => {
    const flagged = combined.rows.filter((r) => r.Cu_flag === "4");
    expect(flagged.map((r) => r.station)).toEqual(["W20"]);
    expect(combined.rows.every((r) => r.Cu_flag === "1" || r.Cu_flag === "4")).toBe(true);
    const i = wet.rows.findIndex((r) => r.Cu_flag === "4");
    const cu = (k: number) => Number(wet.rows[k]["Cu (nmol/L)"]);
    expect(cu(i) / Math.max(cu(i - 1), cu(i + 1)) >= 2.5).toBe(true);
  });

  it("below-detection values are written '<DL' (Fe <4.0, Cd <0.05) and occur only at the seaward end (S > 30)", () => {
    const bdl = combined.rows.flatMap((r) =>
      Object.entries(r)
        .filter(([, v]) => v.startsWith("<"))
        .map(([k, v]) => ({ k, v, s: Number(r.salinity) })),
    );
    expectWithin(bdl.length, 5, 3, "number of below-detection values");
    for (const b of bdl) {
      expect(["Fe (nmol/L)<4.0", "Cd (nmol/L)<0.05"]).toContain(`${b.k}${b.v}`);
      expect(b.s > 30).toBe(true);
    }
  });

  it("all other value cells are plain decimal numbers with fixed decimals", () => {
    for (const r of combined.rows) {
      for (const c of COLUMNS.slice(3)) {
        if (!r[c].startsWith("<")) expect(r[c], `${r.station} ${c}`).toMatch(/^-?\d+(\.\d+)?$/);
      }
    }
  });

  it("stations lie 0–400 m from the centerline except one dry-season station ~3 km off the channel", () => {
    const far: string[] = [];
    for (const r of combined.rows) {
      const dM = pointToLineDistance(point([Number(r.longitude), Number(r.latitude)]), main, { units: "meters" });
      if (dM > 400) far.push(`${r.station}:${Math.round(dM)}`);
    }
    expect(far.length).toBe(1);
    expect(far[0].startsWith("D")).toBe(true);
    expectWithin(Number(far[0].split(":")[1]), 3000, 300, "off-channel distance [m]");
  });

  it("salinity spans river to sea in both surveys, with ≥ 8 stations below S = 5", () => {
    for (const f of [wet, dry]) {
      const s = f.rows.map((r) => Number(r.salinity));
      expectWithin(Math.min(...s), 0.15, 0.15, "lowest salinity");
      expectWithin(Math.max(...s), 33.9, 0.6, "highest salinity");
      expect(s.filter((v) => v < 5).length >= 8).toBe(true);
    }
  });

  it("surveys/README.md states that the data are invented", () => {
    expect(read("surveys/README.md")).toMatch(/INVENTED DEMO DATA/);
  });

  it("temperature is ~9–11 °C (wet) and ~18–22 °C (dry); pH runs from ~7.3 (river) through a low-salinity minimum to ~8.05 (sea) (invented, common practice)", () => {
    const col = (f: typeof wet, c: string) => f.rows.map((r) => Number(r[c]));
    for (const t of col(wet, "temperature_C")) expectWithin(t, 10, 1.5, "wet temperature [°C]");
    for (const t of col(dry, "temperature_C")) expectWithin(t, 20, 2, "dry temperature [°C]");
    for (const f of [wet, dry]) {
      const ph = col(f, "pH");
      const sal = col(f, "salinity");
      const river = ph[ph.length - 1];
      expectWithin(river, 7.3, 0.15, "river pH");
      expectWithin(ph[0], 8.05, 0.05, "sea pH");
      const iMin = ph.indexOf(Math.min(...ph));
      expectWithin(sal[iMin], 2.5, 2, "salinity of the pH minimum");
      expect(ph[iMin] < river - 0.1).toBe(true);
    }
  });
});
