import { parseUnit } from "../seawater/units.ts";
import type { ChannelNetwork } from "../geometry/types.ts";
import { fitSalinityProfile } from "../geometry/salinityProfile.ts";
import { crossingsKm, isohalinePositions, saltIntrusionLengthKm } from "../geometry/isohalines.ts";
import { salinityIntervalToKm } from "../geometry/salinityToKm.ts";
import type { SalinityProfile } from "../geometry/salinityTypes.ts";
import { analyzeConstituent } from "../mixing/analyzeConstituent.ts";
import type { AnalyzeOptions } from "../mixing/options.ts";
import type { ConstituentAnalysis } from "../mixing/result.ts";
import { densityEos80 } from "../seawater/densityEos80.ts";
import type { Survey } from "../survey/survey.ts";
import { SCREENING_CAUTION } from "./caution.ts";
import { constituentSamples } from "./mixingSamples.ts";
import { placeStations } from "./placeStations.ts";
import { alongChannelSeries } from "./alongChannelSeries.ts";
import { offChannelStations } from "./offChannel.ts";
import type { DischargeProvenance, MixingWarning, SurveyAnalysis, SurveyFacts } from "./surveyAnalysis.ts";
import { minOf, maxOf } from "../survey/arrayExtent.ts";
import { constituentPartOf, type ConstituentPart } from "./constituentParts.ts";

/** Per-constituent settings a user may change (end-member overrides, precision, k, ...). */
export type ConstituentSettings = Partial<
  Omit<AnalyzeOptions, "name" | "unit" | "salinityToKm" | "salinityToKmPoint" | "salinityNonMonotonic">
>;

/** Options of {@link analyzeSurvey}. */
export interface AnalyzeSurveyOptions {
  /** Channel network (from buildChannelNetwork); without it, file distances are used if present. */
  network?: ChannelNetwork;
  /**
   * Stations farther off the channel are left out of the fits and end-members, and listed [m]
   * (default {@link DEFAULT_OFF_CHANNEL_M}).
   */
  offChannelThresholdM?: number;
  /** Keep off-channel stations in the fits (they are still listed). Default false. */
  keepOffChannel?: boolean;
  /** Non-mixing variables (oxygen, chlorophyll, particles...) to analyse as tracers all the same. */
  analyseAsTracers?: string[];
  /** Isohalines to locate (default 1, 2, 5, 10, 20). */
  isohalines?: number[];
  /** Isohaline defining the salt intrusion length (default 2). */
  saltIntrusionSalinity?: number;
  /** River discharge [m³/s]; overrides the survey's. */
  riverDischargeM3s?: number;
  /** Where the discharge came from (stated in the survey facts; see `surveyDischarge`). */
  dischargeSource?: DischargeProvenance;
  /** Bootstrap draws for every constituent (default 2000). */
  bootstrapDraws?: number;
  /** Seed of the bootstrap (default 1). */
  seed?: number;
  /** Only these constituents (default: all of the survey). */
  constituents?: string[];
  /**
   * Only this part of the constituents (split by {@link constituentPartOf}, the number of accepted
   * samples as cost, or named): parts analysed apart and merged in survey order equal the whole analysis.
   */
  part?: ConstituentPart;
  /** Settings by constituent name. */
  settings?: Record<string, ConstituentSettings>;
  /** Temperature at which per-volume samples were measured, for per-kg ↔ per-L [°C] (default 20). */
  labTemperatureC?: number;
  /** Progress callback (fraction 0…1 and what is being done). */
  onProgress?: (fraction: number, label: string) => void;
}

const DEFAULT_ISOHALINES = [1, 2, 5, 10, 20];

/** Default distance from the centerline beyond which a station is off the channel [m] (common practice: a few channel widths). */
export const DEFAULT_OFF_CHANNEL_M = 2000;

/**
 * S(x) along the main stem: stations on a tributary or off the channel are left out, since a
 * tributary carries its own salinity gradient and would make S(x) look non-monotonic.
 */
