import { readFileSync } from "node:fs";
import { nearestPointOnLine } from "@turf/nearest-point-on-line";
import { lineString, point } from "@turf/turf";
import Papa from "papaparse";
import { describe, expect, it } from "vitest";
import { expectWithin } from "../helpers/tolerance.ts";

const read = (rel: string) => readFileSync(new URL(`../../data-demo/${rel}`, import.meta.url), "utf8");
const truth = JSON.parse(read("truth.json")) as {
  surveys: Record<
    string,
    {
      offChannelStation: string | null;
      stations: Array<{ station: string; alongChannelKm: number; offsetM: number; offChannel: boolean }>;
    }
  >;
};
const centerline = JSON.parse(read("centerline.geojson")) as {
  features: Array<{ properties: { role: string }; geometry: { coordinates: [number, number][] } }>;
};
const main = lineString(centerline.features.find((f) => f.properties.role === "main")!.geometry.coordinates);
const rows = Papa.parse<Record<string, string>>(read("surveys/both-surveys.csv"), {
  header: true,
  skipEmptyLines: true,
}).data;

describe("demo truth.json station geometry agrees with an independent projection (@turf/nearest-point-on-line)", () => {
  it("alongChannelKm (within 30 m: offsets are perpendicular to the local segment, so near a bend vertex the nearest point shifts) and |offsetM| (within 5 m) match turf's nearest point on the main stem", () => {
    let checked = 0;
    for (const [id, s] of Object.entries(truth.surveys)) {
      for (const st of s.stations) {
        const row = rows.find((r) => r.survey === id && r.station === st.station);
        expect(row, st.station).toBeDefined();
        if (!row || st.offChannel) continue;
        const snapped = nearestPointOnLine(main, point([Number(row.longitude), Number(row.latitude)]), {
          units: "kilometers",
        });
        expectWithin(snapped.properties.location, st.alongChannelKm, 0.03, `${st.station} along-channel km`);
        expectWithin(snapped.properties.dist * 1000, Math.abs(st.offsetM), 5, `${st.station} offset m`);
        checked++;
      }
    }
    expectWithin(checked, 63, 0, "stations checked (all but the off-channel one)");
  });

  it("exactly one station is marked off-channel and truth names it per survey", () => {
    const off = Object.values(truth.surveys).flatMap((s) => s.stations.filter((st) => st.offChannel));
    expect(off.map((s) => s.station)).toEqual(["D12"]);
    expect(truth.surveys["dry-2025-09"].offChannelStation).toBe("D12");
    expect(truth.surveys["wet-2025-03"].offChannelStation).toBeNull();
  });
});
