/**
 * truth.json: the known true values of the invented scenario, for tests of the analysis.
 *
 * "True" means the value of the noise-free forward model, not a property of the noisy
 * station data: end-members are the model's boundary concentrations, the effective river
 * end-member is the prescribed C*₀ at the mouth (= net mouth flux / Q, Eq. 3 of
 * Boyle et al. 1974), the reaction zone is the salinity interval where the prescribed
 * reaction acts, and the maximum is the model concentration maximum inside the estuary.
 * An analysis of the station data recovers them only within its own uncertainty.
 */
import { DEMO_CHANNEL, DISPERSION_RULE, depthM } from "./channel.ts";
import type { SurveyModel } from "./forwardModel.ts";
import { MODEL_CELLS, RIVER_REACH_KM } from "./forwardModel.ts";
import { roundTo } from "./format.ts";
import { INVENTED_DATA_NOTE, INVENTED_NAME_LIST } from "./names.ts";
import { CONSTITUENTS } from "./scenario.ts";
import type { StationPlan } from "./stations.ts";
import type { SampleRow } from "./samples.ts";
import type { Tributary, ChannelLine } from "./centerline.ts";
import { isohalineKm } from "./salinityModel.ts";

/** Behaviour labels (the vocabulary of analysis/mixing/result.ts BehaviourClass). */
export type TruthClass = "conservative" | "removal-then-conservative" | "maximum-then-conservative" | "addition";

/** Interior concentration maximum of a model profile within the mapped channel, if any. */
function interiorMaximum(
  model: SurveyModel,
  name: string,
  lengthKm: number,
): { salinity: number; conc: number } | undefined {
  const conc = model.profiles[name].conc;
  const x = model.salt.grid.xKm;
  const river = model.spec.constituents[name].riverConc;
  let best = -1;
  for (let i = 1; i < conc.length - 1 && x[i] <= lengthKm; i++) {
    if (conc[i] >= conc[i - 1] && conc[i] >= conc[i + 1] && conc[i] > river * (1 + 1e-6)) {
      if (best < 0 || conc[i] > conc[best]) best = i;
    }
  }
  return best < 0 ? undefined : { salinity: model.salt.salinity[best], conc: conc[best] };
}

function surveyTruth(model: SurveyModel, plans: StationPlan[], rows: SampleRow[], lengthKm: number): object {
  const spec = model.spec;
  const constituents: Record<string, object> = {};
  for (const c of CONSTITUENTS) {
    const cc = spec.constituents[c.name];
    const prof = model.profiles[c.name];
    const delta = prof.effectiveEndmember - cc.riverConc;
    const max = interiorMaximum(model, c.name, lengthKm);
    const cls: TruthClass = !cc.reaction
      ? "conservative"
      : delta < 0
        ? "removal-then-conservative"
        : max
          ? "maximum-then-conservative"
          : "addition";
    constituents[c.name] = {
      unit: c.unit,
      riverEndmember: roundTo(cc.riverConc, 6),
      seaEndmember: roundTo(cc.seaConc, 6),
      effectiveRiverEndmember: roundTo(prof.effectiveEndmember, 6),
      effectiveRiverEndmemberFromModelFlux: roundTo(prof.effectiveEndmemberFromFlux, 6),
      percentChange: roundTo((100 * delta) / cc.riverConc, 4),
      behaviour: cls,
      reactionZoneSalinity: cc.reaction ? [cc.reaction.fromSalinity, cc.reaction.toSalinity] : null,
      conservativeBeyondSalinity: cc.reaction ? cc.reaction.toSalinity : 0,
      maximumSalinity: max ? roundTo(max.salinity, 3) : null,
      maximumConcentration: max ? roundTo(max.conc, 6) : null,
      detectionLimit: c.detectionLimit ?? null,
      analyticalNoise: { relative: c.relNoise, absolute: c.absNoise },
    };
  }
  const cuOutlier = spec.cuOutlierIndex === undefined ? null : plans[spec.cuOutlierIndex].id;
  return {
    label: spec.label,
    file: `surveys/${spec.id}.csv`,
    date: spec.date,
    dischargeM3s: spec.dischargeM3s,
    seaSalinity: spec.seaSalinity,
    riverSalinity: spec.riverSalinity,
    dispersionM2s: roundTo(model.dispersionM2s, 4),
    saltIntrusionKm: {
      S2: roundTo(model.intrusionS2Km, 4),
      S1: roundTo(isohalineKm(model.salt, 1) ?? NaN, 4),
      S10: roundTo(isohalineKm(model.salt, 10) ?? NaN, 4),
    },
    stationCount: plans.length,
    cuFlaggedOutlierStation: cuOutlier,
    offChannelStation: spec.offChannelIndex === undefined ? null : plans[spec.offChannelIndex].id,
    constituents,
    stations: plans.map((p, i) => ({
      station: p.id,
      alongChannelKm: roundTo(p.alongChannelKm, 4),
      offsetM: roundTo(p.offsetM, 1),
      offChannel: p.offChannel,
      trueSalinity: roundTo(rows[i].trueSalinity, 4),
    })),
  };
}

