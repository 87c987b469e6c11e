import path from "node:path";
import { describe, expect, it } from "vitest";
import { readInputs } from "../../analysis/index.ts";
import type { Station, WorkspaceInputs } from "../../analysis/index.ts";
import { readIfExists, sharedData } from "../io/helpers/paths.ts";

// Real data, read at test time (never copied into the repository): the USGS San Francisco Bay water-quality
// cruises 2016 – May 2022 (public domain U.S. Government work; Schraga & Cloern 2017, Sci. Data 4:170098),
// ../shared/data/usgs-sfbay-2016-2022/SOURCE.md. Each yearly export is cut into one file per sampling date
// (in memory), as a user who exports a single cruise would have it, and read without a centerline: the
// 2020–2022 files by their "Distance from Sta. 36" (counted from the head of South Bay, a side arm), the
// 2016–2019 files through the station table (a centerline built from the station positions).
const bay = path.join(sharedData, "usgs-sfbay-2016-2022");
const TABLE_FILE = "USGSSFBayStations_from_xlsx.csv";
const DISTANCE_FILES = ["wqdata20.csv", "wqdata21.csv", "wqdata22.csv"];
const TABLE_FILES = [
  "2016ver.3.0SanFranciscoBayWaterQualityData.csv",
  "2017ver.3.0SanFranciscoBayWaterQualityData.csv",
  "2018SanFranciscoBayWaterQualityData.csv",
  "2019SanFranciscoBayWaterQualityData.csv",
];
const texts = new Map([...DISTANCE_FILES, ...TABLE_FILES, TABLE_FILE].map((f) => [f, readIfExists(path.join(bay, f))]));
const present = [...texts.values()].every((t) => t !== undefined);
if (!present) console.warn(`${bay} absent (../shared not mounted): single-survey mouth tests skipped`);

/** The four nutrients and nitrite of the 2016–2019 headers, in µmol/L as printed in the 2020–2022 headers (SOURCE.md). */
const UNITS = Object.fromEntries(
  ["Silicate", "Nitrate_+_Nitrite", "Phosphate", "Ammonium", "Nitrite"].map((c) => [c, "µmol/L"]),
);
/** Central Bay, where the North-Bay river arm meets the bay entrance: Point San Pablo (15) to Potrero Point (22), where South Bay opens. */
const CENTRAL_BAY = ["15", "16", "17", "18", "19", "20", "21", "22"];
/** The river arm up from Point San Pablo (San Pablo Bay, Carquinez Strait, Suisun Bay, the Sacramento River). */
const RIVER_ARM = new Set([...Array.from({ length: 14 }, (_, i) => String(i + 1)), "12.5", "649", "653", "657"]);
/** South Bay, the side arm (Potrero Point, 22, to the head of the bay, 36). */
const SOUTH_BAY = new Set(Array.from({ length: 15 }, (_, i) => String(i + 22)));

/** The export cut into one file per sampling date: the header and that date's rows, as written. */
function singleSurveys(file: string): Array<{ date: string; content: string }> {
  const lines = texts
    .get(file)!
    .replace(/^\uFEFF/, "")
    .split(/\r?\n/);
  const byDate = new Map<string, string[]>();
  for (const line of lines.slice(1)) {
    if (line.trim() === "") continue;
    const date = line.slice(0, line.indexOf(",")).replaceAll('"', "");
    (byDate.get(date) ?? byDate.set(date, []).get(date)!).push(line);
  }
  const iso = (d: string): string => {
    const m = /^(\d+)\/(\d+)\/(\d+)$/.exec(d); // M/D/YY in the 2016–2019 files
    return m ? `20${m[3]}-${m[1]!.padStart(2, "0")}-${m[2]!.padStart(2, "0")}` : d;
  };
  return [...byDate].map(([date, rows]) => ({ date: iso(date), content: [lines[0], ...rows, ""].join("\n") }));
}

/** Station ids sampled with a salinity. */
function sampled(inputs: WorkspaceInputs): Set<string> {
  return new Set(inputs.surveys.flatMap((s) => s.stations.filter((st) => st.salinity.accepted).map((st) => st.id)));
}

/** Both arms sampled: the river arm beyond Point San Pablo and South Bay (else there is no side arm to mistake). */
const bothArms = (ids: Set<string>): boolean =>
  [...ids].some((id) => RIVER_ARM.has(id)) && [...ids].some((id) => SOUTH_BAY.has(id));

