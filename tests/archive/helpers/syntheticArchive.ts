import { randomLcg, randomNormal } from "d3-random";
import type { ComparableSurvey } from "../../../analysis/compare/types.ts";
import type { ConstituentAnalysis } from "../../../analysis/mixing/result.ts";

/** Invented truth of a synthetic archive (no measurement behind any number). */
export interface ArchiveTruth {
  /** % change = pctAt1000 + pctPerDecade·log10(Q/1000) + noise. */
  pctAt1000: number;
  pctPerDecade: number;
  pctNoiseSd: number;
  /** Salt intrusion L = L1000·(Q/1000)^exponent·exp(noise). */
  l1000Km: number;
  exponent: number;
  lNoiseSd: number;
  /** Added to every % change of this year (year effect). */
  yearShift?: { year: number; pct: number };
}

/**
 * Monthly surveys 2016–2022 of an invented estuary; discharge has a wet winter and dry autumn
 * (Q = 1000·10^(0.6·cos(2π(month − 2)/12)) with seeded noise), Si follows the truth.
 */
export function syntheticArchive(truth: ArchiveTruth, seed = 7, years = [2016, 2017, 2018, 2019, 2020, 2021, 2022]) {
  // One generator per noise stream: consecutive draws of one polar-method normal generator on a
  // linear congruential source come in pairs that are not quite independent, which biased the
  // discharge slope when discharge and % change noise shared a stream.
  const stream = (k: number) =>
    randomNormal.source(randomLcg(((seed * 7919 + k * 104729) % 2147483647) / 2147483647))(0, 1);
  const zq = stream(1);
  const zp = stream(2);
  const zl = stream(3);
  const surveys: ComparableSurvey[] = [];
  for (const year of years)
    for (let month = 1; month <= 12; month++) {
      const q = 1000 * 10 ** (0.6 * Math.cos((2 * Math.PI * (month - 2)) / 12) + 0.15 * zq());
      const pct =
        truth.pctAt1000 +
        truth.pctPerDecade * Math.log10(q / 1000) +
        truth.pctNoiseSd * zp() +
        (truth.yearShift?.year === year ? truth.yearShift.pct : 0);
      const l = truth.l1000Km * (q / 1000) ** truth.exponent * Math.exp(truth.lNoiseSd * zl());
      const zoneMid = 20 + 0.3 * l;
      const si: ConstituentAnalysis = {
        name: "Si",
        unit: "µmol/L",
        class: pct < -5 ? "removal" : "conservative",
        confidence: "normal",
        deviations: [],
        warnings: [],
        percentChange: { value: pct, lower: pct - 4, upper: pct + 4, unit: "%" },
        effectiveEndmember: {
          value: 200 * (1 + pct / 100),
          lower: 190 * (1 + pct / 100),
          upper: 210 * (1 + pct / 100),
          unit: "µmol/L",
        },
        reactionZone: { salinity: [2, 10], km: [[zoneMid - 5, zoneMid + 5]], kind: "removal" },
      };
      const name = `cruise ${year}-${String(month).padStart(2, "0")}`;
      surveys.push({
        survey: {
          name,
          startDate: `${year}-${String(month).padStart(2, "0")}-15`,
          riverDischargeM3s: q,
          saltIntrusionKm: l,
          saltIntrusionSalinity: 2,
          isohalines: [],
          nStations: 14,
        },
        stations: [],
        constituents: [si],
      });
    }
  return surveys;
}
