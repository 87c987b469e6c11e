/**
 * The worker's bridge to analysis/: reads files, builds the channel and
 * analyses one survey with `analyzeSurvey`, then places the results on the
 * channel (km ticks, zones, maxima, isohalines) with analysis/geometry. The
 * only dashboard file that calls analysis functions; the same code runs in
 * Node and the CLI.
 */
import {
  analyzeSurvey,
  buildChannelNetwork,
  channelStretch,
  kmTicks,
  pointAtKm,
  readSurveyText,
  type CenterlineGeoJson,
  type ChannelNetwork,
  type ConstituentSettings,
  type ImportIssue,
  type Survey,
  type SurveyAnalysis,
} from "../../../analysis/index.ts";
import type { AnalysisSettings } from "../state/settings.svelte.ts";
import type { TextFile } from "../lib/demoData.ts";
import type { ChannelOverlay, ConstituentOverlay, LonLat, SurveyOverlay } from "./overlay.ts";
import { minOf, maxOf } from "../../../analysis/survey/arrayExtent.ts";
import { appendAll } from "../../../analysis/survey/arrayExtent.ts";

/** The survey analysis as the panels and the map read it. */
export type AnalysisResult = SurveyAnalysis;

/** The channel network, built once per load. */
export type Channel = ChannelNetwork | undefined;

/** Tick spacing on the map [km]; every `MAJOR_EVERY`-th tick is labelled. */
const TICK_SPACING_KM = 1;
const MAJOR_EVERY = 5;

export interface ReadResult {
  surveys: Survey[];
  issues: ImportIssue[];
}

/** Reads survey CSV files with analysis/io; problems come back as issues. */
export function readSurveys(files: TextFile[], onProgress?: (fraction: number) => void): ReadResult {
  const surveys: Survey[] = [];
  const issues: ImportIssue[] = [];
  files.forEach((file, i) => {
    const result = readSurveyText(file.text, {
      fileName: file.name,
      onProgress: (f) => onProgress?.((i + f) / files.length),
    });
    appendAll(surveys, result.surveys);
    appendAll(issues, result.issues);
  });
  return { surveys, issues };
}

interface AnyFeature {
  type: "Feature";
  geometry: { type: string; coordinates: unknown } | null;
  properties?: Record<string, unknown> | null;
}

/**
 * Splits a centerline file into its lines and the mouth point it may mark
 * (a Point feature with `properties.role` "mouth").
 */
function splitCenterline(geojson: unknown): { lines: CenterlineGeoJson; mouth: [number, number] | undefined } {
  const fc = geojson as { type?: string; features?: AnyFeature[] };
  if (fc.type !== "FeatureCollection" || !Array.isArray(fc.features)) {
    return { lines: geojson as CenterlineGeoJson, mouth: undefined };
  }
  const isLine = (f: AnyFeature) => f.geometry?.type === "LineString" || f.geometry?.type === "MultiLineString";
  const mouthFeature = fc.features.find((f) => f.geometry?.type === "Point" && f.properties?.role === "mouth");
  return {
    lines: { ...fc, features: fc.features.filter(isLine) } as CenterlineGeoJson,
    mouth: mouthFeature ? (mouthFeature.geometry?.coordinates as [number, number]) : undefined,
  };
}

/** Builds the channel network from the centerline GeoJSON with analysis/geometry. */
export function readChannel(file: TextFile | undefined): { channel: Channel; overlay: ChannelOverlay } | undefined {
  if (!file) return undefined;
  const { lines, mouth } = splitCenterline(JSON.parse(file.text));
  const network = buildChannelNetwork(lines, { mouth: mouth ?? "start" });
  const ticks = kmTicks(network, TICK_SPACING_KM).features.map((f) => ({
    km: f.properties.km,
    lonLat: f.geometry.coordinates,
    major: Math.round(f.properties.km / TICK_SPACING_KM) % MAJOR_EVERY === 0,
    label: f.properties.label,
    branchId: f.properties.branchId,
    bearingDeg: f.properties.bearingDeg,
  }));
  return {
    channel: network,
    overlay: {
      paths: network.branches.map((b) => ({ branchId: b.id, path: b.coordinates })),
      ticks,
    },
  };
}

