import { existsSync, readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import Papa from "papaparse";
import { expectWithin } from "../helpers/tolerance.ts";
import { buildChannelNetwork } from "../../analysis/geometry/buildNetwork.ts";
import { projectStations } from "../../analysis/geometry/projectStations.ts";

// Real data: USGS San Francisco Bay water-quality cruises (Schraga, T.S. & Cloern, J.E. 2017,
// Sci. Data 4:170098), files in ../shared/data/usgs-sfbay-2016-2022 (see its SOURCE.md).
const DIR = "../shared/data/usgs-sfbay-2016-2022";
const exists = existsSync(`${DIR}/wqdata21.csv`) && existsSync(`${DIR}/USGSSFBayStations_from_xlsx.csv`);
if (!exists) console.log(`tests/geometry/realData.test.ts: ${DIR} not found; real-data checks skipped`);

function readCsv(path: string): Record<string, string>[] {
  return Papa.parse<Record<string, string>>(readFileSync(path, "utf8"), { header: true, skipEmptyLines: true }).data;
}

describe.skipIf(!exists)(
  "chainage against published along-channel distances (USGS San Francisco Bay, Schraga & Cloern 2017)",
  () => {
    it("projectStations() chainage from station 36 along a station-to-station centerline is within 4 % (or 0.5 km; a chord through rounded station positions, not the deep-channel path) of the published 'Distance from Sta. 36 (km)', and the whole chord path is not longer than the published channel path", () => {
      const positions = new Map(
        readCsv(`${DIR}/USGSSFBayStations_from_xlsx.csv`).map((r) => [
          Number(r["Station"]),
          [Number(r["Longitude degree"]), Number(r["Latitude degree"])] as [number, number],
        ]),
      );
      const published = new Map<number, number>();
      for (const r of readCsv(`${DIR}/wqdata21.csv`))
        published.set(Number(r["Station"]), Number(r["Distance from Sta. 36 (km)"]));
      const stations = [...published.entries()].filter(([id]) => positions.has(id)).sort((a, b) => a[1] - b[1]);
      expect(stations.length).toBeGreaterThan(30);
      const line = stations.map(([id]) => positions.get(id)!);
      // a chord path through the stations; station 36 is the origin of the published distance
      const net = buildChannelNetwork({ type: "LineString", coordinates: line }, { mouth: positions.get(36)! });
      const r = projectStations(
        net,
        stations.map(([id]) => ({ id: String(id), lonLat: positions.get(id)! })),
      );
      const last = stations[stations.length - 1]!;
      expect(net.totalLengthKm, `chord path vs published ${last[1]} km to station ${last[0]}`).toBeLessThanOrEqual(
        last[1],
      );
      r.projections.forEach((p, i) => {
        const pub = stations[i]![1];
        expectWithin(p.alongChannelKm, pub, Math.max(0.04 * pub, 0.5), `station ${p.id} (published ${pub} km)`);
        expectWithin(p.offsetM, 0, 1e-6, `offset of station ${p.id} (a vertex of the line)`);
      });
    });
  },
);
