import { z } from "zod";
import type { Survey } from "../survey/survey.ts";
import { columnMappingSchema } from "./columnMapping.ts";

/** Current workspace document version. */
export const WORKSPACE_VERSION = 2;
/** The format tag every workspace document carries. */
export const WORKSPACE_FORMAT = "brackline-workspace";

const finite = z.number().refine(Number.isFinite, "a finite number");
const lonLat = z.tuple([finite, finite]);

export const valueCellSchema = z.object({
  value: finite.optional(),
  original: z.string(),
  status: z.enum(["measured", "belowDetection", "missing", "invalid"]),
  detectionLimit: finite.optional(),
  qcFlag: z.string().optional(),
  accepted: z.boolean(),
});

export const stationSchema = z.looseObject({
  id: z.string(),
  time: z.string().optional(),
  lonLat: lonLat.optional(),
  depthM: finite.optional(),
  salinity: valueCellSchema,
  temperatureC: valueCellSchema.optional(),
  pH: valueCellSchema.optional(),
  values: z.record(z.string(), valueCellSchema),
  sourceRow: z.number().int(),
  sourceFile: z.string(),
  surveyLabel: z.string().optional(),
  layer: z.enum(["surface", "bottom", "middle", "depthAveraged", "depthRange"]).optional(),
  distanceKm: finite.optional(),
  dischargeM3s: finite.optional(),
  rowFlag: z.string().optional(),
  contributingRows: z.array(z.number().int()).optional(),
});

export const surveySchema = z.object({
  name: z.string(),
  startDate: z.string().optional(),
  endDate: z.string().optional(),
  riverDischargeM3s: finite.optional(),
  stations: z.array(stationSchema),
  constituents: z.array(
    z.object({
      name: z.string(),
      unit: z.string(),
      header: z.string(),
      kind: z.enum(["tracer", "nonMixing"]).optional(),
      kindReason: z.string().optional(),
    }),
  ),
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
  tileUrl: z.string().optional(),
  useTiles: z.boolean().optional(),
});

const endmember = z.object({ salinity: finite, conc: finite, concSd: finite.optional() });
/** Analysis choices (end-member overrides, precision, discharge, constants). Unknown keys are kept. */
export const analysisChoicesSchema = z.looseObject({
  endmemberOverrides: z
    .record(z.string(), z.object({ river: endmember.optional(), sea: endmember.optional() }))
    .optional(),
  precisionPercent: z.record(z.string(), finite).optional(),
  riverDischargeM3s: finite.optional(),
  constantSet: z.string().optional(),
  saltIntrusionSalinity: finite.optional(),
  selectedSurvey: z.string().optional(),
  selectedConstituent: z.string().optional(),
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
  surveys: z.array(surveySchema),
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
