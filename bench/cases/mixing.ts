// Benchmark: full mixing analysis of a survey (40 stations × 12 constituents, 2,000 bootstrap draws).
import type { BenchCase, BenchRow } from "../benchCase.ts";
import { analyzeConstituent } from "../../analysis/mixing/analyzeConstituent.ts";
import type { MixingSample } from "../../analysis/mixing/options.ts";
import { stationSalinities, synthSamples, type SyntheticSpec } from "../../tests/mixing/helpers/synthetic.ts";

const SPECS: Array<[string, string, SyntheticSpec]> = [
  ["Fe", "nmol/L", { c0: 1000, cStar: 75, cSea: 2, sBreak: 15 }],
  ["Mn", "nmol/L", { c0: 300, cStar: 180, cSea: 3, sBreak: 12 }],
  ["Cu", "nmol/L", { c0: 20, cStar: 12, cSea: 2, sBreak: 15 }],
  ["Ni", "nmol/L", { c0: 12, cStar: 7.5, cSea: 3, sBreak: 15 }],
  ["Cd", "nmol/L", { c0: 0.3, cStar: 0.9, cSea: 0.1, sBreak: 15 }],
  ["Ba", "nmol/L", { c0: 170, cStar: 205, cSea: 45, sBreak: 10 }],
  ["Si", "µmol/L", { c0: 150, cStar: 150, cSea: 5, sBreak: 1 }],
  ["Al", "nmol/L", { c0: 1200, cStar: 900, cSea: 10, sBreak: 15 }],
  ["NO3", "µmol/L", { c0: 80, cStar: 80, cSea: 1, sBreak: 1 }],
  ["PO4", "µmol/L", { c0: 2, cStar: 2.6, cSea: 0.2, sBreak: 10 }],
  ["Co", "nmol/L", { c0: 3, cStar: 2.7, cSea: 0.05, sBreak: 15 }],
  ["U", "nmol/L", { c0: 1, cStar: 1, cSea: 13, sBreak: 1 }],
];

function survey(): Array<{ name: string; unit: string; samples: MixingSample[] }> {
  const s = stationSalinities(40);
  return SPECS.map(([name, unit, spec], i) => ({ name, unit, samples: synthSamples(spec, s, 0.03, 100 + i) }));
}

function runAll(data: ReturnType<typeof survey>, draws: number): number {
  let checksum = 0;
  for (const c of data) {
    const r = analyzeConstituent(c.samples, {
      name: c.name,
      unit: c.unit,
      bootstrapDraws: draws,
      seed: 42,
      riverDischargeM3s: 100,
    });
    checksum += r.effectiveEndmember?.value ?? 0;
  }
  return checksum;
}

/** Median wall-clock and process CPU time [ms] over `reps` runs (CPU time is less sensitive to a busy machine). */
function medianMs(fn: () => void, reps: number): { wall: number; cpu: number } {
  const t: number[] = [];
  const c: number[] = [];
  for (let i = 0; i < reps; i++) {
    const c0 = process.cpuUsage();
    const t0 = performance.now();
    fn();
    t.push(performance.now() - t0);
    const du = process.cpuUsage(c0);
    c.push((du.user + du.system) / 1000);
  }
  t.sort((a, b) => a - b);
  c.sort((a, b) => a - b);
  return { wall: t[Math.floor(reps / 2)]!, cpu: c[Math.floor(reps / 2)]! };
}

/** Full survey analysis with a 2,000-draw bootstrap; baseline = the same analysis with 1 draw. */
export const mixingBench: BenchCase = {
  name: "mixing",
  async run(): Promise<BenchRow[]> {
    const data = survey();
    runAll(data, 50); // warm-up (JIT)
    const fullT = medianMs(() => runAll(data, 2000), 5);
    const singleT = medianMs(() => runAll(data, 1), 5);
    const full = fullT.wall / 1000;
    const single = singleT.wall / 1000;
    return [
      {
        name: "mixing: 40 stations × 12 constituents, 2,000-draw bootstrap",
        value: full,
        unit: "s",
        baseline: { name: "same analysis, 1 draw", value: single },
        ratio: full / single,
        ratioLabel: "× (cost of the bootstrap)",
        goal: "≤ 0.3 s in Node",
        note: `CPU time ${(fullT.cpu / 1000).toFixed(3)} s (1 draw: ${(singleT.cpu / 1000).toFixed(3)} s); ${(((full - single) / (12 * 2000)) * 1e6).toFixed(1)} µs wall per draw per constituent`,
      },
    ];
  },
};
