import { z } from "zod";
import type { Survey } from "../survey/survey.ts";
import { columnMappingSchema } from "./columnMapping.ts";
import { canonicalUnitText, concentrationUnitText } from "./unitText.ts";

import { WORKSPACE_FORMAT, WORKSPACE_LIMITS, WORKSPACE_VERSION } from "./workspaceFormat.ts";

export { WORKSPACE_FORMAT, WORKSPACE_LIMITS, WORKSPACE_VERSION };

const finite = z.number().refine(Number.isFinite, "a finite number");
const nonNegative = finite.refine((v) => v >= 0, "a number ≥ 0");
const positive = finite.refine((v) => v > 0, "a number > 0");
const text = z.string().max(WORKSPACE_LIMITS.maxTextChars, `at most ${WORKSPACE_LIMITS.maxTextChars} characters`);
const lonLat = z.tuple([
  finite.refine((v) => v >= -180 && v <= 180, "a longitude between -180 and 180"),
  finite.refine((v) => v >= -90 && v <= 90, "a latitude between -90 and 90"),
]);

export const valueCellSchema = z
  .object({
    value: finite.optional(),
    original: text,
    status: z.enum(["measured", "belowDetection", "missing", "invalid"]),
    detectionLimit: nonNegative.optional(),
    qcFlag: text.optional(),
    accepted: z.boolean(),
  })
  .refine((c) => (c.status === "measured") === (c.value !== undefined), {
    message: "a value exactly when the status is measured (a missing, censored or invalid cell carries none)",
    path: ["value"],
  })
  .refine((c) => c.detectionLimit === undefined || c.status === "belowDetection", {
    message: "a detection limit only on a below-detection cell",
    path: ["detectionLimit"],
  });

/** A value cell whose measured value must lie in [min, max]. */
function cellWithin(min: number, max: number, what: string) {
  return valueCellSchema.refine((c) => c.value === undefined || (c.value >= min && c.value <= max), {
    message: `${what} between ${min} and ${max}`,
    path: ["value"],
  });
}

export const stationSchema = z.looseObject({
  id: text,
  time: text.optional(),
  lonLat: lonLat.optional(),
  depthM: nonNegative.optional(),
  salinity: cellWithin(0, 70, "a practical salinity"),
  temperatureC: cellWithin(-5, 60, "a temperature [°C]").optional(),
  pH: cellWithin(0, 14, "a pH").optional(),
  values: z.record(text, valueCellSchema),
  sourceRow: z.number().int().nonnegative(),
  sourceFile: text,
  surveyLabel: text.optional(),
  layer: z.enum(["surface", "bottom", "middle", "shallowest", "depthAveraged", "depthRange"]).optional(),
  distanceKm: finite.optional(),
  dischargeM3s: nonNegative.optional(),
  rowFlag: text.optional(),
  contributingRows: z.array(z.number().int()).optional(),
});

const constituentSchema = z.object({
  name: text,
  unit: text.refine(
    (u) => concentrationUnitText(u) === u || canonicalUnitText(u) === u,
    "a unit from the units table, written as the table writes it (e.g. nmol/L, µmol/kg, µg/L, NTU)",
  ),
  header: text,
  kind: z.enum(["tracer", "nonMixing"]).optional(),
  kindReason: text.optional(),
});

export const surveySchema = z.object({
  name: text,
  startDate: text.optional(),
  endDate: text.optional(),
  riverDischargeM3s: positive.optional(),
  stations: z.array(stationSchema).max(WORKSPACE_LIMITS.maxStations),
  constituents: z.array(constituentSchema).max(WORKSPACE_LIMITS.maxConstituents),
});

export const importIssueSchema = z.object({
  file: z.string(),
  row: z.number().int(),
  column: z.string(),
  value: z.string(),
  expected: z.string(),
  severity: z.enum(["error", "warning"]),
});

const position = z.array(finite).min(2).max(3);
const lineGeometry = z.union([
  z.object({ type: z.literal("LineString"), coordinates: z.array(position).min(2) }),
  z.object({ type: z.literal("MultiLineString"), coordinates: z.array(z.array(position).min(2)) }),
]);
const markerGeometry = z.object({ type: z.literal("Point"), coordinates: position });
const properties = z.record(z.string(), z.json()).nullable();
const lineFeature = z.looseObject({ type: z.literal("Feature"), geometry: lineGeometry, properties });
const anyFeature = z.looseObject({
  type: z.literal("Feature"),
  geometry: z.union([lineGeometry, markerGeometry]),
  properties,
});
/**
 * Channel centerline: a GeoJSON (RFC 7946) line feature, or a collection of line features that may
 * also hold Point markers (mouth, head).
 */
