import { num, v } from "./validation.ts";
import { WORKSPACE_FORMAT } from "./workspaceSchema.ts";

/**
 * Version 1 workspace (the first saved shape): surveys, the centerline as a bare list of
 * [lon, lat] pairs, mappings keyed by file shape, and a single survey-gap setting.
 */
export const workspaceV1Schema = v.looseObject({
  version: v.literal(1),
  name: v.optional(v.string()),
  surveys: v.array(v.unknown()),
  centerline: v.optional(v.array(v.tuple([num, num]))),
  mappings: v.optional(v.record(v.string(), v.looseObject({ columns: v.array(v.unknown()) }))),
  surveyGapDays: v.optional(num),
  analysis: v.optional(v.record(v.string(), v.unknown())),
});

/**
 * Migrates a version 1 document to version 2: the centerline list becomes a GeoJSON LineString
 * feature (or null when shorter than 2 points), mappings become a list with their shape key, the
 * survey gap becomes `settings.grouping = {by: "dateGap", gapDays}`, and the new lists (imports)
 * start empty.
 *
 * @param doc a document that passed {@link workspaceV1Schema}
 * @returns a version 2 document (to be validated by the v2 schema)
 */
export function migrateV1toV2(doc: v.InferOutput<typeof workspaceV1Schema>): Record<string, unknown> {
  const line = doc.centerline ?? [];
  const centerline =
    line.length >= 2 ? { type: "Feature", geometry: { type: "LineString", coordinates: line }, properties: {} } : null;
  const mappings = Object.entries(doc.mappings ?? {}).map(([shape, m]) => ({ ...m, shape }));
  const settings: Record<string, unknown> = {};
  if (doc.surveyGapDays !== undefined) settings.grouping = { by: "dateGap", gapDays: doc.surveyGapDays };
  const out: Record<string, unknown> = {
    format: WORKSPACE_FORMAT,
    version: 2,
    surveys: doc.surveys,
    centerline,
    mappings,
    imports: [],
    settings,
    analysis: doc.analysis ?? {},
  };
  if (doc.name !== undefined) out.name = doc.name;
  return out;
}

/** Migration steps: from version n to n + 1. */
export const WORKSPACE_MIGRATIONS: Readonly<
  Record<number, { schema: v.GenericSchema; migrate: (doc: never) => Record<string, unknown> }>
> = {
  1: { schema: workspaceV1Schema, migrate: migrateV1toV2 as (doc: never) => Record<string, unknown> },
};
