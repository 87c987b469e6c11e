import { int, json, v } from "./validation.ts";
import type { Survey } from "../survey/survey.ts";
import { columnMappingSchema } from "./columnMapping.ts";
import { canonicalUnitText, concentrationUnitText } from "./unitText.ts";

import { WORKSPACE_FORMAT, WORKSPACE_LIMITS, WORKSPACE_VERSION } from "./workspaceFormat.ts";

export { WORKSPACE_FORMAT, WORKSPACE_LIMITS, WORKSPACE_VERSION };

const finite = v.pipe(v.number(), v.finite("a finite number"));
/** A finite number that also meets `test` (message `what`). */
const finiteWhere = (test: (v: number) => boolean, what: string) =>
  v.pipe(v.number(), v.finite("a finite number"), v.check(test, what));
const nonNegative = finiteWhere((v) => v >= 0, "a number ≥ 0");
const positive = finiteWhere((v) => v > 0, "a number > 0");
const text = v.pipe(
  v.string(),
  v.maxLength(WORKSPACE_LIMITS.maxTextChars, `at most ${WORKSPACE_LIMITS.maxTextChars} characters`),
);
const lonLat = v.tuple([
  finiteWhere((v) => v >= -180 && v <= 180, "a longitude between -180 and 180"),
  finiteWhere((v) => v >= -90 && v <= 90, "a latitude between -90 and 90"),
]);

export const valueCellSchema = v.pipe(
  v.object({
    value: v.optional(finite),
    original: text,
    status: v.picklist(["measured", "belowDetection", "missing", "invalid"]),
    detectionLimit: v.optional(nonNegative),
    qcFlag: v.optional(text),
    accepted: v.boolean(),
  }),
  v.forward(
    v.check(
      (c) => (c.status === "measured") === (c.value !== undefined),
      "a value exactly when the status is measured (a missing, censored or invalid cell carries none)",
    ),
    ["value"],
  ),
  v.forward(
    v.check(
      (c) => c.detectionLimit === undefined || c.status === "belowDetection",
      "a detection limit only on a below-detection cell",
    ),
    ["detectionLimit"],
  ),
);

/** A value cell whose measured value must lie in [min, max]. */
function cellWithin(min: number, max: number, what: string) {
  return v.pipe(
    valueCellSchema,
    v.forward(
      v.check((c) => c.value === undefined || (c.value >= min && c.value <= max), `${what} between ${min} and ${max}`),
      ["value"],
    ),
  );
}

export const stationSchema = v.looseObject({
  id: text,
  time: v.optional(text),
  lonLat: v.optional(lonLat),
  depthM: v.optional(nonNegative),
  salinity: cellWithin(0, 70, "a practical salinity"),
  temperatureC: v.optional(cellWithin(-5, 60, "a temperature [°C]")),
  pH: v.optional(cellWithin(0, 14, "a pH")),
  values: v.record(text, valueCellSchema),
  sourceRow: v.pipe(int, v.minValue(0)),
  sourceFile: text,
  surveyLabel: v.optional(text),
  layer: v.optional(v.picklist(["surface", "bottom", "middle", "shallowest", "depthAveraged", "depthRange"])),
  distanceKm: v.optional(finite),
  dischargeM3s: v.optional(nonNegative),
  rowFlag: v.optional(text),
  contributingRows: v.optional(v.array(int)),
});

const constituentSchema = v.object({
  name: text,
  unit: v.pipe(
    text,
    v.check(
      (u) => concentrationUnitText(u) === u || canonicalUnitText(u) === u,
      "a unit from the units table, written as the table writes it (e.g. nmol/L, µmol/kg, µg/L, NTU)",
    ),
  ),
  header: text,
  kind: v.optional(v.picklist(["tracer", "nonMixing"])),
  kindReason: v.optional(text),
});

export const surveySchema = v.object({
  name: text,
  startDate: v.optional(text),
  endDate: v.optional(text),
  riverDischargeM3s: v.optional(positive),
  stations: v.pipe(v.array(stationSchema), v.maxLength(WORKSPACE_LIMITS.maxStations)),
  constituents: v.pipe(v.array(constituentSchema), v.maxLength(WORKSPACE_LIMITS.maxConstituents)),
});

export const importIssueSchema = v.object({
  file: v.string(),
  row: int,
  column: v.string(),
  value: v.string(),
  expected: v.string(),
  severity: v.picklist(["error", "warning"]),
});

const position = v.pipe(v.array(finite), v.minLength(2), v.maxLength(3));
const line = v.pipe(v.array(position), v.minLength(2));
const lineGeometry = v.union([
  v.object({ type: v.literal("LineString"), coordinates: line }),
  v.object({ type: v.literal("MultiLineString"), coordinates: v.array(line) }),
]);
const markerGeometry = v.object({ type: v.literal("Point"), coordinates: position });
const properties = v.nullable(v.record(v.string(), json));
const lineFeature = v.looseObject({ type: v.literal("Feature"), geometry: lineGeometry, properties });
const anyFeature = v.looseObject({
  type: v.literal("Feature"),
  geometry: v.union([lineGeometry, markerGeometry]),
  properties,
});
/**
 * Channel centerline: a GeoJSON (RFC 7946) line feature, or a collection of line features that may
 * also hold Point markers (mouth, head).
 */
