import { describe, it } from "vitest";
import { readdirSync, readFileSync } from "node:fs";
import { expectWithin } from "../helpers/tolerance.ts";
import { analyzeConstituent } from "../../analysis/mixing/analyzeConstituent.ts";
import type { MixingSample } from "../../analysis/mixing/options.ts";
import { stationSalinities, synthSamples } from "./helpers/synthetic.ts";

const S = stationSalinities(25);
const fe = synthSamples({ c0: 1000, cStar: 75, cSea: 2, sBreak: 15 }, S, 0.03, 9);

/** Every number anywhere in a value, to prove that no NaN or ±Infinity leaks out. */
function numbers(v: unknown, out: number[] = []): number[] {
  if (typeof v === "number") out.push(v);
  else if (Array.isArray(v)) v.forEach((x) => numbers(x, out));
  else if (v && typeof v === "object") Object.values(v).forEach((x) => numbers(x, out));
  return out;
}

describe("bootstrap determinism and intervals (Efron & Tibshirani 1993; seeded randomLcg)", () => {
  it("analyzeConstituent() with the same seed gives identical results and a different seed different intervals (common practice: reproducible bootstrap)", () => {
    const a = analyzeConstituent(fe, { name: "Fe", unit: "nmol/L", seed: 123, bootstrapDraws: 300 });
    const b = analyzeConstituent(fe, { name: "Fe", unit: "nmol/L", seed: 123, bootstrapDraws: 300 });
    const c = analyzeConstituent(fe, { name: "Fe", unit: "nmol/L", seed: 124, bootstrapDraws: 300 });
    expectWithin(JSON.stringify(a) === JSON.stringify(b) ? 1 : 0, 1, 0, "same seed → same JSON");
    expectWithin(
      a.effectiveEndmember!.lower === c.effectiveEndmember!.lower ? 0 : 1,
      1,
      0,
      "different seed → different lower limit",
    );
    expectWithin(a.bootstrap!.usable, 300, 15, "usable draws");
  });

  it("analyzeConstituent() 95 % band brackets the fitted curve and C*₀ interval brackets its value for a seeded Fe survey (percentile bootstrap, common practice)", () => {
    const r = analyzeConstituent(fe, { name: "Fe", unit: "nmol/L", seed: 1, bootstrapDraws: 400 });
    const f = r.fit!;
    const inside = f.conc.filter((v, i) => v >= f.lower[i]! - 1e-9 && v <= f.upper[i]! + 1e-9).length;
    expectWithin(inside / f.conc.length >= 0.9 ? 1 : 0, 1, 0, `${inside}/${f.conc.length} grid points inside the band`);
    const e = r.effectiveEndmember!;
    expectWithin(e.value >= e.lower && e.value <= e.upper ? 1 : 0, 1, 0, `C*₀ ${e.value} in [${e.lower}, ${e.upper}]`);
    expectWithin(f.salinity.length, 81, 0, "default grid points");
    expectWithin(f.derivative.length, 81, 0, "derivative on the grid");
  });
});

describe("degenerate inputs give insufficient-data with a message, never NaN (Brackline rules)", () => {
  const cases: Array<[string, MixingSample[]]> = [
    [
      "two stations",
      [
        { stationId: "a", salinity: 0, conc: 10, censored: false, accepted: true },
        { stationId: "b", salinity: 30, conc: 1, censored: false, accepted: true },
      ],
    ],
    [
      "no salinity range",
      S.map((_, i) => ({ stationId: `s${i}`, salinity: 12.3, conc: 5 + i, censored: false, accepted: true })),
    ],
    [
      "all below detection",
      S.map((s, i) => ({
        stationId: `s${i}`,
        salinity: s,
        conc: 0.025,
        censored: true,
        detectionLimit: 0.05,
        accepted: true,
      })),
    ],
    ["no samples", []],
    ["all rejected by QC", fe.map((x) => ({ ...x, accepted: false }))],
  ];
  it.each(cases)(
    "analyzeConstituent() with %s returns class insufficient-data, a warning and only finite numbers",
    (_, samples) => {
      const r = analyzeConstituent(samples, { name: "Cd", unit: "nmol/L", riverDischargeM3s: 100 });
      expectWithin(r.class === "insufficient-data" ? 1 : 0, 1, 0, `class ${r.class}`);
      expectWithin(
        r.warnings.some((w) => w.code === "insufficient-data" && w.message.length > 20) ? 1 : 0,
        1,
        0,
        "explaining warning",
      );
      expectWithin(numbers(r).every(Number.isFinite) ? 1 : 0, 1, 0, "all numbers finite");
    },
  );

  it("analyzeConstituent() with four stations keeps end-members and the dilution line but gives no class (MIN_STATIONS = 5)", () => {
    const four = [fe[0]!, fe[8]!, fe[16]!, fe[24]!];
    const r = analyzeConstituent(four, { name: "Fe", unit: "nmol/L" });
    expectWithin(r.class === "insufficient-data" ? 1 : 0, 1, 0, `class ${r.class}`);
    expectWithin(r.deviations.length, 4, 0, "deviations kept");
    expectWithin(r.dilutionLine ? 1 : 0, 1, 0, "dilution line kept");
  });

  it("analyzeConstituent() throws a RangeError naming function and option for a negative discharge (Brackline rules: caller mistakes throw)", () => {
    let msg = "";
    try {
      analyzeConstituent(fe, { name: "Fe", unit: "nmol/L", riverDischargeM3s: -5 });
    } catch (e) {
      msg = `${(e as Error).name}: ${(e as Error).message}`;
    }
    expectWithin(
      msg.includes("RangeError: analyzeConstituent: options.riverDischargeM3s") && msg.includes("-5") ? 1 : 0,
      1,
      0,
      msg,
    );
  });
});

