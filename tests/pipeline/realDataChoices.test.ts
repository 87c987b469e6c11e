import { describe, expect, it } from "vitest";
import {
  analyzeSurvey,
  buildChannelNetwork,
  centerlineFromStations,
  distancesFromMouth,
  networkWithMouth,
} from "../../analysis/index.ts";
import type { Station, Survey, ValueCell } from "../../analysis/index.ts";
import { expectWithin } from "../helpers/tolerance.ts";

const cell = (value: number): ValueCell => ({ value, original: String(value), status: "measured", accepted: true });

/** A straight channel along the equator from lon 0 (river) to lon 0.5 (sea), ~55 km. */
const LINE = {
  type: "LineString" as const,
  coordinates: [
    [0, 0],
    [0.5, 0],
  ],
};

/** Conservative silicate on the channel; an off-channel basin 20 km away with sea-like salinity and high silicate. */
function survey(): Survey {
  const stations: Station[] = [];
  for (let i = 0; i <= 10; i++) {
    const s = 3 * i;
    stations.push({
      id: `C${i}`,
      lonLat: [0.05 * i, 0],
      salinity: cell(s),
      values: { Si: cell(200 - 6 * s), O2: cell(8 + 0.05 * s) },
      sourceRow: i + 2,
      sourceFile: "t.csv",
    });
  }
  for (let j = 0; j < 3; j++)
    stations.push({
      id: `B${j}`,
      lonLat: [0.45, 0.18 + 0.01 * j],
      salinity: cell(31 + j),
      values: { Si: cell(150), O2: cell(6) },
      sourceRow: 20 + j,
      sourceFile: "t.csv",
    });
  return {
    name: "t",
    stations,
    constituents: [
      { name: "Si", unit: "µmol/L", header: "Si" },
      { name: "O2", unit: "mg/L", header: "O2", kind: "nonMixing", kindReason: "gas" },
    ],
  };
}

describe("off-channel stations (a side basin beyond the 2 km default; common practice)", () => {
  const network = buildChannelNetwork(LINE, { mouth: "end" });
  it("are left out of the fits and end-members and listed; the basin gives no false silicate addition", () => {
    const a = analyzeSurvey(survey(), { network, bootstrapDraws: 100, seed: 1 });
    expect(a.offChannelStations?.map((o) => o.id)).toEqual(["B0", "B1", "B2"]);
    expect(a.offChannelStations![0]!.distanceKm).toBeGreaterThan(15);
    const si = a.constituents.find((c) => c.name === "Si")!;
    expect(si.class).toBe("conservative");
    expect(si.endmembers!.sea.stationIds.some((id) => id.startsWith("B"))).toBe(false);
    expect(a.warnings.find((w) => w.code === "offChannel")?.message).toContain("--keep-off-channel");
  });
  it("are kept with keepOffChannel, and a larger limit puts them back on the channel", () => {
    const kept = analyzeSurvey(survey(), { network, bootstrapDraws: 100, keepOffChannel: true });
    expect(kept.offChannel).toEqual({ limitKm: 2, kept: true });
    expect(kept.constituents[0]!.endmembers!.sea.stationIds.some((id) => id.startsWith("B"))).toBe(true);
    const wide = analyzeSurvey(survey(), { network, bootstrapDraws: 100, offChannelThresholdM: 30_000 });
    expect(wide.offChannelStations).toEqual([]);
  });
});

describe("non-mixing variables (Officer 1979: mixing diagrams are for dissolved, non-reactive-gas constituents)", () => {
  const network = buildChannelNetwork(LINE, { mouth: "end" });
  it("oxygen is plotted along the channel without end-members, unless the user asks to analyse it", () => {
    const a = analyzeSurvey(survey(), { network, bootstrapDraws: 50 });
    expect(a.constituents.map((c) => c.name)).toEqual(["Si"]);
    expect(a.variables?.[0]).toMatchObject({ name: "O2", unit: "mg/L", kind: "nonMixing" });
    expect(a.variables![0]!.points.length).toBe(14);
    const asked = analyzeSurvey(survey(), { network, bootstrapDraws: 50, analyseAsTracers: ["O2"] });
    expect(asked.constituents.map((c) => c.name)).toEqual(["Si", "O2"]);
  });
});

describe("mouth from salinity (Spearman 1904 rank correlation)", () => {
  const evidence = survey().stations.map((s) => ({ lonLat: s.lonLat, salinity: s.salinity.value }));
  it("networkWithMouth() suggests the saltier end and names the CLI flag and the dashboard control", () => {
    const r = networkWithMouth(LINE, undefined, evidence);
    expect(r.mouthChoice).toBe("suggested");
    expectWithin(r.network.mouthLonLat[0], 0.5, 1e-9, "mouth at the sea end");
    expect(r.notice?.message).toContain("--mouth");
    expect(r.notice?.message).toContain("Mouth control");
    expect(r.network.warnings.map((w) => w.code)).not.toContain("mouthAssumed");
  });
  it("a stated mouth is kept; the unstated-mouth warning names no internal function", () => {
    expect(networkWithMouth(LINE, "start", evidence).network.mouthLonLat[0]).toBe(0);
    const w = buildChannelNetwork(LINE).warnings.find((x) => x.code === "mouthAssumed")!;
    expect(w.message).not.toMatch(/suggestMouth|options\.mouth/);
    expect(w.message).toContain("--mouth");
  });
});

describe("centerline from stations", () => {
  it("orders stations up the salinity gradient, leaves a fresher side basin off the line, and cuts a saltier basin that turns off the axis past the sea end; mouth at the line's end", () => {
    const st = survey().stations.map((s) => ({ id: s.id, lonLat: s.lonLat, salinity: s.salinity.value }));
    // a side basin fresher than the sea end, beside the middle of the channel
    st.push({ id: "X", lonLat: [0.25, 0.3], salinity: 20 });
    const line = centerlineFromStations(st)!;
    expect(line.properties.stationIds[0]).toBe("C0");
    // the basin B0–B2 (20 km north of the sea end, salinity 31–33) is a side bay beyond the mouth, not the channel
    expect(line.properties.stationIds.at(-1)).toBe("C10");
    expect(line.properties.pastMouth).toEqual(["B0", "B1", "B2"]);
    expect(line.properties.leftOut).toContain("X");
    // without the basin the line runs to the saltiest station
    const channelOnly = centerlineFromStations(st.filter((s) => !s.id.startsWith("B")))!;
    expect(channelOnly.properties.stationIds.at(-1)).toBe("C10");
    expect(channelOnly.properties.pastMouth).toBeUndefined();
    expect(line.properties.mouth).toBe("end");
    const net = buildChannelNetwork(line);
    expect(net.mouthSource).toBe("end");
    expect(centerlineFromStations([{ id: "a", lonLat: [0, 0], salinity: 1 }])).toBeUndefined();
  });
});

describe("station distances without a centerline", () => {
  it("distancesFromMouth() counts from the saltier end and says so", () => {
    const s = survey();
    const stations = s.stations.map((x, i) => ({ ...x, lonLat: undefined, distanceKm: i * 5 }));
    const r = distancesFromMouth([{ ...s, stations }]);
    const km = (r.surveys[0]!.stations as Array<Station & { distanceKm?: number }>).map((x) => x.distanceKm);
    expect(km[0]).toBe(65);
    expect(km.at(-1)).toBe(0);
    expect(r.notice?.code).toBe("distanceOrigin");
  });
});