/** Builds the truth document. */
export function truthDocument(
  seed: number,
  main: ChannelLine,
  tributary: Tributary,
  models: SurveyModel[],
  plans: StationPlan[][],
  rows: SampleRow[][],
): object {
  const lengthKm = main.cumKm[main.cumKm.length - 1];
  const surveys: Record<string, object> = {};
  models.forEach((m, i) => {
    surveys[m.spec.id] = surveyTruth(m, plans[i], rows[i], lengthKm);
  });
  return {
    note: INVENTED_DATA_NOTE,
    seed,
    definitions: {
      true: "Values of the noise-free forward model (data-demo/generator), not of the noisy station data; an analysis recovers them only within its uncertainty.",
      riverEndmember: "Concentration imposed at the head boundary (river water at S = riverSalinity).",
      seaEndmember: "Concentration imposed at the mouth boundary (S = seaSalinity).",
      effectiveRiverEndmember:
        "Prescribed C*0 at the mouth = riverEndmember + reaction change; equals the net seaward flux through the mouth divided by Q (Boyle et al. 1974). effectiveRiverEndmemberFromModelFlux is the finite-difference check.",
      percentChange: "100·(effectiveRiverEndmember − riverEndmember)/riverEndmember; negative = net removal.",
      reactionZoneSalinity:
        "Salinity interval where the prescribed reaction acts; conservative mixing beyond its upper end.",
      maximumSalinity:
        "Salinity of the model concentration maximum inside the estuary, null when the profile has none.",
      saltIntrusionKm: "Along-channel distance from the mouth of the model isohaline S = 2 (also S = 1, 10).",
      alongChannelKm:
        "Distance along the main-stem centerline (haversine, mean Earth radius) from the mouth to the station's foot point; the offset is perpendicular to the local segment, so near a bend vertex a nearest-point projection can differ by a few tens of metres.",
      offsetM: "Signed perpendicular distance of the station from the centerline (+ = right looking landward).",
    },
    model: {
      equations:
        "Steady 1-D: d/dx(Q·C + K·A·dC/dx) = −A·R, x landward; salt R = 0; reactions prescribed as C*0(S) (Boyle et al. 1974; Officer 1979, from memory).",
      mouthAreaM2: DEMO_CHANNEL.mouthAreaM2,
      convergenceLengthKm: DEMO_CHANNEL.convergenceLengthKm,
      minAreaM2: DEMO_CHANNEL.minAreaM2,
      depthAtMouthM: roundTo(depthM(0), 3),
      dispersionRule: `K = ${DISPERSION_RULE.refDispersionM2s}·(Q/${DISPERSION_RULE.refDischargeM3s})^${DISPERSION_RULE.exponent} m²/s`,
      cells: MODEL_CELLS,
      riverReachBeyondHeadKm: RIVER_REACH_KM,
    },
    geometry: {
      mainStemLengthKm: roundTo(lengthKm, 4),
      mainStemVertices: main.lonLat.length,
      tributaryJoinsAtKm: roundTo(tributary.confluenceKm, 4),
      tributaryLengthKm: roundTo(tributary.line.cumKm[tributary.line.cumKm.length - 1], 4),
      inventedNames: INVENTED_NAME_LIST,
    },
    surveys,
  };
}
