import { describe, it } from "vitest";
import { expectWithin } from "../helpers/tolerance.ts";
import { dilutionAt, dilutionLine } from "../../analysis/mixing/dilutionLine.ts";
import { analyzeConstituent } from "../../analysis/mixing/analyzeConstituent.ts";
import type { Endmember } from "../../analysis/mixing/result.ts";
import { CASES, caseBConc, samplesOf } from "./helpers/cases.ts";

const em = (salinity: number, conc: number): Endmember => ({
  salinity,
  conc,
  concSd: 0,
  n: 0,
  source: "override",
  stationIds: [],
});
const A = CASES.caseA;
const B = CASES.caseB;

describe("theoretical dilution line (Liss 1976, Eq. 1)", () => {
  it("dilutionLine() slope and C_TDL(17.5) = 77.5000 for Si 150 → 5 µmol/kg (Liss 1976 Eq. 1, derived Si case 150 → 5 µmol/kg)", () => {
    const line = dilutionLine(em(0, A.inputs.riverConc!), em(A.inputs.seaSalinity!, A.inputs.seaConc!), "µmol/kg");
    expectWithin(line.slope, A.expected.slope!, A.tol.slope!, "slope");
    expectWithin(dilutionAt(line, A.inputs.salinity!), A.expected.tdl!, A.tol.tdl!, "C_TDL(17.5)");
  });

  it("dilutionLine() with river salinity 0.2 gives C_TDL(17.5) = 77.9167 (Liss 1976 Eq. 1, derived Si case 150 → 5 µmol/kg)", () => {
    const line = dilutionLine(
      em(A.inputs.riverSalinityAlt!, A.inputs.riverConc!),
      em(A.inputs.seaSalinity!, A.inputs.seaConc!),
      "µmol/kg",
    );
    expectWithin(
      dilutionAt(line, A.inputs.salinity!),
      A.expected.tdlRiverSalinityAlt!,
      A.tol.tdl!,
      "C_TDL(17.5), S_r = 0.2",
    );
  });

  it("analyzeConstituent() with river override at S_r = 0.2 places the station at S = 17.5 on 77.9167 (Liss 1976 Eq. 1, derived Si case 150 → 5 µmol/kg)", () => {
    const s = [0.2, 5, 10, 17.5, 25, 30, 35];
    const line = dilutionLine(em(0.2, 150), em(35, 5), "µmol/kg");
    const r = analyzeConstituent(
      samplesOf(
        s,
        s.map((v) => dilutionAt(line, v)),
      ),
      { name: "Si", unit: "µmol/kg", river: { conc: 150, salinity: 0.2 }, bootstrapDraws: 0 },
    );
    const d = r.deviations.find((x) => x.salinity === 17.5)!;
    expectWithin(d.expected, A.expected.tdlRiverSalinityAlt!, A.tol.tdl!, "expected at 17.5");
    expectWithin(d.deviation, 0, 1e-9, "conservative data deviate by 0");
  });

  it("deviations() at S = 10 in the Fe flocculation curve: TDL 7.1443, ΔC = −6.0952, significant (derived Fe flocculation case C = 1 − 0.995·S/35 + 9·(1 − S/15)³, Boyle et al. 1974 tangent)", () => {
    const r = analyzeConstituent(samplesOf(B.inputs.salinity, B.inputs.salinity.map(caseBConc)), {
      name: "Fe",
      unit: "µmol/kg",
      bootstrapDraws: 0,
    });
    const d = r.deviations.find((x) => x.salinity === 10)!;
    expectWithin(d.expected, B.expected.tdlAt10!, B.tol.tdl!, "TDL at S = 10");
    expectWithin(d.deviation, B.expected.deviationAt10!, B.tol.tdl!, "ΔC at S = 10");
    expectWithin(d.deviationPercent, (100 * B.expected.deviationAt10!) / B.expected.tdlAt10!, 1e-2, "ΔC % at S = 10");
    expectWithin(d.significant ? 1 : 0, 1, 0, "significant at k = 2");
  });

  it("deviations() are not significant when within k·σ: 1 % offsets with 5 % precision (common practice, k = 2)", () => {
    const s = [0, 5, 10, 15, 20, 25, 30, 35];
    const c = s.map((v, i) => (150 - (145 * v) / 35) * (1 + (i % 2 ? 0.01 : -0.01)));
    const r = analyzeConstituent(samplesOf(s, c), {
      name: "Si",
      unit: "µmol/L",
      precision: { relative: 0.05, absolute: 0 },
      river: { conc: 150, salinity: 0 },
      sea: { conc: 5, salinity: 35 },
      bootstrapDraws: 0,
    });
    expectWithin(r.deviations.filter((d) => d.significant).length, 0, 0, "significant deviations");
  });
});
