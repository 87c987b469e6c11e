/**
 * The worker's bridge to analysis/: reads files, builds the channel and
 * analyses one survey. The only dashboard file that calls analysis functions,
 * so the same code runs here as in Node and the CLI.
 */
import type { ImportIssue, Survey } from "../../../analysis/index.ts";
import { readSurveyText } from "../../../analysis/io/readSurvey.ts";
import { buildChannelNetwork } from "../../../analysis/geometry/buildNetwork.ts";
import { projectLonLatArrays } from "../../../analysis/geometry/projectBulk.ts";
import type { CenterlineGeoJson } from "../../../analysis/geometry/geojsonInput.ts";
import type { ChannelNetwork } from "../../../analysis/geometry/types.ts";
import type { StationPlacement } from "../../../analysis/pipeline/surveyAnalysis.ts";
import type { SurveyAnalysisView } from "../panels/lib/types.ts";
import type { AnalysisSettings } from "../state/settings.svelte.ts";
import type { TextFile } from "../lib/demoData.ts";
import type { ChannelOverlay, SurveyOverlay } from "./overlay.ts";
import { emptySurveyOverlay } from "./overlay.ts";

/** The survey analysis as the panels and the map read it. */
export type AnalysisResult = SurveyAnalysisView;

/** The channel network, built once per load. */
export type Channel = ChannelNetwork | undefined;

/** Stations farther than this from the centerline are flagged off-channel [m]. */
const OFF_CHANNEL_M = 2000;

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
    surveys.push(...result.surveys);
    issues.push(...result.issues);
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
  return {
    channel: network,
    overlay: {
      paths: network.branches.map((b) => ({ branchId: b.id, path: b.coordinates })),
      ticks: [],
    },
  };
}

function placements(survey: Survey, network: Channel): StationPlacement[] {
  const n = survey.stations.length;
  const lon = new Float64Array(n);
  const lat = new Float64Array(n);
  survey.stations.forEach((s, i) => {
    lon[i] = s.lonLat ? s.lonLat[0] : NaN;
    lat[i] = s.lonLat ? s.lonLat[1] : NaN;
  });
  const proj = network ? projectLonLatArrays(network, lon, lat) : undefined;
  return survey.stations.map((s, i) => {
    const placed = proj !== undefined && proj.branchIndex[i] >= 0;
    return {
      id: s.id,
      lonLat: s.lonLat,
      alongChannelKm: placed ? proj.alongChannelKm[i] : undefined,
      offsetM: placed ? proj.offsetM[i] : undefined,
      branchId: placed && network ? network.branches[proj.branchIndex[i]].id : undefined,
      nearestLonLat: placed ? [proj.nearestLon[i], proj.nearestLat[i]] : undefined,
      offChannel: !placed || Math.abs(proj.offsetM[i]) > OFF_CHANNEL_M,
      salinity: s.salinity.accepted ? s.salinity.value : undefined,
      temperatureC: s.temperatureC?.accepted ? s.temperatureC.value : undefined,
      pH: s.pH?.accepted ? s.pH.value : undefined,
      time: s.time,
      depthM: s.depthM,
    };
  });
}

/** Analyses one survey end to end. */
export function analyse(
  survey: Survey,
  channel: Channel,
  settings: AnalysisSettings,
): { analysis: AnalysisResult; overlay: SurveyOverlay } {
  const analysis: AnalysisResult = {
    survey: {
      name: survey.name,
      startDate: survey.startDate,
      endDate: survey.endDate,
      riverDischargeM3s: settings.riverDischargeM3s ?? survey.riverDischargeM3s,
      saltIntrusionSalinity: settings.saltIntrusionSalinity,
      isohalines: [],
    },
    stations: placements(survey, channel),
    constituents: [],
  };
  return { analysis, overlay: emptySurveyOverlay() };
}
