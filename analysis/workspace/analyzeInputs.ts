/**
 * Inputs to results: the one entry point from read inputs to everything the dashboard, the CLI and the
 * briefing show (per-survey analyses, map overlays, comparison, results and deviations tables).
 */
import { workspaceComparison } from "./comparison.ts";
import type { SurveyComparison } from "../compare/types.ts";
import { SCREENING_CAUTION } from "../output/caution.ts";
import { deviationRows, resultRows, tableObjects, DEVIATION_COLUMNS, RESULT_COLUMNS } from "../output/columns.ts";
import { analyzeSurvey, type ConstituentSettings } from "../pipeline/analyzeSurvey.ts";
import type { ConstituentPart } from "../pipeline/constituentParts.ts";
import type { DischargeProvenance, SurveyAnalysis } from "../pipeline/surveyAnalysis.ts";
import type { DischargeTable } from "../archive/dischargeTable.ts";
import { surveyDischarge } from "../archive/surveyDischarge.ts";
import { plottedObservations } from "./observations.ts";
import { channelOverlay, surveyOverlay, type ChannelOverlay, type SurveyOverlay } from "./overlay.ts";
import type { MouthDecision } from "./readCenterline.ts";
import type { WorkspaceInputs } from "./types.ts";

/** Analysis settings (the dashboard's settings menu, the CLI's options). */
export interface WorkspaceSettings {
  /** Bootstrap draws per constituent (analysis default when absent). */
  bootstrapDraws?: number;
  /** Bootstrap seed; identical inputs and seed give identical results. */
  seed?: number;
  /** Isohaline that defines the salt-intrusion length (default 2). */
  saltIntrusionSalinity?: number;
  /** River discharge [m³/s] for every survey; overrides what the inputs carry. */
  riverDischargeM3s?: number;
  /**
   * A daily discharge table (readDischargeTable) joined by date to each survey without a discharge
   * of its own; the precedence is `surveyDischarge`'s (DISCHARGE_PRECEDENCE), stated per survey.
   */
  dischargeTable?: DischargeTable;
  /** Per-constituent end-member overrides and precision. */
  constituents?: Readonly<Record<string, ConstituentSettings>>;
  /**
   * Only this part of each survey's constituents (analyzeSurvey `part`): parts analysed apart, e.g.
   * on two threads, and merged in survey order equal the whole analysis. Default: every constituent.
   */
  constituentPart?: ConstituentPart;
  /** Names of the surveys to analyse (default: all, in input order). */
  surveys?: readonly string[];
  /** Compare the analysed surveys (needs ≥ 2); referenceIndex into the analysed list, default 0. */
  compare?: { referenceIndex?: number };
  /** Progress over all surveys, fraction 0…1 with a label. */
  onProgress?: (fraction: number, label: string) => void;
}

/** One survey's results: the analysis and where it lies on the map. */
export interface SurveyResult {
  name: string;
  analysis: SurveyAnalysis;
  overlay: SurveyOverlay;
}

/** Everything shown from one set of inputs. */
export interface WorkspaceResults {
  caution: string;
  /** How the mouth was chosen (stated wherever km are shown). */
  mouth?: MouthDecision;
  channel?: ChannelOverlay;
  surveys: SurveyResult[];
  comparison?: SurveyComparison;
  /** The results and deviations tables (column specs in analysis/output/columns.ts), as rows of plain values. */
  tables: {
    results: Array<Record<string, string | number | boolean | null>>;
    deviations: Array<Record<string, string | number | boolean | null>>;
  };
}

/**
 * Analyses read inputs: every (chosen) survey through analyzeSurvey on the inputs' channel, its map
 * overlay, an optional comparison, and the output tables.
 *
 * @param inputs from readInputs
 * @param settings draws, seed, intrusion isohaline, discharge, per-constituent settings, survey choice, comparison
 * @returns analyses, overlays, comparison and tables, with the caution
 * @throws RangeError when settings.surveys names a survey that is not in the inputs, or compare is asked with < 2 surveys
 */
export function analyzeInputs(inputs: WorkspaceInputs, settings: WorkspaceSettings = {}): WorkspaceResults {
  const wanted = settings.surveys;
  const chosen = wanted
    ? wanted.map((name) => {
        const s = inputs.surveys.find((x) => x.name === name);
        if (!s) throw new RangeError(`analyzeInputs(): settings.surveys names "${name}", which is not in the inputs`);
        return s;
      })
    : inputs.surveys;
  const network = inputs.channel?.network;
  const overlay = network ? channelOverlay(network) : undefined;
  const perSurvey = (i: number) => (f: number, label: string) =>
    settings.onProgress?.((i + f) / Math.max(1, chosen.length), label);
  const surveys = chosen.map((survey, i): SurveyResult => {
    const q = surveyDischarge(survey, {
      settingM3s: settings.riverDischargeM3s,
      chosenM3s: inputs.choices.dischargeM3s,
      table: settings.dischargeTable,
    });
    const { dischargeM3s, ...dischargeSource } = q ?? { dischargeM3s: undefined };
    const analysis = analyzeSurvey(survey, {
      ...(network ? { network } : {}),
      ...(inputs.choices.offChannelM !== undefined ? { offChannelThresholdM: inputs.choices.offChannelM } : {}),
      ...(inputs.choices.keepOffChannel === true ? { keepOffChannel: true } : {}),
      ...(inputs.choices.analyseAsTracers ? { analyseAsTracers: [...inputs.choices.analyseAsTracers] } : {}),
      ...(settings.bootstrapDraws !== undefined ? { bootstrapDraws: settings.bootstrapDraws } : {}),
      ...(settings.seed !== undefined ? { seed: settings.seed } : {}),
      ...(settings.saltIntrusionSalinity !== undefined
        ? { saltIntrusionSalinity: settings.saltIntrusionSalinity }
        : {}),
      ...(q ? { riverDischargeM3s: dischargeM3s, dischargeSource: dischargeSource as DischargeProvenance } : {}),
      ...(settings.constituents ? { settings: { ...settings.constituents } } : {}),
      ...(settings.constituentPart ? { part: settings.constituentPart } : {}),
      onProgress: perSurvey(i),
    });
    analysis.observations = plottedObservations(survey, analysis);
    return { name: survey.name, analysis, overlay: surveyOverlay(analysis, network, overlay?.ticks ?? []) };
  });
  let comparison: SurveyComparison | undefined;
  if (settings.compare)
    comparison = workspaceComparison(
      surveys.map((s) => s.analysis),
      settings.compare,
    );
  const analyses = surveys.map((s) => s.analysis);
  return {
    caution: SCREENING_CAUTION,
    ...(inputs.channel ? { mouth: inputs.channel.mouth } : {}),
    ...(overlay ? { channel: overlay } : {}),
    surveys,
    ...(comparison ? { comparison } : {}),
    tables: {
      results: tableObjects(RESULT_COLUMNS, resultRows(analyses)),
      deviations: tableObjects(DEVIATION_COLUMNS, deviationRows(analyses)),
    },
  };
}