export const centerlineSchema = v.union([
  lineFeature,
  v.looseObject({ type: v.literal("FeatureCollection"), features: v.array(anyFeature) }),
]);

const layerChoice = v.union([
  v.object({ kind: v.picklist(["all", "shallowest", "surface", "bottom", "depthAveraged"]) }),
  v.object({ kind: v.literal("depthRange"), minM: finite, maxM: finite }),
]);
const grouping = v.union([
  v.object({ by: v.picklist(["column", "date"]) }),
  v.object({ by: v.literal("dateGap"), gapDays: v.optional(finite) }),
  v.object({ by: v.literal("file"), name: v.optional(v.string()) }),
]);

/** Import and display settings. Unknown keys are kept (forward compatible). */
export const workspaceSettingsSchema = v.looseObject({
  layer: v.optional(layerChoice),
  grouping: v.optional(grouping),
  flagMap: v.optional(v.record(v.string(), v.picklist(["accept", "reject", "missing"]))),
  colouring: v.optional(v.string()),
  /** Raster tile URL template; checked by {@link isTileUrlTemplate} when a workspace is read. */
  tileUrl: v.optional(v.pipe(v.string(), v.maxLength(2048))),
  useTiles: v.optional(v.boolean()),
  /** Natural Earth world land under imported data (absent in older workspaces: on). */
  worldLand: v.optional(v.boolean()),
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

const endmember = v.object({
  salinity: finiteWhere((v) => v >= 0 && v <= 70, "a practical salinity between 0 and 70"),
  conc: finite,
  concSd: v.optional(nonNegative),
});
/** Analysis choices (end-member overrides, precision, discharge, constants). Unknown keys are kept. */
export const analysisChoicesSchema = v.looseObject({
  endmemberOverrides: v.optional(
    v.record(v.string(), v.object({ river: v.optional(endmember), sea: v.optional(endmember) })),
  ),
  precisionPercent: v.optional(v.record(v.string(), positive)),
  riverDischargeM3s: v.optional(positive),
  constantSet: v.optional(v.string()),
  saltIntrusionSalinity: v.optional(finite),
  selectedSurvey: v.optional(v.string()),
  selectedConstituent: v.optional(v.string()),
  /** Which end of the centerline is the mouth (absent: the one mouth rule decides). */
  mouth: v.optional(v.picklist(["start", "end"])),
  /** Stations farther than this from the centerline are off-channel [m]. */
  offChannelM: v.optional(nonNegative),
  /** Keep off-channel stations in the fits and end-members. */
  keepOffChannel: v.optional(v.boolean()),
  /** Archive seasons: named sets of months 1–12 (absent: meteorological seasons). */
  archiveSeasons: v.optional(
    v.pipe(
      v.array(
        v.object({
          name: v.pipe(text, v.minLength(1)),
          months: v.pipe(v.array(v.pipe(int, v.minValue(1), v.maxValue(12))), v.minLength(1), v.maxLength(12)),
        }),
      ),
      v.maxLength(12),
    ),
  ),
  /** A daily river discharge table (date, m³/s) joined to the surveys by date, kept as its file text. */
  dischargeTable: v.optional(
    v.object({ name: text, text: v.pipe(v.string(), v.maxLength(WORKSPACE_LIMITS.maxDischargeTableChars)) }),
  ),
});

/** One file's import record: what was read and what was found. */
export const importRecordSchema = v.object({
  file: v.string(),
  shape: v.optional(v.string()),
  rowsRead: v.optional(int),
  rowsAccepted: v.optional(int),
  rowsRejected: v.optional(int),
  issues: v.array(importIssueSchema),
});

/** The workspace document, version 2. */
export const workspaceSchema = v.object({
  format: v.literal(WORKSPACE_FORMAT),
  version: v.literal(WORKSPACE_VERSION),
  name: v.optional(v.string()),
  savedAt: v.optional(v.string()),
  surveys: v.pipe(v.array(surveySchema), v.maxLength(WORKSPACE_LIMITS.maxSurveys)),
  centerline: v.nullable(centerlineSchema),
  mappings: v.array(columnMappingSchema),
  imports: v.array(importRecordSchema),
  settings: workspaceSettingsSchema,
  analysis: analysisChoicesSchema,
});

/**
 * The workspace document: surveys, centerline, mappings, import records, settings and analysis
 * choices. Surveys use the shared survey model (stations may carry the reader's extra fields).
 */
export type WorkspaceDocument = Omit<v.InferOutput<typeof workspaceSchema>, "surveys"> & { surveys: Survey[] };
