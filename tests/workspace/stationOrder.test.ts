/**
 * The station list follows the channel (common practice: a list follows the transect, not the row
 * order of the export): on-channel stations by km from the mouth, then side-arm stations, then other
 * off-channel stations, then those without a position (analysis/workspace/stationOrder.ts).
 */
import { readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { analyzeInputs, readInputs, stationListOrder, type StationPlacement } from "../../analysis/index.ts";
import { readIfExists, sharedData } from "../io/helpers/paths.ts";

const at = (id: string, p: Partial<StationPlacement>): StationPlacement => ({ id, offChannel: false, ...p });

describe("stationListOrder()", () => {
  it("orders by km from the mouth, side arm next, far-off stations by distance, unplaced last; ties keep file order", () => {
    const order = stationListOrder([
      at("unplaced", {}),
      at("far", { offChannel: true, offsetM: -5200 }),
      at("arm-12", { offChannel: true, sideArmKm: 12 }),
      at("km-40", { alongChannelKm: 40 }),
      at("near", { offChannel: true, offsetM: 2500 }),
      at("km-0", { alongChannelKm: 0 }),
      at("arm-3", { offChannel: true, sideArmKm: 3 }),
      at("km-40b", { alongChannelKm: 40 }),
      at("unplaced-2", {}),
    ]);
    expect(order).toEqual(["km-0", "km-40", "km-40b", "arm-3", "arm-12", "near", "far", "unplaced", "unplaced-2"]);
  });

  it("keeps the file order of a survey with nothing placed", () => {
    expect(stationListOrder([at("b", {}), at("a", {}), at("c", {})])).toEqual(["b", "a", "c"]);
  });
});

// Real data, read at test time (never copied into the repository): USGS San Francisco Bay water-quality
// cruises (public domain; Schraga & Cloern 2017, Sci. Data 4:170098), ../shared/data/usgs-sfbay-2016-2022/
// SOURCE.md. The 2018 export lists the South-Bay stations (36 … 21) before the North-Bay channel.
const FILE = path.join(sharedData, "usgs-sfbay-2016-2022", "2018SanFranciscoBayWaterQualityData.csv");
const TABLE = path.join(sharedData, "usgs-sfbay-2016-2022", "USGSSFBayStations_from_xlsx.csv");
const present = [FILE, TABLE].every((f) => readIfExists(f) !== undefined);
if (!present) console.warn(`${FILE} absent (../shared not mounted): real-data station order test skipped`);

describe.skipIf(!present)("stationListOrder() on the 2018 San Francisco Bay cruise export (no centerline)", () => {
  it("with its station table, lists the North-Bay channel from the mouth up the river first and the South-Bay stations after it", () => {
    const inputs = readInputs(
      [FILE, TABLE].map((f) => ({ name: f, content: new Uint8Array(readFileSync(f)) })),
      {},
    );
    const result = analyzeInputs(inputs, { bootstrapDraws: 20, seed: 1, surveys: [inputs.surveys[0]!.name] })
      .surveys[0]!;
    const placements = result.analysis.stations;
    const byId = new Map(placements.map((p) => [p.id, p]));
    const order = stationListOrder(placements);
    expect(new Set(order).size).toBe(placements.length);
    const firstOff = order.findIndex((id) => byId.get(id)!.offChannel);
    expect(firstOff).toBeGreaterThan(0);
    const on = order.slice(0, firstOff).map((id) => byId.get(id)!);
    // Every on-channel station before any off-channel one, in ascending km.
    for (const p of order.slice(firstOff).map((id) => byId.get(id)!)) expect(p.offChannel).toBe(true);
    for (let i = 1; i < on.length; i++)
      expect(on[i]!.alongChannelKm!).toBeGreaterThanOrEqual(on[i - 1]!.alongChannelKm!);
    // South Bay (stations 21–36, SOURCE.md) is off this channel and comes after it.
    const south = order.filter((id) => Number(id) >= 21 && Number(id) <= 36);
    expect(south.length).toBeGreaterThan(10);
    for (const id of south) expect(order.indexOf(id)).toBeGreaterThanOrEqual(firstOff);
  });
});
