import { z } from "./zodMini.ts";
import type { Survey } from "../survey/survey.ts";
import { columnMappingSchema } from "./columnMapping.ts";
import { canonicalUnitText, concentrationUnitText } from "./unitText.ts";

import { WORKSPACE_FORMAT, WORKSPACE_LIMITS, WORKSPACE_VERSION } from "./workspaceFormat.ts";

export { WORKSPACE_FORMAT, WORKSPACE_LIMITS, WORKSPACE_VERSION };

const finite = z.number().check(z.refine(Number.isFinite, "a finite number"));
/** A finite number that also meets `test` (message `what`). */
const finiteWhere = (test: (v: number) => boolean, what: string) =>
  z.number().check(z.refine(Number.isFinite, "a finite number"), z.refine(test, what));
const nonNegative = finiteWhere((v) => v >= 0, "a number ≥ 0");
const positive = finiteWhere((v) => v > 0, "a number > 0");
const text = z
  .string()
  .check(z.maxLength(WORKSPACE_LIMITS.maxTextChars, `at most ${WORKSPACE_LIMITS.maxTextChars} characters`));
const lonLat = z.tuple([
  finiteWhere((v) => v >= -180 && v <= 180, "a longitude between -180 and 180"),
  finiteWhere((v) => v >= -90 && v <= 90, "a latitude between -90 and 90"),
]);

export const valueCellSchema = z
  .object({
    value: z.optional(finite),
    original: text,
    status: z.enum(["measured", "belowDetection", "missing", "invalid"]),
    detectionLimit: z.optional(nonNegative),
    qcFlag: z.optional(text),
    accepted: z.boolean(),
  })
  .check(
    z.refine((c) => (c.status === "measured") === (c.value !== undefined), {
      message: "a value exactly when the status is measured (a missing, censored or invalid cell carries none)",
      path: ["value"],
    }),
    z.refine((c) => c.detectionLimit === undefined || c.status === "belowDetection", {
      message: "a detection limit only on a below-detection cell",
      path: ["detectionLimit"],
    }),
  );

/** A value cell whose measured value must lie in [min, max]. */
function cellWithin(min: number, max: number, what: string) {
  return valueCellSchema.check(
    z.refine((c) => c.value === undefined || (c.value >= min && c.value <= max), {
      message: `${what} between ${min} and ${max}`,
      path: ["value"],
    }),
  );
}

export const stationSchema = z.looseObject({
  id: text,
  time: z.optional(text),
  lonLat: z.optional(lonLat),
  depthM: z.optional(nonNegative),
  salinity: cellWithin(0, 70, "a practical salinity"),
  temperatureC: z.optional(cellWithin(-5, 60, "a temperature [°C]")),
  pH: z.optional(cellWithin(0, 14, "a pH")),
  values: z.record(text, valueCellSchema),
  sourceRow: z.int().check(z.nonnegative()),
  sourceFile: text,
  surveyLabel: z.optional(text),
  layer: z.optional(z.enum(["surface", "bottom", "middle", "shallowest", "depthAveraged", "depthRange"])),
  distanceKm: z.optional(finite),
  dischargeM3s: z.optional(nonNegative),
  rowFlag: z.optional(text),
  contributingRows: z.optional(z.array(z.int())),
});

const constituentSchema = z.object({
  name: text,
  unit: text.check(
    z.refine(
      (u) => concentrationUnitText(u) === u || canonicalUnitText(u) === u,
      "a unit from the units table, written as the table writes it (e.g. nmol/L, µmol/kg, µg/L, NTU)",
    ),
  ),
  header: text,
  kind: z.optional(z.enum(["tracer", "nonMixing"])),
  kindReason: z.optional(text),
});

export const surveySchema = z.object({
  name: text,
  startDate: z.optional(text),
  endDate: z.optional(text),
  riverDischargeM3s: z.optional(positive),
  stations: z.array(stationSchema).check(z.maxLength(WORKSPACE_LIMITS.maxStations)),
  constituents: z.array(constituentSchema).check(z.maxLength(WORKSPACE_LIMITS.maxConstituents)),
});