describe("below-detection values (common practice: DL/2 substitution, stated, never zero)", () => {
  it("analyzeConstituent() replaces censored values by DL/2, weights them with σ = DL/√12 and says so in a warning", () => {
    const cd = synthSamples({ c0: 0.3, cStar: 0.9, cSea: 0.02, sBreak: 15 }, S, 0.03, 4).map((x) =>
      x.conc < 0.05 ? { ...x, conc: 0, censored: true, detectionLimit: 0.05 } : x,
    );
    const nCens = cd.filter((x) => x.censored).length;
    const r = analyzeConstituent(cd, { name: "Cd", unit: "nmol/L", bootstrapDraws: 0 });
    expectWithin(nCens > 0 ? 1 : 0, 1, 0, "some censored values in the test data");
    r.deviations
      .filter((d) => d.censored)
      .forEach((d) => expectWithin(d.observed, 0.025, 1e-15, `substitute at ${d.stationId}`));
    const w = r.warnings.find((x) => x.code === "censored-substituted");
    expectWithin(
      w && w.message.includes(String(nCens)) && w.message.includes("DL/2") ? 1 : 0,
      1,
      0,
      w?.message ?? "no warning",
    );
  });
});

describe("channel positions come through callbacks only (Brackline rule: mixing never imports geometry)", () => {
  it("analyzeConstituent() fills reaction-zone km through salinityToKm and the maximum km through salinityToKmPoint", () => {
    const ba = synthSamples({ c0: 170, cStar: 205, cSea: 45, sBreak: 10 }, stationSalinities(30), 0.01, 8);
    const calls: number[][] = [];
    const r = analyzeConstituent(ba, {
      name: "Ba",
      unit: "nmol/L",
      bootstrapDraws: 0,
      salinityToKm: (a, b) => {
        calls.push([a, b]);
        return [[-10 * Math.log(Math.max(b, 1e-3) / 35), -10 * Math.log(Math.max(a, 1e-3) / 35)]];
      },
      salinityToKmPoint: (s) => [-10 * Math.log(Math.max(s, 1e-3) / 35)],
    });
    expectWithin(calls.length >= 1 ? 1 : 0, 1, 0, "salinityToKm called");
    expectWithin(r.reactionZone!.km.length, 1, 0, "zone km intervals");
    expectWithin(
      r.maximum!.km[0]!,
      -10 * Math.log(r.maximum!.salinity.value / 35),
      1e-9,
      "maximum km from the callback",
    );
  });

  it("no file in analysis/mixing imports analysis/geometry", () => {
    const dir = new URL("../../analysis/mixing/", import.meta.url);
    const files = readdirSync(dir).filter((f) => f.endsWith(".ts"));
    expectWithin(files.length > 10 ? 1 : 0, 1, 0, `${files.length} mixing files found`);
    const offenders = files.filter((f) => /from\s+["'][^"']*geometry/.test(readFileSync(new URL(f, dir), "utf8")));
    expectWithin(offenders.length, 0, 0, `files importing geometry: ${offenders.join(", ")}`);
  });
});
