import { describe, expect, it } from "vitest";
import {
  analyzeSurvey,
  binUnderway,
  binsToSurvey,
  buildChannelNetwork,
  decimatePoints,
  projectUnderway,
  readUnderwayText,
} from "../../analysis/index.ts";
import { expectWithin } from "../helpers/tolerance.ts";
import { inventedChannel, underwayCsv } from "../../bench/fixtures/underwayLog.ts";

// Six records on a straight north-running channel (mouth at 35.0 N): km ≈ 0.1, 0.3, 0.6, 0.9, 1.2, 1.4.
const LINE = {
  type: "LineString" as const,
  coordinates: [[-76, 35] as [number, number], [-76, 35.1] as [number, number]],
};
const TEXT = [
  "time,lat,lon,salinity,temperature (°C),fluorescence (RFU)",
  "2026-05-04T10:00:00Z,35.0009,-76,10,20,1",
  "2026-05-04T10:00:01Z,35.0027,-76,12,21,2",
  "2026-05-04T10:00:02Z,35.0054,-76,14,22,NA",
  "2026-05-04T10:00:03Z,35.0081,-76,16,23,4",
  "2026-05-04T10:00:04Z,35.0108,-76,18,24,5",
  "2026-05-04T10:00:05Z,35.0126,-76,20,25,7",
].join("\n");

describe("binUnderway() against hand-computed statistics (common practice: mean, sample sd with n − 1)", () => {
  const r = readUnderwayText(TEXT, { fileName: "six.csv" });
  const net = buildChannelNetwork(LINE, { mouth: "start" });
  const p = projectUnderway(r.data, net);

  it("bins by 0.5 km: {10,12}, {14,16}, {18,20} with means 11, 15, 19 and sd √2", () => {
    const b = binUnderway(r.data, p, { by: "km", width: 0.5 });
    expect(b.bins.map((x) => [x.lower, x.upper, x.n])).toEqual([
      [0, 0.5, 2],
      [0.5, 1, 2],
      [1, 1.5, 2],
    ]);
    const s = b.bins.map((x) => x.stats.salinity!);
    expect(s.map((x) => x.mean)).toEqual([11, 15, 19]);
    for (const x of s) expectWithin(x.sd, Math.SQRT2, 1e-12, "sd of two values 2 apart = √2");
    expect([s[1]!.min, s[1]!.max]).toEqual([14, 16]);
    // fluorescence: bin 2 has one value (the other is NA) → n 1, no sd
    expect(b.bins[1]!.stats.fluorescence).toEqual({ n: 1, mean: 4, sd: undefined, min: 4, max: 4 });
    expect(b.bins[0]!.startMs).toBe(Date.UTC(2026, 4, 4, 10));
  });

  it("bins in salinity classes of width 5: [10,15) n 3 mean 12 sd 2; [15,20) n 2 mean 17; [20,25) n 1", () => {
    const b = binUnderway(r.data, p, { by: "salinity", width: 5 });
    expect(b.bins.map((x) => x.n)).toEqual([3, 2, 1]);
    expect(b.bins[0]!.stats.salinity!.mean).toBe(12);
    expectWithin(b.bins[0]!.stats.salinity!.sd, 2, 1e-12, "sd of 10, 12, 14 = 2");
    expectWithin(b.bins[0]!.stats.temperatureC!.mean, 21, 1e-12, "mean of 20, 21, 22");
    expectWithin(b.bins[1]!.stats.fluorescence!.mean, 4.5, 1e-12, "mean of 4, 5");
    expectWithin(
      b.bins[0]!.meanKm,
      (p.alongChannelKm[0]! + p.alongChannelKm[1]! + p.alongChannelKm[2]!) / 3,
      1e-12,
      "mean km",
    );
  });

  it("leaves out records beyond maxOffsetM and counts them", () => {
    const b = binUnderway(r.data, p, { by: "salinity", width: 5, maxOffsetM: -1 });
    expect(b.bins).toEqual([]);
    expect(b.recordsOutside).toBe(6);
  });

  it("throws RangeError naming binUnderway for width 0 and TypeError for km without a projection", () => {
    expect(() => binUnderway(r.data, p, { by: "km", width: 0 })).toThrow(/binUnderway\(\): options.width/);
    expect(() => binUnderway(r.data, undefined, { by: "km", width: 1 })).toThrow(TypeError);
  });
});

