import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import Papa from "papaparse";
import { describe, expect, it } from "vitest";
import { main } from "../../cli/main.ts";
import { readIfExists, sharedData } from "../io/helpers/paths.ts";

// Real data, read at test time (never copied into the repository):
// USGS San Francisco Bay water-quality cruises (public domain U.S. Government work; Schraga & Cloern 2017,
// Sci. Data 4:170098) and the Neuse River Estuary ModMon axial surveys (Hounshell et al., EDI edi.181,
// CC BY 4.0), see ../shared/data/*/SOURCE.md.
const bay = path.join(sharedData, "usgs-sfbay-2016-2022");
const neuse = path.join(sharedData, "neuse-estuary-2015");
const BAY_FILES = ["2016ver.3.0SanFranciscoBayWaterQualityData.csv", "2018SanFranciscoBayWaterQualityData.csv"].map(
  (f) => path.join(bay, f),
);
const STATION_TABLE = path.join(bay, "USGSSFBayStations_from_xlsx.csv");
const stationText = readIfExists(STATION_TABLE);
const bayPresent = stationText !== undefined && BAY_FILES.every((f) => readIfExists(f) !== undefined);
const neusePresent = readIfExists(path.join(neuse, "NRE_Stats.csv")) !== undefined;
if (!bayPresent) console.warn(`${bay} absent (../shared not mounted): San Francisco Bay CLI acceptance tests skipped`);
if (!neusePresent) console.warn(`${neuse} absent (../shared not mounted): Neuse CLI acceptance tests skipped`);

/** The four nutrients the user states units for (µmol/L, as printed in the 2020–2022 headers; SOURCE.md). */
const UNITS = ["Silicate", "Nitrate_+_Nitrite", "Phosphate", "Ammonium"].flatMap((c) => ["--unit", `${c}=µmol/L`]);
/** North Bay channel stations, river first (USGS station numbering runs down the channel; SOURCE.md notes). */
const NORTH_BAY = ["657", "653", "649", ...Array.from({ length: 17 }, (_, i) => String(i + 2))];
const SOUTH_BAY = new Set(Array.from({ length: 16 }, (_, i) => String(i + 21)));

async function run(args: string[]): Promise<{ code: number; out: string; err: string }> {
  let out = "";
  let err = "";
  const code = await main(args, { out: (t) => (out += t), err: (t) => (err += `${t}\n`) });
  return { code, out, err };
}

interface Issue {
  file: string;
  row: number;
  column: string;
  value: string;
  expected: string;
}
interface Doc {
  mouth?: { source: string; statement: string };
  import: { issues: Issue[]; notices: Array<{ code: string; message: string }>; notUsed: Array<{ header: string }> };
  surveys: Array<{
    name: string;
    stations: Array<{ id: string; alongChannelKm?: number; offChannel: boolean }>;
    constituents: Array<{
      name: string;
      class: string;
      effectiveEndmember?: { value: number };
      endmembers?: { river: { conc: number; stationIds: string[] }; sea: { stationIds: string[] } };
      deviations?: Array<{ stationId: string }>;
    }>;
    variables: Array<{ name: string }>;
    offChannelStations: Array<{ id: string; distanceKm: number }>;
    warnings: Array<{ code: string; message: string }>;
  }>;
}

function expectNoDuplicateWarnings(doc: Doc): void {
  const keys = doc.import.issues.map((i) => `${i.file}|${i.column}|${i.value}|${i.expected}`);
  expect(keys.length - new Set(keys).size, "import issues repeated row by row").toBe(0);
  for (const s of doc.surveys) {
    const msgs = s.warnings.map((w) => w.message);
    expect(msgs.length - new Set(msgs).size, `repeated warnings in survey ${s.name}`).toBe(0);
  }
}

function northBayLine(): string {
  const rows = Papa.parse<Record<string, string>>(stationText ?? "", { header: true, skipEmptyLines: true }).data;
  const at = new Map(rows.map((r) => [r["Station"]!, [Number(r["Longitude degree"]), Number(r["Latitude degree"])]]));
  // Composed in the test from the station table's coordinates; it starts at the river, so a tool that
  // took the first vertex as the mouth would be wrong.
  const line = { type: "LineString", coordinates: NORTH_BAY.map((id) => at.get(id)!) };
  const dir = mkdtempSync(path.join(tmpdir(), "brackline-bay-"));
  const file = path.join(dir, "north-bay.geojson");
  writeFileSync(file, JSON.stringify(line));
  return file;
}

