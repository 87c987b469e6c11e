import path from "node:path";
import { describe, expect, it } from "vitest";
import { main } from "../../cli/main.ts";
import { readIfExists, sharedData } from "../io/helpers/paths.ts";

// Real data, read at test time (never copied into the repository): USGS San Francisco Bay water-quality
// cruises (public domain U.S. Government work; Schraga & Cloern 2017, Sci. Data 4:170098), see
// ../shared/data/usgs-sfbay-2016-2022/SOURCE.md. The 2020–2022 files carry "Distance from Sta. 36 (km)",
// counted from the head of South Bay (a side arm), not from the bay entrance.
const bay = path.join(sharedData, "usgs-sfbay-2016-2022");
const Y2021 = path.join(bay, "wqdata21.csv");
const Y2019 = path.join(bay, "2019SanFranciscoBayWaterQualityData.csv");
const TABLE = path.join(bay, "USGSSFBayStations_from_xlsx.csv");
const present = [Y2021, Y2019, TABLE].every((f) => readIfExists(f) !== undefined);
if (!present) console.warn(`${bay} absent (../shared not mounted): distance-origin real-data tests skipped`);

/** The four nutrients of the 2016–2019 headers, in µmol/L as printed in the 2020–2022 headers (SOURCE.md). */
const UNITS = ["Silicate", "Nitrate_+_Nitrite", "Phosphate", "Ammonium"].flatMap((c) => ["--unit", `${c}=µmol/L`]);
/** North-Bay channel stations from the Golden Gate side up the river (USGS numbering; SOURCE.md notes). */
const NORTH_BAY = [
  "18",
  "17",
  "16",
  "15",
  "14",
  "13",
  "12",
  "11",
  "10",
  "9",
  "8",
  "7",
  "6",
  "5",
  "4",
  "3",
  "2",
  "649",
  "657",
];
const SOUTH_BAY = Array.from({ length: 16 }, (_, i) => String(i + 21));

interface Doc {
  import: { notices: Array<{ code: string; message: string }> };
  surveys: Array<{
    name: string;
    saltIntrusionKm?: number;
    stations: Array<{ id: string; alongChannelKm?: number; offChannel: boolean; sideArmKm?: number }>;
    offChannelStations: Array<{ id: string; sideArm?: true }>;
    constituents: Array<{ name: string; endmembers?: { sea: { stationIds: string[] } } }>;
  }>;
}

async function analyze(args: string[]): Promise<Doc> {
  let out = "";
  let err = "";
  const code = await main(["analyze", ...args, "--draws", "50"], {
    out: (t) => (out += t),
    err: (t) => (err += `${t}\n`),
  });
  expect(code, err.slice(0, 2000)).toBe(0);
  return JSON.parse(out) as Doc;
}

describe.skipIf(!present)("bay cruise distances counted from a side arm's head (Schraga & Cloern 2017 data)", () => {
  it("wqdata21.csv without the station table: ids without '.0', mouth at the salinity maximum near the bay entrance, km increasing up the river, South Bay a separate arm, salt intrusion of tens of km", async () => {
    const doc = await analyze([Y2021]);
    const notice = doc.import.notices.find((n) => n.code === "distanceOrigin")!;
    expect(notice.message).toContain("do not count from the mouth");
    expect(notice.message).toContain("--mouth start|end");
    expect(notice.message).toContain("Mouth control");
    const full = doc.surveys.find((s) => s.name === "2021-09-29")!;
    const ids = full.stations.map((s) => s.id);
    expect(ids.filter((id) => id.endsWith(".0"))).toEqual([]);
    expect(ids).toContain("36");
    const km = new Map(full.stations.map((s) => [s.id, s]));
    // the mouth at the seaward end of the North-Bay axis (station 18, by the Golden Gate), km rising landward
    expect(km.get("18")!.alongChannelKm).toBe(0);
    const northKm = NORTH_BAY.map((id) => km.get(id)!.alongChannelKm!);
    for (let i = 1; i < northKm.length; i++) expect(northKm[i]!, NORTH_BAY[i]).toBeGreaterThan(northKm[i - 1]!);
    // Rio Vista (657) lies ~90 km up the channel from the Golden Gate (SOURCE.md: the ~145 km transect minus South Bay)
    expect(northKm.at(-1)!).toBeGreaterThan(80);
    expect(northKm.at(-1)!).toBeLessThan(100);
    // South Bay: a separate arm, off the channel, listed, not an end-member
    for (const id of SOUTH_BAY.filter((x) => km.has(x))) {
      expect(km.get(id)!.offChannel, id).toBe(true);
      expect(km.get(id)!.alongChannelKm, id).toBeUndefined();
    }
    expect(full.offChannelStations.filter((o) => o.sideArm).map((o) => o.id)).toContain("36");
    for (const c of full.constituents)
      expect(c.endmembers?.sea.stationIds.filter((id) => SOUTH_BAY.includes(id)) ?? [], c.name).toEqual([]);
    // late-September 2021 (critically dry year): the salinity-2 isohaline tens of km up the channel, below Rio Vista
    // (from the file's own origin it read 142 km, beyond the end of the transect's North-Bay arm)
    expect(full.saltIntrusionKm!).toBeGreaterThan(50);
    expect(full.saltIntrusionKm!).toBeLessThan(northKm.at(-1)!);
  }, 120_000);

  it("wqdata21.csv with the station table (centerline built from the stations): South Bay left off the line by the file's own distances, so the mouth, km and salt intrusion agree with the distance route", async () => {
    const byFile = await analyze([Y2021]);
    const byTable = await analyze([Y2021, "--stations", TABLE]);
    const a = byFile.surveys.find((s) => s.name === "2021-09-29")!;
    const b = byTable.surveys.find((s) => s.name === "2021-09-29")!;
    const kmB = new Map(b.stations.map((s) => [s.id, s]));
    expect(kmB.get("18")!.alongChannelKm!).toBeLessThan(1);
    for (const id of SOUTH_BAY.filter((x) => kmB.has(x))) expect(kmB.get(id)!.offChannel, id).toBe(true);
    // before this, the station line ran on into South Bay and the salinity-2 isohaline read 120 km from a South-Bay "mouth"
    expect(Math.abs(a.saltIntrusionKm! - b.saltIntrusionKm!)).toBeLessThan(0.05 * a.saltIntrusionKm! + 1);
  }, 240_000);

  it("km of North-Bay stations agree with the station-table placement (2019 file + station table) within 5 % + 1 km", async () => {
    const byFile = await analyze([Y2021]);
    const byTable = await analyze([Y2019, "--stations", TABLE, ...UNITS]);
    const kmOf = (doc: Doc): Map<string, number> => {
      const m = new Map<string, number>();
      for (const s of doc.surveys)
        for (const st of s.stations)
          if (st.alongChannelKm !== undefined && !m.has(st.id)) m.set(st.id, st.alongChannelKm);
      return m;
    };
    const [a, b] = [kmOf(byFile), kmOf(byTable)];
    for (const id of NORTH_BAY) {
      const [x, y] = [a.get(id)!, b.get(id)!];
      // the table route measures along a smoothed line through the stations, the file along the deep channel
      expect(Math.abs(x - y), `station ${id}: file ${x} km, table ${y} km`).toBeLessThanOrEqual(
        0.05 * Math.max(x, y) + 1,
      );
    }
  }, 240_000);
});
