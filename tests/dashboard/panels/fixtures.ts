/**
 * A fixed, hand-written survey analysis for the panel tests. The numbers are
 * INVENTED for layout testing only; they are not measurements and were not
 * produced by the analysis (panels only draw what they are given).
 */
import type {
  ConstituentAnalysisView,
  StationPlacement,
  SurveyAnalysisView,
} from "../../../dashboard/src/panels/lib/types.ts";

const salinities = [0.1, 0.5, 1.2, 2.5, 4.0, 6.5, 9.0, 13.0, 18.0, 24.0, 29.0, 33.5];
const kms = [42, 38, 35, 31, 28, 24, 20, 16, 12, 8, 4, 0.5];
const ids = salinities.map((_, i) => `S${String(i + 1).padStart(2, "0")}`);
const pHs = [7.1, 7.15, 7.2, 7.3, 7.4, 7.5, 7.6, 7.7, 7.8, 7.9, 8.0, 8.1];

export const stations: StationPlacement[] = ids.map((id, i) => ({
  id,
  lonLat: [10 + i * 0.02, 50 - i * 0.01],
  alongChannelKm: kms[i],
  offsetM: 20,
  offChannel: false,
  salinity: salinities[i],
  pH: pHs[i],
  temperatureC: 12,
}));

const river = (conc: number) => ({
  salinity: 0.1,
  conc,
  concSd: conc * 0.05,
  n: 2,
  source: "data" as const,
  stationIds: ["S01", "S02"],
});
const sea = (conc: number) => ({
  salinity: 33.5,
  conc,
  concSd: conc * 0.05,
  n: 1,
  source: "data" as const,
  stationIds: ["S12"],
});

function deviations(observed: number[], line: (s: number) => number, censored: number[] = []) {
  return ids.map((id, i) => {
    const expected = line(salinities[i]);
    return {
      stationId: id,
      salinity: salinities[i],
      observed: observed[i],
      expected,
      deviation: observed[i] - expected,
      deviationPercent: (100 * (observed[i] - expected)) / expected,
      significant: Math.abs(observed[i] - expected) > 0.1 * expected,
      censored: censored.includes(i),
    };
  });
}

const feObserved = [800, 620, 450, 300, 210, 150, 110, 80, 55, 30, 12, 5];
const feLine = (s: number) => 800 + ((5 - 800) / 33.4) * (s - 0.1);

export const fe: ConstituentAnalysisView = {
  name: "Fe",
  unit: "nmol/L",
  endmembers: { river: river(800), sea: sea(5) },
  dilutionLine: {
    slope: (5 - 800) / 33.4,
    intercept: 800 - ((5 - 800) / 33.4) * 0.1,
    river: river(800),
    sea: sea(5),
    unit: "nmol/L",
  },
  deviations: deviations(feObserved, feLine, [11]),
  fit: {
    salinity: [0, 5, 10, 15, 20, 25, 30, 33.5],
    conc: [810, 180, 100, 70, 45, 28, 12, 5],
    lower: [760, 160, 88, 60, 38, 22, 8, 2],
    upper: [860, 200, 112, 80, 52, 34, 16, 8],
    method: "invented for layout tests",
    derivative: [],
    secondDerivative: [],
    lambda: 1,
    edf: 4,
  },
  tangent: {
    slope: -7.1,
    intercept: 243,
    fromSalinity: 9,
    toSalinity: 33.5,
    salinityRange: [9, 33.5],
    method: "segment",
    nStations: 6,
  },
  class: "removal",
  confidence: "low",
  effectiveEndmember: { value: 243, lower: 221, upper: 266, unit: "nmol/L" },
  percentChange: { value: -69.6, lower: -72.4, upper: -66.8, unit: "%" },
  reactionZone: { salinity: [0.5, 6.5], km: [[24, 38]], kind: "removal" },
  warnings: [
    { code: "few-stations-in-zone", message: "Only 4 stations lie in the removal zone (salinity 0.5 to 6.5)." },
    { code: "censored-values", message: "1 value below the detection limit of 5 nmol/L was set to the limit." },
  ],
  observations: [
    ...ids.map((id, i) => ({
      stationId: id,
      salinity: salinities[i],
      value: feObserved[i],
      kind: i === 11 ? ("belowDetection" as const) : ("measured" as const),
      original: i === 11 ? "<5" : String(feObserved[i]),
    })),
    { stationId: "S07b", salinity: 9.2, value: 400, kind: "rejected", original: "400" },
  ],
};

const baObserved = [110, 125, 150, 175, 180, 170, 150, 120, 95, 70, 55, 45];
const baLine = (s: number) => 110 + ((45 - 110) / 33.4) * (s - 0.1);

export const ba: ConstituentAnalysisView = {
  name: "Ba",
  unit: "nmol/L",
  endmembers: { river: river(110), sea: sea(45) },
  dilutionLine: { slope: (45 - 110) / 33.4, intercept: 110.19, river: river(110), sea: sea(45), unit: "nmol/L" },
  deviations: deviations(baObserved, baLine),
  class: "maximum-then-conservative",
  confidence: "normal",
  effectiveEndmember: { value: 190, lower: 176, upper: 203, unit: "nmol/L" },
  percentChange: { value: 72.7, lower: 60.0, upper: 84.5, unit: "%" },
  reactionZone: { salinity: [0.5, 13], km: [[16, 38]], kind: "addition" },
  maximum: {
    salinity: { value: 4.0, lower: 2.5, upper: 6.5, unit: "" },
    km: [28],
    excess: { value: 77, lower: 65, upper: 89, unit: "nmol/L" },
    conservativeBeyondSalinity: 13,
  },
  warnings: [],
};

const siObserved = [140, 138, 136, 131, 126, 117, 108, 94, 76, 55, 37, 21];
const siLine = (s: number) => 140 + ((21 - 140) / 33.4) * (s - 0.1);

export const si: ConstituentAnalysisView = {
  name: "Si",
  unit: "µmol/L",
  endmembers: { river: river(140), sea: sea(21) },
  dilutionLine: { slope: (21 - 140) / 33.4, intercept: 140.36, river: river(140), sea: sea(21), unit: "µmol/L" },
  deviations: deviations(siObserved, siLine),
  class: "conservative",
  confidence: "normal",
  percentChange: { value: 0.4, lower: -3.1, upper: 3.8, unit: "%" },
  warnings: [
    { code: "endmember-variability", message: "River end-member varies by 8 % between the two freshest stations." },
  ],
};

/** The fixed analysis every panel test renders. */
export function fixtureAnalysis(): SurveyAnalysisView {
  return {
    survey: {
      name: "Invented test survey",
      startDate: "2025-03-04",
      riverDischargeM3s: 120,
      saltIntrusionKm: 31,
      saltIntrusionSalinity: 2,
      isohalines: [{ salinity: 2, km: [31] }],
      salinityRange: [0.1, 33.5],
      nStations: 12,
    },
    warnings: [],
    caution:
      "Screening analysis, not a compliance or health assessment (test fixture). Defer to local regulations and licensed practice.",
    stations,
    constituents: [fe, ba, si],
  };
}
