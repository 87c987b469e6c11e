import { describe, it } from "vitest";
import { expectWithin, expectWithinRel } from "../helpers/tolerance.ts";
import { effectiveEndmemberAt, percentChange } from "../../analysis/mixing/effectiveEndmember.ts";
import { analyzeConstituent } from "../../analysis/mixing/analyzeConstituent.ts";
import { CASES, caseBConc, samplesOf } from "./helpers/cases.ts";

const B = CASES.caseB;
const C = CASES.caseC;
const dB = (s: number): number => (0.005 - 1) / 35 + (s < 15 ? (-27 / 15) * (1 - s / 15) ** 2 : 0);

describe("effective river end-member by the tangent method (Boyle et al. 1974, Eq. 3)", () => {
  it("effectiveEndmemberAt() reproduces the local C*₀(S) table of the Fe flocculation curve (derived Fe flocculation case C = 1 − 0.995·S/35 + 9·(1 − S/15)³, Boyle et al. 1974 tangent) within 1e-6", () => {
    B.inputs.salinity.forEach((s, i) => {
      expectWithin(
        effectiveEndmemberAt(caseBConc(s), dB(s), s, 0),
        B.expected.localEffective[i]!,
        B.tol.table!,
        `C*₀(${s})`,
      );
      expectWithin(caseBConc(s), B.inputs.conc[i]!, B.tol.table!, `C(${s}) of the tabulated curve`);
    });
  });

  it("effectiveEndmemberAt() two-point form (C_a·S_b − C_b·S_a)/(S_b − S_a) at S = 20 and 30 gives 1.000 (derived Fe flocculation case C = 1 − 0.995·S/35 + 9·(1 − S/15)³, Boyle et al. 1974 tangent)", () => {
    const [ca, cb] = [caseBConc(20), caseBConc(30)];
    const slope = (cb - ca) / 10;
    expectWithin(effectiveEndmemberAt(ca, slope, 20), 1, 1e-12, "two-point C*₀");
    expectWithin(
      effectiveEndmemberAt(ca, slope, 20),
      (ca * 30 - cb * 20) / (30 - 20),
      1e-12,
      "equals the printed two-point formula",
    );
  });

  it("analyzeConstituent() finds the seaward segment S ≥ 15 and C*₀ = 1.000000 µmol/kg within 1e-6 (Boyle et al. 1974; derived Fe flocculation case C = 1 − 0.995·S/35 + 9·(1 − S/15)³, Boyle et al. 1974 tangent)", () => {
    const r = analyzeConstituent(samplesOf(B.inputs.salinity, B.inputs.salinity.map(caseBConc)), {
      name: "Fe",
      unit: "µmol/kg",
      riverDischargeM3s: B.inputs.dischargeM3s,
      seed: 3,
    });
    expectWithin(r.tangent?.fromSalinity, 15, 0, "segment start");
    expectWithin(r.tangent?.slope, B.expected.segmentSlope!, 1e-8, "segment slope");
    // Two-phase joint fit (issue 14): the seaward line shares parameters with the landward phase, exact to ~1e-8 on exact data.
    expectWithin(r.effectiveEndmember?.value, B.expected.effective!, 1e-6, "C*₀");
    expectWithin(r.percentChange?.value, B.expected.percentChange!, 1e-4, "% change (negative = removal)");
    expectWithin(r.class === "removal-then-conservative" ? 1 : 0, 1, 0, `class ${r.class}`);
  });

  it("analyzeConstituent() fluxes with Q = 100 m³/s: 1000 / 100 / −900 mmol/s and 8.64 kmol/d, 3.154e6 mol/yr (derived Fe flocculation case C = 1 − 0.995·S/35 + 9·(1 − S/15)³, Boyle et al. 1974 tangent)", () => {
    const r = analyzeConstituent(samplesOf(B.inputs.salinity, B.inputs.salinity.map(caseBConc)), {
      name: "Fe",
      unit: "µmol/kg",
      riverDischargeM3s: 100,
      bootstrapDraws: 200,
      seed: 3,
    });
    const f = r.flux!;
    // C₀ is the fitted curve at S = 0 (river end-member extrapolated along the curve, issue 14), not the S = 0 sample itself.
    expectWithinRel(f.grossRiver.value * 1000, B.expected.grossRiverMmolS!, 1e-5, "gross river [mmol/s]");
    expectWithin(f.effectiveExport.value * 1000, B.expected.effectiveExportMmolS!, 1e-4, "effective export [mmol/s]");
    expectWithin(f.netChange.value * 1000, -B.expected.sinkMmolS!, 1e-2, "net change = −sink [mmol/s]");
    expectWithin(
      (f.effectiveExport.value * 86400) / 1000,
      B.expected.effectiveExportKmolD!,
      1e-5,
      "effective export [kmol/d]",
    );
    expectWithinRel(
      f.effectiveExport.value * 86400 * 365,
      B.expected.effectiveExportMolYr!,
      1e-3,
      "effective export [mol/yr]",
    );
    expectWithin(
      r.warnings.some((w) => w.code === "per-kg-as-per-litre") ? 1 : 0,
      1,
      0,
      "per-kg shortcut is warned about (common practice: per-kg vs per-L differ by the density, ≈ 2.5 % at S ≈ 35)",
    );
  });

  it("analyzeConstituent() with densityKgM3 = 1025 scales per-kg fluxes by 1.025 (1 µmol/kg ≈ 1.025 µmol/L at S ≈ 35, seawater density ≈ 1025 kg/m³, common practice)", () => {
    const r = analyzeConstituent(samplesOf(B.inputs.salinity, B.inputs.salinity.map(caseBConc)), {
      name: "Fe",
      unit: "µmol/kg",
      riverDischargeM3s: 100,
      densityKgM3: 1025,
      bootstrapDraws: 0,
    });
    expectWithinRel(r.flux!.grossRiver.value * 1000, 1025, 1e-5, "gross river [mmol/s]");
  });

  it("percentChange() of case C: C*₀(35) = 88.75 from C(S) = 150 − 5.892857·S + 0.05·S² gives −40.83 % (derived steady 1-D case C = 150 − 5.892857·S + 0.05·S², Boyle et al. 1974 Eqs. 3–5)", () => {
    const { a, b, c } = C.inputs as { a: number; b: number; c: number };
    const s = 35;
    const eff = effectiveEndmemberAt(a + b * s + c * s * s, b + 2 * c * s, s, 0);
    expectWithin(eff, C.expected.effectiveAt35!, C.tol.effective!, "C*₀(35)");
    expectWithin(percentChange(eff, a), C.expected.percentChange!, C.tol.percent!, "% change");
    expectWithin(a + b * 17.5 + c * 17.5 ** 2, C.expected.concAt17_5!, 1e-3, "C(17.5)");
  });

  it("analyzeConstituent() on dense exact case C data (no linear seaward segment) uses the curve tangent at the mouth: C*₀ within 1 % of 88.75 (derived steady 1-D case C = 150 − 5.892857·S + 0.05·S², Boyle et al. 1974 Eqs. 3–5)", () => {
    const s = Array.from({ length: 71 }, (_, i) => i * 0.5);
    const { a, b, c } = C.inputs as { a: number; b: number; c: number };
    const r = analyzeConstituent(
      samplesOf(
        s,
        s.map((v) => a + b * v + c * v * v),
      ),
      { name: "Si", unit: "µmol/kg", bootstrapDraws: 0 },
    );
    expectWithin(r.tangent?.method === "curve-tangent" ? 1 : 0, 1, 0, `tangent method ${r.tangent?.method}`);
    expectWithinRel(r.effectiveEndmember?.value, C.expected.effectiveAt35!, 0.01, "C*₀ at the mouth");
    expectWithin(r.class === "removal" ? 1 : 0, 1, 0, `class ${r.class}`);
  });

  it("percentChange() rejects a non-positive river value with a RangeError naming the function", () => {
    let msg = "";
    try {
      percentChange(1, 0);
    } catch (e) {
      msg = (e as Error).message;
    }
    expectWithin(msg.startsWith("percentChange:") ? 1 : 0, 1, 0, `message "${msg}"`);
  });
});