/** Per-constituent settings for analyzeSurvey from the dashboard's settings. */
function constituentSettings(settings: AnalysisSettings): Record<string, ConstituentSettings> {
  const out: Record<string, ConstituentSettings> = {};
  const names = new Set([...Object.keys(settings.endmemberOverrides), ...Object.keys(settings.precisionPercent)]);
  for (const name of names) {
    const o = settings.endmemberOverrides[name];
    const rel = settings.precisionPercent[name];
    out[name] = {
      ...(o?.river ? { river: o.river } : {}),
      ...(o?.sea ? { sea: o.sea } : {}),
      ...(rel !== undefined ? { precision: { relative: rel / 100, absolute: 0 } } : {}),
    };
  }
  return out;
}

/** Points of the channel at each km (main stem), skipping any km outside it. */
function pointsAtKm(network: ChannelNetwork, kms: number[]): LonLat[] {
  const out: LonLat[] = [];
  for (const km of kms) {
    try {
      out.push(pointAtKm(network, km));
    } catch {
      // A km beyond the main stem has no point to draw; the panels still report it.
    }
  }
  return out;
}

/** The reaction zones, maxima and isohalines of one analysis, placed on the channel. */
function surveyOverlay(analysis: SurveyAnalysis, network: Channel, ticks: ChannelOverlay["ticks"]): SurveyOverlay {
  if (!network) return { isohalines: [], constituents: {} };
  const mainTicks = ticks.filter((t) => t.branchId === network.mainBranchId);
  /** Direction of the main stem near a km, from the nearest tick (for placing labels only). */
  const bearingNear = (km: number): number =>
    mainTicks.reduce((best, t) => (Math.abs(t.km - km) < Math.abs(best.km - km) ? t : best), mainTicks[0])
      ?.bearingDeg ?? 0;
  const isohalines = analysis.survey.isohalines.flatMap((iso) =>
    iso.km.flatMap((km) =>
      pointsAtKm(network, [km]).map((lonLat) => ({ salinity: iso.salinity, km, lonLat, bearingDeg: bearingNear(km) })),
    ),
  );
  const constituents: Record<string, ConstituentOverlay> = {};
  for (const c of analysis.constituents) {
    const zonePaths: LonLat[][] = [];
    for (const range of c.reactionZone?.km ?? []) {
      const g = channelStretch(network, [minOf(range), maxOf(range)], network.mainBranchId);
      if (g?.type === "LineString") zonePaths.push(g.coordinates as LonLat[]);
      else if (g?.type === "MultiLineString") appendAll(zonePaths, g.coordinates as LonLat[][]);
    }
    constituents[c.name] = {
      zonePaths,
      zoneKind: c.reactionZone?.kind,
      maximumPoints: pointsAtKm(network, c.maximum?.km ?? []),
    };
  }
  return { isohalines, constituents };
}

/** Analyses one survey end to end; `onStep` reports progress as a fraction with a label. */
export function analyse(
  survey: Survey,
  channel: Channel,
  channelOverlay: ChannelOverlay | undefined,
  settings: AnalysisSettings,
  onStep?: (fraction: number, label: string) => void,
): { analysis: AnalysisResult; overlay: SurveyOverlay } {
  const analysis = analyzeSurvey(survey, {
    network: channel,
    saltIntrusionSalinity: settings.saltIntrusionSalinity,
    riverDischargeM3s: settings.riverDischargeM3s,
    settings: constituentSettings(settings),
    onProgress: onStep,
  });
  return { analysis, overlay: surveyOverlay(analysis, channel, channelOverlay?.ticks ?? []) };
}