describe.skipIf(!bayPresent)(
  "brackline analyze on the raw San Francisco Bay cruise exports (Schraga & Cloern 2017)",
  () => {
    it("without units for the nutrients it exits 2 and lists every unit-less nutrient column with the --unit option to add", async () => {
      const r = await run(["analyze", BAY_FILES[1]!, "--stations", STATION_TABLE, "--draws", "20"]);
      expect(r.code).toBe(2);
      for (const c of ["Silicate", "Nitrate_+_Nitrite", "Phosphate", "Ammonium", "Nitrite"])
        expect(r.err).toContain(`--unit "${c}=`);
      expect(r.err).not.toContain("internal error");
    });

    it("with --unit for the four nutrients and a North-Bay centerline: one station per id per survey, the four nutrients analysed on every North-Bay transect, South-Bay stations left out of the fits, the mouth found at the seaward end, no repeated warnings", async () => {
      const line = northBayLine();
      const r = await run([
        "analyze",
        ...BAY_FILES,
        "--stations",
        STATION_TABLE,
        "--centerline",
        line,
        ...UNITS,
        "--draws",
        "100",
      ]);
      expect(r.code, r.err.slice(0, 2000)).toBe(0);
      const doc = JSON.parse(r.out) as Doc;
      expect(doc.mouth?.source).toBe("suggested");
      expect(doc.mouth?.statement).toContain("--mouth");
      expect(doc.import.notUsed.map((u) => u.header)).toContain("Nitrite");
      expectNoDuplicateWarnings(doc);
      let transects = 0;
      const riverSi: number[] = [];
      for (const s of doc.surveys) {
        const ids = s.stations.map((x) => x.id);
        expect(ids.length - new Set(ids).size, `station ids repeated in ${s.name}`).toBe(0);
        const river = s.stations.find((x) => x.id === "657" || x.id === "649");
        const gate = s.stations.find((x) => x.id === "18");
        const si = s.constituents.find((c) => c.name === "Si");
        if (river === undefined || gate === undefined || si?.endmembers === undefined) continue;
        transects += 1;
        // mouth at the seaward end: the Golden Gate side is nearer km 0 than the river
        expect(gate.alongChannelKm!, `survey ${s.name}`).toBeLessThan(river.alongChannelKm!);
        for (const name of ["Si", "NO3+NO2", "PO4", "NH4"]) {
          const c = s.constituents.find((x) => x.name === name);
          expect(c?.class, `${name} in ${s.name}`).not.toBe("insufficient-data");
          const used = [
            ...(c?.deviations ?? []).map((d) => d.stationId),
            ...(c?.endmembers?.sea.stationIds ?? []),
            ...(c?.endmembers?.river.stationIds ?? []),
          ];
          expect(
            used.filter((id) => SOUTH_BAY.has(id)),
            `${name} in ${s.name} uses South-Bay stations`,
          ).toEqual([]);
        }
        const south = s.stations.filter((x) => SOUTH_BAY.has(x.id));
        if (south.length > 0)
          expect(s.offChannelStations.map((o) => o.id)).toEqual(expect.arrayContaining(south.map((x) => x.id)));
        riverSi.push(si.endmembers.river.conc);
      }
      expect(transects).toBeGreaterThanOrEqual(12);
      // silicate is a river-borne tracer: a river end-member of some hundred µmol/L (common practice; spring
      // diatom blooms lower it in single surveys, e.g. 58 µmol/L on 2016-04-27)
      const sorted = [...riverSi].sort((a, b) => a - b);
      const median = sorted[sorted.length >> 1]!;
      expect(median).toBeGreaterThan(150);
      expect(median).toBeLessThan(350);
      expect(Math.min(...riverSi)).toBeGreaterThan(30);
    }, 240_000);

    it("--layer surface on the 2018 file (nutrients at 2 m) says the nutrients exist only at another depth instead of failing silently", async () => {
      const r = await run([
        "analyze",
        BAY_FILES[1]!,
        "--stations",
        STATION_TABLE,
        "--centerline",
        northBayLine(),
        ...UNITS,
        "--layer",
        "surface",
        "--draws",
        "20",
      ]);
      expect(r.code).toBe(0);
      const doc = JSON.parse(r.out) as Doc;
      const hint = doc.import.issues.find((i) => i.column === "Si" && i.expected.includes("shallowest"));
      expect(hint?.expected).toContain("only at 2 m");
    }, 120_000);
  },
);