function profileOf(
  placements: SurveyAnalysis["stations"],
  network: ChannelNetwork | undefined,
  warnings: MixingWarning[],
): SalinityProfile | undefined {
  const main = network?.mainBranchId;
  const usable = placements.filter((p) => p.alongChannelKm !== undefined && p.salinity !== undefined);
  const onMain = usable.filter((p) => main === undefined || (p.branchId === main && !p.offChannel));
  const left = usable.length - onMain.length;
  if (left > 0)
    warnings.push({
      code: "profile-main-stem",
      message: `S(x) and the isohalines use the ${onMain.length} stations on the main channel; ${left} station(s) on a tributary or off the channel are left out of S(x) (they stay in the mixing analysis).`,
    });
  const points = onMain.map((p) => ({
    km: p.alongChannelKm!,
    salinity: p.salinity!,
    id: p.id,
    ...(p.branchId ? { branchId: p.branchId } : {}),
  }));
  return points.length >= 2 ? fitSalinityProfile(points) : undefined;
}

/**
 * Analyses one survey end to end: places stations on the channel (km from the mouth, offset),
 * fits S(x), locates isohalines and the salt intrusion length, then runs the mixing analysis of every
 * constituent with reaction zones and maxima mapped from salinity to channel kilometres.
 *
 * @param survey the survey (from analysis/io)
 * @param options see {@link AnalyzeSurveyOptions}
 * @returns the survey analysis; never throws for thin data (warnings say what could not be done)
 * @see bibliography key boyle1974 for the mixing analysis; S(x) as a landward-falling profile is common practice.
 */