/** Great-circle distance [km] (spherical Earth, R = 6371 km; common practice at this scale). */
function km(a: readonly [number, number], b: readonly [number, number]): number {
  const r = Math.PI / 180;
  const h =
    Math.sin(((b[1] - a[1]) * r) / 2) ** 2 +
    Math.cos(a[1] * r) * Math.cos(b[1] * r) * Math.sin(((b[0] - a[0]) * r) / 2) ** 2;
  return 2 * 6371 * Math.asin(Math.sqrt(h));
}

describe.skipIf(!present)(
  "mouth of a single-survey bay file (Schraga & Cloern 2017 data; common practice: the mouth is at the bay entrance, not in a side bay)",
  () => {
    it("2020–2022 exports cut into single surveys: every survey that samples the river arm and South Bay counts km from Central Bay (a station of 15–22 at 0 km), South Bay off the channel", () => {
      const checked: string[] = [];
      const wrong: string[] = [];
      for (const file of DISTANCE_FILES)
        for (const { date, content } of singleSurveys(file)) {
          const inputs = readInputs([{ name: `${date}.csv`, content }]);
          if (!bothArms(sampled(inputs))) continue;
          checked.push(date);
          const stations = inputs.surveys.flatMap((s) => s.stations) as Array<Station & { distanceKm?: number }>;
          const mouth = stations.find((st) => st.distanceKm === 0)?.id;
          // South Bay off the channel, unless its head is the survey's freshest water (then salinity makes it the river arm)
          const freshest = stations.reduce((a, b) =>
            (b.salinity.value ?? Infinity) < (a.salinity.value ?? Infinity) ? b : a,
          );
          const southOnChannel = stations.filter((st) => SOUTH_BAY.has(st.id) && st.distanceKm !== undefined);
          if (
            mouth === undefined ||
            !CENTRAL_BAY.includes(mouth) ||
            (!SOUTH_BAY.has(freshest.id) && southOnChannel.length > 0)
          )
            wrong.push(
              `${date}: mouth at station ${mouth}, South Bay on the channel: ${southOnChannel.map((s) => s.id)}`,
            );
        }
      // 11 full transects (Rio Vista to South Bay) and 14 cruises reaching San Pablo Bay or beyond
      expect(checked.length).toBe(25);
      // Two cruises that do not reach the river are still read wrongly, from salinity alone:
      // 2021-01-29: the head of South Bay is the freshest water (15.8, storm runoff) and the North-Bay arm ends at
      //   station 13 (28.6), so South Bay is taken for the river arm and the mouth is placed where its gradient ends.
      // 2021-07-30 (drought): South Bay is saltier than Central Bay (33.5 against 32.4) and its head barely fresher
      //   than its maximum, so nothing marks a second arm and the axis is oriented with the mouth at South Bay's head.
      expect(wrong.map((w) => w.slice(0, 10))).toEqual(["2021-01-29", "2021-07-30"]);
    }, 120_000);

    it("2016–2019 exports cut into single surveys with the station table: every survey that samples the river arm and South Bay gets a centerline whose mouth is in Central Bay", () => {
      const table = texts.get(TABLE_FILE)!;
      const positions = new Map(
        table
          .split(/\r?\n/)
          .slice(1)
          .map((l) => l.split(","))
          .map((c) => [c[0]!, [Number(c[3]), Number(c[2])] as const]),
      );
      const checked: string[] = [];
      const wrong: string[] = [];
      for (const file of TABLE_FILES)
        for (const { date, content } of singleSurveys(file)) {
          const inputs = readInputs(
            [
              { name: `${date}.csv`, content },
              { name: TABLE_FILE, content: table },
            ],
            { kindByFile: { [TABLE_FILE]: "stationTable" }, unitOverrides: UNITS },
          );
          if (!bothArms(sampled(inputs))) continue;
          checked.push(date);
          const mouth = inputs.channel?.network.branches[0]!.coordinates[0];
          const nearest =
            mouth === undefined
              ? undefined
              : [...positions].reduce((a, b) => (km(b[1], mouth) < km(a[1], mouth) ? b : a));
          if (nearest === undefined || !CENTRAL_BAY.includes(nearest[0]) || km(nearest[1], mouth!) > 3)
            wrong.push(`${date}: mouth ${mouth?.map((v) => v.toFixed(3))} nearest station ${nearest?.[0]}`);
        }
      expect(checked.length).toBe(42);
      // 2018-05-07: Central and South Bay equally salty (25.0–25.8); the line runs one station (25) past Potrero Point
      expect(wrong.map((w) => w.slice(0, 10))).toEqual(["2018-05-07"]);
    }, 240_000);
  },
);