export const importIssueSchema = z.object({
  file: z.string(),
  row: z.int(),
  column: z.string(),
  value: z.string(),
  expected: z.string(),
  severity: z.enum(["error", "warning"]),
});

const position = z.array(finite).check(z.minLength(2), z.maxLength(3));
const line = z.array(position).check(z.minLength(2));
const lineGeometry = z.union([
  z.object({ type: z.literal("LineString"), coordinates: line }),
  z.object({ type: z.literal("MultiLineString"), coordinates: z.array(line) }),
]);
const markerGeometry = z.object({ type: z.literal("Point"), coordinates: position });
const properties = z.nullable(z.record(z.string(), z.json()));
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
  z.object({ by: z.literal("dateGap"), gapDays: z.optional(finite) }),
  z.object({ by: z.literal("file"), name: z.optional(z.string()) }),
]);

/** Import and display settings. Unknown keys are kept (forward compatible). */
export const workspaceSettingsSchema = z.looseObject({
  layer: z.optional(layerChoice),
  grouping: z.optional(grouping),
  flagMap: z.optional(z.record(z.string(), z.enum(["accept", "reject", "missing"]))),
  colouring: z.optional(z.string()),
  /** Raster tile URL template; checked by {@link isTileUrlTemplate} when a workspace is read. */
  tileUrl: z.optional(z.string().check(z.maxLength(2048))),
  useTiles: z.optional(z.boolean()),
  /** Natural Earth world land under imported data (absent in older workspaces: on). */
  worldLand: z.optional(z.boolean()),
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
  salinity: finiteWhere((v) => v >= 0 && v <= 70, "a practical salinity between 0 and 70"),
  conc: finite,
  concSd: z.optional(nonNegative),
});
/** Analysis choices (end-member overrides, precision, discharge, constants). Unknown keys are kept. */
export const analysisChoicesSchema = z.looseObject({
  endmemberOverrides: z.optional(
    z.record(z.string(), z.object({ river: z.optional(endmember), sea: z.optional(endmember) })),
  ),
  precisionPercent: z.optional(z.record(z.string(), positive)),
  riverDischargeM3s: z.optional(positive),
  constantSet: z.optional(z.string()),
  saltIntrusionSalinity: z.optional(finite),
  selectedSurvey: z.optional(z.string()),
  selectedConstituent: z.optional(z.string()),
  /** Which end of the centerline is the mouth (absent: the one mouth rule decides). */
  mouth: z.optional(z.enum(["start", "end"])),
  /** Stations farther than this from the centerline are off-channel [m]. */
  offChannelM: z.optional(nonNegative),
  /** Keep off-channel stations in the fits and end-members. */
  keepOffChannel: z.optional(z.boolean()),
  /** Archive seasons: named sets of months 1–12 (absent: meteorological seasons). */
  archiveSeasons: z.optional(
    z
      .array(
        z.object({
          name: text.check(z.minLength(1)),
          months: z.array(z.int().check(z.gte(1), z.lte(12))).check(z.minLength(1), z.maxLength(12)),
        }),
      )
      .check(z.maxLength(12)),
  ),
  /** A daily river discharge table (date, m³/s) joined to the surveys by date, kept as its file text. */
  dischargeTable: z.optional(
    z.object({ name: text, text: z.string().check(z.maxLength(WORKSPACE_LIMITS.maxDischargeTableChars)) }),
  ),
});

/** One file's import record: what was read and what was found. */
export const importRecordSchema = z.object({
  file: z.string(),
  shape: z.optional(z.string()),
  rowsRead: z.optional(z.int()),
  rowsAccepted: z.optional(z.int()),
  rowsRejected: z.optional(z.int()),
  issues: z.array(importIssueSchema),
});

/** The workspace document, version 2. */
export const workspaceSchema = z.object({
  format: z.literal(WORKSPACE_FORMAT),
  version: z.literal(WORKSPACE_VERSION),
  name: z.optional(z.string()),
  savedAt: z.optional(z.string()),
  surveys: z.array(surveySchema).check(z.maxLength(WORKSPACE_LIMITS.maxSurveys)),
  centerline: z.nullable(centerlineSchema),
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
