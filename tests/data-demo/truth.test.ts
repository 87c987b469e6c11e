import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { buildMainStem } from "../../data-demo/generator/centerline.ts";
import { runSurveyModel } from "../../data-demo/generator/forwardModel.ts";
import { isohalineKm } from "../../data-demo/generator/salinityModel.ts";
import { SURVEYS } from "../../data-demo/generator/scenario.ts";
import { expectWithin } from "../helpers/tolerance.ts";

interface ConstituentTruth {
  riverEndmember: number;
  seaEndmember: number;
  effectiveRiverEndmember: number;
  effectiveRiverEndmemberFromModelFlux: number;
  percentChange: number;
  behaviour: string;
  reactionZoneSalinity: [number, number] | null;
  maximumSalinity: number | null;
}
interface SurveyTruth {
  dischargeM3s: number;
  riverSalinity: number;
  seaSalinity: number;
  saltIntrusionKm: { S2: number };
  stationCount: number;
  constituents: Record<string, ConstituentTruth>;
}
const truth = JSON.parse(readFileSync(new URL("../../data-demo/truth.json", import.meta.url), "utf8")) as {
  seed: number;
  note: string;
  surveys: Record<string, SurveyTruth>;
};
const wet = truth.surveys["wet-2025-03"];
const dry = truth.surveys["dry-2025-09"];
const both = [wet, dry];

const lengthKm = (() => {
  const m = buildMainStem();
  return m.cumKm[m.cumKm.length - 1];
})();
const models = SURVEYS.map((s) => runSurveyModel(s, lengthKm));

describe("demo truth.json: the invented scenario's known answers", () => {
  it("truth.json states that the data are invented and records seed 1974", () => {
    expect(truth.note).toMatch(/INVENTED/);
    expect(truth.seed).toBe(1974);
  });

  it("Fe removal in truth is 90–95 % (Boyle, Edmond & Sholkovitz 1977 ≈ 90 %; Sholkovitz 1978 lab 95 %)", () => {
    for (const s of both) expectWithin(-s.constituents.Fe.percentChange, 92.5, 2.5, "Fe removal [%]");
    for (const s of both) expect(s.constituents.Fe.behaviour).toBe("removal-then-conservative");
  });

  it("Cu, Ni and Mn lose 30–45 % (Sholkovitz 1978: Cu 40, Ni 40, Mn 25–45 %)", () => {
    for (const s of both)
      for (const el of ["Cu", "Ni", "Mn"])
        expectWithin(-s.constituents[el].percentChange, 37.5, 7.5, `${el} removal [%]`);
  });

  it("Ba gains C*0 − C0 = 30–40 nmol/L with its maximum at S = 3–8 (Stecher & Kogut 1999: 30–40 nM)", () => {
    for (const s of both) {
      const ba = s.constituents.Ba;
      expectWithin(ba.effectiveRiverEndmember - ba.riverEndmember, 35, 5, "Ba C*0 − C0 [nmol/L]");
      expectWithin(ba.maximumSalinity ?? NaN, 5.5, 2.5, "salinity of the Ba maximum");
      expect(ba.behaviour).toBe("maximum-then-conservative");
    }
  });

  it("Cd flux is enhanced × 2–4 with a maximum at S = 5–15 (Elbaz-Poulichet et al. 1987: × 2–20, maxima at S 10–20 CONFIRMED-2nd)", () => {
    for (const s of both) {
      const cd = s.constituents.Cd;
      expectWithin(cd.effectiveRiverEndmember / cd.riverEndmember, 3, 1, "Cd flux factor C*0/C0");
      expectWithin(cd.maximumSalinity ?? NaN, 10, 5, "salinity of the Cd maximum");
    }
  });

  it("Si is conservative in truth (Boyle et al. 1974: no unambiguous Si removal)", () => {
    for (const s of both) {
      expectWithin(s.constituents.Si.percentChange, 0, 0, "Si % change");
      expect(s.constituents.Si.behaviour).toBe("conservative");
    }
  });

  it("the model's mouth flux / Q equals the prescribed C*0 for every constituent (Boyle et al. 1974)", () => {
    for (const s of both) {
      for (const [el, c] of Object.entries(s.constituents)) {
        expectWithin(
          c.effectiveRiverEndmemberFromModelFlux,
          c.effectiveRiverEndmember,
          1e-5 * c.riverEndmember,
          `${el} flux C*0`,
        );
      }
    }
  });

  it("the tangent intercept of the model C–S line seaward of the reaction zone equals truth C*0 (Boyle et al. 1974, two-point form)", () => {
    for (const m of models) {
      const t = truth.surveys[m.spec.id];
      const sr = t.riverSalinity;
      const sa = isohalineKm(m.salt, 22) ?? NaN;
      const sb = isohalineKm(m.salt, 30) ?? NaN;
      const x = m.salt.grid.xKm;
      const at = (arr: number[], km: number) => {
        const i = Math.round(km / (x[1] - x[0]));
        return [m.salt.salinity[i], arr[i]] as const;
      };
      for (const [el, c] of Object.entries(t.constituents)) {
        const [s1, c1] = at(m.profiles[el].conc, sa);
        const [s2, c2] = at(m.profiles[el].conc, sb);
        const intercept = (c1 * (s2 - sr) - c2 * (s1 - sr)) / (s2 - s1);
        expectWithin(
          intercept,
          c.effectiveRiverEndmember,
          1e-4 * c.riverEndmember,
          `${m.spec.id} ${el} tangent intercept`,
        );
      }
    }
  });

  it("the conservative Si of the forward model lies on the theoretical dilution line (Burton & Liss 1976)", () => {
    for (const m of models) {
      const si = m.spec.constituents.Si;
      const sr = m.spec.riverSalinity;
      const s0 = m.spec.seaSalinity;
      m.salt.salinity.forEach((s, i) => {
        if (i % 250 !== 0) return;
        const tdl = si.riverConc + ((si.seaConc - si.riverConc) * (s - sr)) / (s0 - sr);
        expectWithin(m.profiles.Si.conc[i], tdl, 1e-9 * si.riverConc, `${m.spec.id} Si at S = ${s.toFixed(3)}`);
      });
    }
  });

  it("wet-season (Q = 450 m³/s) S = 2 intrusion 15–25 km is shorter than the dry-season (Q = 60 m³/s) 40–50 km (steady 1-D advection–dispersion closed form, derived: intrusion falls with Q)", () => {
    expectWithin(wet.saltIntrusionKm.S2, 20, 5, "wet S2 [km]");
    expectWithin(dry.saltIntrusionKm.S2, 45, 5, "dry S2 [km]");
    expect(wet.saltIntrusionKm.S2 < dry.saltIntrusionKm.S2).toBe(true);
    expect(wet.dischargeM3s > dry.dischargeM3s).toBe(true);
    models.forEach((m) =>
      expectWithin(isohalineKm(m.salt, 2), truth.surveys[m.spec.id].saltIntrusionKm.S2, 1e-4, "truth S2 = model S2"),
    );
  });

  it("river end-members are lower in the wet season (dilution at high discharge) and sea salinities are 33–34.5", () => {
    for (const el of ["Fe", "Mn", "Cu", "Ni", "Ba", "Si", "NO3", "PO4"]) {
      expect(wet.constituents[el].riverEndmember < dry.constituents[el].riverEndmember, el).toBe(true);
    }
    for (const s of both) expectWithin(s.seaSalinity, 33.75, 0.75, "sea salinity");
  });
});