export const centerlineSchema = z.union([
  lineFeature,
  z.looseObject({ type: z.literal("FeatureCollection"), features: z.array(anyFeature) }),
]);

const layerChoice = z.union([
  z.object({ kind: z.enum(["all", "shallowest", "surface", "bottom", "depthAveraged"]) }),
  z.object({ kind: z.literal("depthRange"), minM: finite, maxM: finite }),
]);
const grouping = z.union([
  z.object({ by: z.enum(["column", "date"]) }),
  z.object({ by: z.literal("dateGap"), gapDays: finite.optional() }),
  z.object({ by: z.literal("file"), name: z.string().optional() }),
]);

/** Import and display settings. Unknown keys are kept (forward compatible). */
export const workspaceSettingsSchema = z.looseObject({
  layer: layerChoice.optional(),
  grouping: grouping.optional(),
  flagMap: z.record(z.string(), z.enum(["accept", "reject", "missing"])).optional(),
  colouring: z.string().optional(),
  /** Raster tile URL template; checked by {@link isTileUrlTemplate} when a workspace is read. */
  tileUrl: z.string().max(2048).optional(),
  useTiles: z.boolean().optional(),
  /** Natural Earth world land under imported data (absent in older workspaces: on). */
  worldLand: z.boolean().optional(),
});

/**
 * True for a tile URL template Brackline will fetch from: https (or http on this machine) with the
 * {z}, {x} and {y} placeholders and no white space, quotes or angle brackets.
 *
 * @param url the template text
 */
export function isTileUrlTemplate(url: string): boolean {
  const scheme = /^(https:\/\/|http:\/\/(localhost|127\.0\.0\.1)(:\d+)?\/)[^\s"'<>]+$/;
  return scheme.test(url) && ["{z}", "{x}", "{y}"].every((p) => url.includes(p));
}

const endmember = z.object({
  salinity: finite.refine((v) => v >= 0 && v <= 70, "a practical salinity between 0 and 70"),
  conc: finite,
  concSd: nonNegative.optional(),
});
/** Analysis choices (end-member overrides, precision, discharge, constants). Unknown keys are kept. */
export const analysisChoicesSchema = z.looseObject({
  endmemberOverrides: z
    .record(z.string(), z.object({ river: endmember.optional(), sea: endmember.optional() }))
    .optional(),
  precisionPercent: z.record(z.string(), positive).optional(),
  riverDischargeM3s: positive.optional(),
  constantSet: z.string().optional(),
  saltIntrusionSalinity: finite.optional(),
  selectedSurvey: z.string().optional(),
  selectedConstituent: z.string().optional(),
  /** Which end of the centerline is the mouth (absent: the one mouth rule decides). */
  mouth: z.enum(["start", "end"]).optional(),
  /** Stations farther than this from the centerline are off-channel [m]. */
  offChannelM: nonNegative.optional(),
  /** Keep off-channel stations in the fits and end-members. */
  keepOffChannel: z.boolean().optional(),
});

/** One file's import record: what was read and what was found. */
export const importRecordSchema = z.object({
  file: z.string(),
  shape: z.string().optional(),
  rowsRead: z.number().int().optional(),
  rowsAccepted: z.number().int().optional(),
  rowsRejected: z.number().int().optional(),
  issues: z.array(importIssueSchema),
});

/** The workspace document, version 2. */
export const workspaceSchema = z.object({
  format: z.literal(WORKSPACE_FORMAT),
  version: z.literal(WORKSPACE_VERSION),
  name: z.string().optional(),
  savedAt: z.string().optional(),
  surveys: z.array(surveySchema).max(WORKSPACE_LIMITS.maxSurveys),
  centerline: centerlineSchema.nullable(),
  mappings: z.array(columnMappingSchema),
  imports: z.array(importRecordSchema),
  settings: workspaceSettingsSchema,
  analysis: analysisChoicesSchema,
});

/**
 * The workspace document: surveys, centerline, mappings, import records, settings and analysis
 * choices. Surveys use the shared survey model (stations may carry the reader's extra fields).
 */
export type WorkspaceDocument = Omit<z.infer<typeof workspaceSchema>, "surveys"> & { surveys: Survey[] };
