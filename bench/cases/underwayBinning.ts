// Benchmark: project 1e6 invented underway records onto the channel and bin them (0.5 km and
// salinity classes of 1), against the projection alone, measured in the same run.
import type { BenchCase, BenchRow } from "../benchCase.ts";
import { buildChannelNetwork } from "../../analysis/geometry/buildNetwork.ts";
import { projectLonLatArrays } from "../../analysis/geometry/projectBulk.ts";
import { projectUnderway } from "../../analysis/underway/projectUnderway.ts";
import { binUnderway } from "../../analysis/underway/binUnderway.ts";
import { decimatePoints } from "../../analysis/underway/decimatePoints.ts";
import { inventedChannel, inventedUnderwayData } from "../fixtures/underwayLog.ts";

const N = 1_000_000;

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)]!;
}

export const underwayBinningBench: BenchCase = {
  name: "underway-binning",
  async run(): Promise<BenchRow[]> {
    const net = buildChannelNetwork(inventedChannel(), { mouth: "start" });
    const data = inventedUnderwayData(N, 20261202);
    projectUnderway(data, net); // warm-up (JIT)
    const proj: number[] = [];
    const full: number[] = [];
    const dec: number[] = [];
    let bins = 0;
    let points = 0;
    for (let rep = 0; rep < 3; rep++) {
      let t0 = performance.now();
      projectLonLatArrays(net, data.lonDeg, data.latDeg);
      proj.push(performance.now() - t0);
      t0 = performance.now();
      const p = projectUnderway(data, net);
      bins =
        binUnderway(data, p, { by: "km", width: 0.5 }).bins.length +
        binUnderway(data, p, { by: "salinity", width: 1 }).bins.length;
      full.push(performance.now() - t0);
      t0 = performance.now();
      points = decimatePoints(data.lonDeg, data.latDeg, [data.columns[0]!.values], { maxPoints: 20_000 }).count.length;
      dec.push(performance.now() - t0);
    }
    const [a, b, d] = [median(full) / 1000, median(proj) / 1000, median(dec) / 1000];
    return [
      {
        name: "project + bin 1e6 underway records (0.5 km bins and salinity classes of 1)",
        value: a,
        unit: "s",
        baseline: { name: "projectLonLatArrays alone", value: b },
        ratio: a / b,
        ratioLabel: "× the projection alone",
        goal: "binning adds little to the projection",
        note: `${bins} bins; wall = median of 3`,
      },
      {
        name: "aggregate 1e6 records to ≤ 20,000 map points (Web Mercator grid)",
        value: d,
        unit: "s",
        baseline: { name: "projectLonLatArrays alone", value: b },
        ratio: d / b,
        ratioLabel: "× the projection alone",
        goal: "map never draws more than the software-WebGL budget",
        note: `${points} points drawn; wall = median of 3`,
      },
    ];
  },
};