export function analyzeSurvey(survey: Survey, options: AnalyzeSurveyOptions = {}): SurveyAnalysis {
  const progress = options.onProgress ?? (() => undefined);
  progress(0, "placing stations on the channel");
  const warnings: MixingWarning[] = [];
  const network = options.network;
  if (network) warnings.push(...network.warnings);
  const limitM = options.offChannelThresholdM ?? DEFAULT_OFF_CHANNEL_M;
  const { placements, warnings: placeWarnings } = placeStations(survey.stations, network, limitM);
  warnings.push(...placeWarnings.filter((w) => w.code !== "offChannel"));
  const off = offChannelStations(placements);
  const kept = options.keepOffChannel === true;
  const offLine = off.filter((o) => o.sideArm !== true);
  const onArm = off.filter((o) => o.sideArm === true);
  const keepHint = kept ? "" : "Keep them with --keep-off-channel or the dashboard's off-channel setting";
  if (offLine.length > 0)
    warnings.push({
      code: "offChannel",
      message: `${offLine.length} station(s) lie more than ${limitM / 1000} km from the channel and are ${kept ? "kept in" : "left out of"} the fits and end-members: ${offLine.map((o) => `${o.id} (${o.distanceKm.toFixed(1)} km)`).join(", ")}. ${kept ? "" : `${keepHint}; `}change the limit with --off-channel-km.`,
    });
  if (onArm.length > 0)
    warnings.push({
      code: "offChannel",
      message: `${onArm.length} station(s) lie on a separate arm beyond the mouth (the salinity maximum of the distance axis) and are ${kept ? "kept in" : "left out of"} the fits and end-members: ${onArm.map((o) => `${o.id} (${o.distanceKm.toFixed(1)} km along the arm)`).join(", ")}.${kept ? "" : ` ${keepHint}.`}`,
    });
  const excluded = new Set(kept ? [] : off.map((o) => o.id));
  const profile = profileOf(placements, network, warnings);
  if (profile) warnings.push(...profile.warnings);
  const saltS = options.saltIntrusionSalinity ?? 2;
  const iso = profile ? isohalinePositions(profile, options.isohalines ?? DEFAULT_ISOHALINES) : undefined;
  if (iso) warnings.push(...iso.warnings);
  const intrusion = profile ? saltIntrusionLengthKm(profile, saltS) : undefined;
  if (intrusion) warnings.push(...intrusion.warnings);
  const salinities = placements.flatMap((p) => (p.salinity !== undefined ? [p.salinity] : []));
  const discharge = options.riverDischargeM3s ?? survey.riverDischargeM3s;
  const facts: SurveyFacts = {
    name: survey.name,
    ...(survey.startDate !== undefined ? { startDate: survey.startDate } : {}),
    ...(survey.endDate !== undefined ? { endDate: survey.endDate } : {}),
    ...(discharge !== undefined ? { riverDischargeM3s: discharge } : {}),
    ...(discharge !== undefined && options.dischargeSource ? { dischargeSource: { ...options.dischargeSource } } : {}),
    ...(intrusion?.km !== undefined ? { saltIntrusionKm: intrusion.km } : {}),
    saltIntrusionSalinity: saltS,
    isohalines: iso ? iso.positions.map((p) => ({ salinity: p.salinity, km: p.km })) : [],
    ...(salinities.length > 0 ? { salinityRange: [minOf(salinities), maxOf(salinities)] as [number, number] } : {}),
    nStations: survey.stations.length,
  };
  const asTracer = new Set(options.analyseAsTracers ?? []);
  const isTracer = (c: Survey["constituents"][number]): boolean => c.kind !== "nonMixing" || asTracer.has(c.name);
  const listed = options.constituents ?? survey.constituents.filter(isTracer).map((c) => c.name);
  const part = options.part;
  const wanted = constituentsOfPart(survey, listed, part);
  const variables = survey.constituents
    .filter((c) => !isTracer(c) && (options.constituents === undefined || !listed.includes(c.name)))
    .map((c) => alongChannelSeries(survey, c.name, placements));
  const constituents: ConstituentAnalysis[] = [];
  const labT = options.labTemperatureC ?? 20;
  wanted.forEach((name, i) => {
    const info = survey.constituents.find((c) => c.name === name);
    if (!info) {
      warnings.push({
        code: "unknown-constituent",
        message: `Constituent "${name}" is not in survey "${survey.name}".`,
      });
      return;
    }
    progress((i + 0.5) / Math.max(1, wanted.length), `mixing analysis of ${name}`);
    const all = constituentSamples(survey.stations, name);
    const samples = all.samples.filter((x) => !excluded.has(x.stationId));
    const leftOut = { ...all.leftOut };
    if (samples.length < all.samples.length) leftOut["off the channel"] = all.samples.length - samples.length;
    const perKg = parseUnit(info.unit)?.basis === "perKilogram";
    const settings = options.settings?.[name] ?? {};
    const result = analyzeConstituent(samples, {
      bootstrapDraws: options.bootstrapDraws ?? 2000,
      seed: options.seed ?? 1,
      ...(discharge !== undefined ? { riverDischargeM3s: discharge } : {}),
      ...(perKg ? { densityKgM3: (s: number) => densityEos80(Math.max(0, Math.min(42, s)), labT, 0) } : {}),
      ...settings,
      name,
      unit: info.unit,
      ...(profile
        ? {
            salinityToKm: (s1: number, s2: number) => salinityIntervalToKm(profile, [s1, s2]).intervalsKm,
            salinityToKmPoint: (s: number) => crossingsKm(profile, s),
            salinityNonMonotonic: !profile.monotone,
          }
        : {}),
    });
    const reasons = Object.entries(leftOut);
    if (reasons.length > 0) {
      result.warnings.push({
        code: "stations-left-out",
        message: `${name}: stations left out of the analysis — ${reasons.map(([r, n]) => `${n} ${r}`).join("; ")}.`,
      });
    }
    constituents.push(result);
  });
  progress(1, "done");
  return {
    survey: facts,
    stations: placements,
    ...(profile ? { salinityProfile: profile } : {}),
    constituents,
    variables,
    offChannelStations: off,
    offChannel: { limitKm: limitM / 1000, kept },
    warnings,
    caution: SCREENING_CAUTION,
  };
}

/** The constituents of `listed` that `part` analyses, in list order (all of them without a part). */
function constituentsOfPart(survey: Survey, listed: readonly string[], part: ConstituentPart | undefined): string[] {
  if (!part) return [...listed];
  if ("names" in part) return listed.filter((name) => part.names.includes(name));
  const partOf = constituentPartOf(
    listed.map((name) => constituentSamples(survey.stations, name).samples.length),
    part.count,
  );
  return listed.filter((_, i) => partOf[i] === part.index);
}