describe("binsToSurvey() round trip into analyzeSurvey()", () => {
  it("gives one station per bin with 'mean of n records' originals, and a tracer linear in salinity classifies as conservative (Boyle et al. 1974 dilution line)", () => {
    const lines = ["time,lat,lon,salinity,fluorescence (RFU)"];
    let k = 0;
    for (let s = 0; s <= 30; s += 0.25) {
      const lat = 35 + (30 - s) * 0.002;
      lines.push(
        `${new Date(Date.UTC(2026, 4, 4, 10, 0, k++)).toISOString()},${lat.toFixed(5)},-76,${s},${(10 - 0.25 * s).toFixed(4)}`,
      );
    }
    const r = readUnderwayText(lines.join("\n"), { fileName: "lin.csv" });
    const net = buildChannelNetwork(LINE, { mouth: "start" });
    const bins = binUnderway(r.data, projectUnderway(r.data, net), { by: "salinity", width: 2 });
    const survey = binsToSurvey(bins, { fileName: "lin.csv" });
    expect(survey.stations).toHaveLength(bins.bins.length);
    expect(survey.constituents).toEqual([{ name: "fluorescence", unit: "RFU", header: "fluorescence" }]);
    expect(survey.stations[0]!.salinity.original).toMatch(/^mean of 8 records, sd /);
    expect(survey.stations[0]!.id).toBe("S 0–2");
    const a = analyzeSurvey(survey, { network: net, bootstrapDraws: 200, seed: 1 });
    const fl = a.constituents.find((c) => c.name === "fluorescence")!;
    expect(fl.class).toBe("conservative");
    expectWithin(fl.dilutionLine?.slope, -0.25, 1e-6, "slope of C = 10 − 0.25 S");
  });
});

describe("decimatePoints()", () => {
  const r = readUnderwayText(underwayCsv(20_000, 5), { fileName: "log.csv" });
  const sal = r.data.columns[0]!.values;

  it("returns at most maxPoints points whose counts add up to every point considered", () => {
    for (const maxPoints of [1, 10, 500, 5000]) {
      const d = decimatePoints(r.data.lonDeg, r.data.latDeg, [sal], { maxPoints });
      expect(d.count.length).toBeLessThanOrEqual(maxPoints);
      expect(d.count.reduce((a, b) => a + b, 0)).toBe(20_000);
      expect(d.considered).toBe(20_000);
    }
  });

  it("keeps the overall mean: count-weighted cell means equal the mean of all values within 1e-9", () => {
    const d = decimatePoints(r.data.lonDeg, r.data.latDeg, [sal], { maxPoints: 300 });
    let s = 0;
    for (let c = 0; c < d.count.length; c++) s += d.count[c]! * d.values[0]![c]!;
    const mean = sal.reduce((a, b) => a + b, 0) / sal.length;
    expectWithin(s / 20_000, mean, 1e-9, "weighted mean of cell means");
  });

  it("keeps only points inside the bounds and skips NaN positions", () => {
    const lon = new Float64Array([0, 1, Number.NaN, 5]);
    const lat = new Float64Array([0, 1, 1, 5]);
    const d = decimatePoints(lon, lat, [], { maxPoints: 10, bounds: [-1, -1, 2, 2] });
    expect(d.considered).toBe(2);
    expect(Array.from(d.count)).toEqual([1, 1]);
  });

  it("is deterministic: identical input gives identical output", () => {
    const a = decimatePoints(r.data.lonDeg, r.data.latDeg, [sal], { maxPoints: 1000 });
    const b = decimatePoints(r.data.lonDeg, r.data.latDeg, [sal], { maxPoints: 1000 });
    expect(Array.from(a.lonDeg)).toEqual(Array.from(b.lonDeg));
    expect(Array.from(a.values[0]!)).toEqual(Array.from(b.values[0]!));
  });

  it("throws RangeError for maxPoints 0 and for arrays of different length", () => {
    expect(() => decimatePoints(new Float64Array(1), new Float64Array(1), [], { maxPoints: 0 })).toThrow(RangeError);
    expect(() => decimatePoints(new Float64Array(1), new Float64Array(2), [], { maxPoints: 1 })).toThrow(/same length/);
  });
});

describe("underway pipeline determinism", () => {
  it("reading, projecting and binning the same invented log twice gives identical bins", () => {
    const net = buildChannelNetwork(inventedChannel(), { mouth: "start" });
    const run = () => {
      const r = readUnderwayText(underwayCsv(8000, 9), { fileName: "log.csv" });
      return binUnderway(r.data, projectUnderway(r.data, net), { by: "km", width: 1 });
    };
    expect(JSON.stringify(run())).toBe(JSON.stringify(run()));
  });
});