describe.skipIf(!neusePresent)("brackline analyze on the Neuse axial surveys (Hounshell et al., EDI edi.181)", () => {
  it("with a station table of along-channel distances: 11 stations per survey, mouth at the seaward end, DOC analysed, oxygen/chlorophyll/particles only along the channel, no repeated warnings", async () => {
    // Station labels are the along-axis distances of the metadata (0 upstream … 180 downstream; SOURCE.md);
    // the table is composed here from those labels, not copied from the shared folder.
    const dir = mkdtempSync(path.join(tmpdir(), "brackline-neuse-"));
    const table = path.join(dir, "stations.csv");
    const labels = [0, 20, 30, 50, 60, 70, 100, 120, 140, 160, 180];
    writeFileSync(table, `Station,Distance (km)\n${labels.map((l) => `${l},${l}`).join("\n")}\n`);
    const r = await run(["analyze", path.join(neuse, "NRE_Stats.csv"), "--stations", table, "--draws", "100"]);
    expect(r.code, r.err.slice(0, 2000)).toBe(0);
    const doc = JSON.parse(r.out) as Doc;
    expect(doc.surveys).toHaveLength(22);
    expect(doc.import.notices.find((n) => n.code === "distanceOrigin")?.message).toContain("180");
    expectNoDuplicateWarnings(doc);
    for (const s of doc.surveys) {
      expect(s.stations.map((x) => x.id)).toEqual(labels.map(String));
      expect(s.stations.find((x) => x.id === "180")?.alongChannelKm).toBe(0);
      expect(s.stations.find((x) => x.id === "0")?.alongChannelKm).toBe(180);
      expect(s.constituents[0]?.name).toBe("DOC");
      expect(s.constituents.map((c) => c.name)).not.toContain("O2");
      expect(s.variables.map((v) => v.name)).toEqual(expect.arrayContaining(["O2", "Chla", "POC", "Turbidity"]));
      const doc_ = s.constituents.find((c) => c.name === "DOC")!;
      expect(doc_.class).not.toBe("insufficient-data");
    }
  }, 120_000);
});

describe.skipIf(!bayPresent)(
  "brackline analyze on the 2018 bay cruises without a centerline (issue 13: km from the station-built line)",
  () => {
    it("every North-Bay station of a full transect gets an along-channel km, increasing up the river; South-Bay stations are off the channel", async () => {
      const r = await run(["analyze", BAY_FILES[1]!, "--stations", STATION_TABLE, ...UNITS, "--draws", "20"]);
      expect(r.code).toBe(0);
      const doc = JSON.parse(r.out) as Doc;
      expect(doc.import.notices.map((n) => n.code)).toContain("centerlineFromStations");
      const full = doc.surveys.filter(
        (s) => s.stations.some((st) => st.id === "657") && s.stations.some((st) => st.id === "18"),
      );
      expect(full.length).toBeGreaterThan(5);
      for (const s of full) {
        const north = s.stations.filter((st) => NORTH_BAY.includes(st.id) || st.id === "18");
        for (const st of north) {
          expect(st.offChannel, `${s.name} station ${st.id}`).toBe(false);
          expect(st.alongChannelKm, `${s.name} station ${st.id} km`).toBeTypeOf("number");
        }
        // Up the river from Central Bay (18) to Rio Vista (657): common practice, stations numbered down the channel.
        const km = (id: string) => s.stations.find((st) => st.id === id)?.alongChannelKm ?? NaN;
        expect(km("657")).toBeGreaterThan(km("6"));
        expect(km("6")).toBeGreaterThan(km("12"));
        expect(km("12")).toBeGreaterThan(km("18"));
        // The USGS transect puts Rio Vista about 90 km up-channel of Central Bay (SOURCE.md: ~145 km Rio Vista to
        // station 36, the South Bay arm ~55 km of it; derived): the station-built line follows the stations: within ±15 km.
        expect(Math.abs(km("657") - km("18") - 90)).toBeLessThan(15);
        const southOnChannel = s.stations.filter((st) => SOUTH_BAY.has(st.id) && !st.offChannel).map((st) => st.id);
        expect(southOnChannel, `${s.name}: South-Bay stations on the channel`).toEqual([]);
      }
    }, 120_000);
  },
);
