/**
 * The forward model of one survey: steady salinity plus every constituent on one grid.
 *
 * Truth definitions (what truth.json reports):
 * - river end-member C_r: the concentration imposed at the head (river water, S = S_r);
 * - sea end-member C_s: the concentration imposed at the mouth (S = S0);
 * - effective river end-member C*₀: the prescribed C_r + Δ, which equals the net seaward flux
 *   through the mouth divided by Q (Boyle et al. 1974); the finite-difference flux
 *   is reported alongside as a check;
 * - % change: 100·(C*₀ − C_r)/C_r (negative = net removal).
 */
import { areaM2, buildGrid, dispersionM2s, DEMO_CHANNEL } from "./channel.ts";
import { effectiveEndmemberAt, productionPerNode } from "./reaction.ts";
import { isohalineKm, solveSalinity, type SalinityField } from "./salinityModel.ts";
import type { ConstituentCase, SurveySpec } from "./scenario.ts";
import { solveSteadyTransport } from "./transport.ts";

/** Number of solver cells (~18 m each). */
export const MODEL_CELLS = 6000;

/**
 * The model domain continues this far [km] upstream of the mapped head (the tidal limit) as a
 * fresh river reach, so the head boundary sits in river water (S − S_r < 1e-8) and the
 * semi-infinite salt balance of Eq. 2′ holds at every station.
 */
export const RIVER_REACH_KM = 40;

/** Model output for one constituent. */
export interface ConstituentProfile {
  conc: number[];
  /** Prescribed C*₀ at the mouth = C_r + Δ. */
  effectiveEndmember: number;
  /** Net seaward flux through the most seaward face divided by Q (finite-difference check). */
  effectiveEndmemberFromFlux: number;
}

/** Model output for one survey. */
export interface SurveyModel {
  spec: SurveySpec;
  dispersionM2s: number;
  salt: SalinityField;
  profiles: Record<string, ConstituentProfile>;
  /** Distance of the S = 2 isohaline from the mouth [km]. */
  intrusionS2Km: number;
}

/** Solves one constituent on a given salinity field. */
export function solveConstituent(salt: SalinityField, c: ConstituentCase): ConstituentProfile {
  const q = salt.dischargeM3s;
  const production = c.reaction ? productionPerNode(salt.salinity, q, c.riverConc, c.reaction) : undefined;
  const { conc, faceFlux } = solveSteadyTransport(salt.grid, q, c.seaConc, c.riverConc, production);
  const sMouth = salt.salinity[0];
  return {
    conc,
    effectiveEndmember: effectiveEndmemberAt(c.riverConc, c.reaction, sMouth),
    effectiveEndmemberFromFlux: faceFlux[0] / q,
  };
}

/**
 * Runs the forward model of one survey on a channel of the given length.
 *
 * @param spec survey specification
 * @param lengthKm main-stem length from mouth to head [km]; the domain adds {@link RIVER_REACH_KM}
 * @throws Error when the S = 2 isohaline lies outside the channel (a broken scenario)
 */
export function runSurveyModel(spec: SurveySpec, lengthKm: number): SurveyModel {
  const k = dispersionM2s(spec.dischargeM3s);
  const grid = buildGrid(
    lengthKm + RIVER_REACH_KM,
    MODEL_CELLS,
    (x) => areaM2(DEMO_CHANNEL, x),
    () => k,
  );
  const salt = solveSalinity(grid, spec.dischargeM3s, spec.seaSalinity, spec.riverSalinity);
  const profiles: Record<string, ConstituentProfile> = {};
  for (const [name, c] of Object.entries(spec.constituents)) profiles[name] = solveConstituent(salt, c);
  const intrusion = isohalineKm(salt, 2);
  if (intrusion === undefined) throw new Error(`runSurveyModel(): no S = 2 isohaline in survey ${spec.id}`);
  return { spec, dispersionM2s: k, salt, profiles, intrusionS2Km: intrusion };
}
