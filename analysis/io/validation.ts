import * as v from "valibot";

/**
 * The validation library for the workspace and mapping schemas: valibot, whose schemas and checks
 * are separate functions (`v.pipe(v.number(), v.check(...))`), so the dashboard ships only the ones
 * these schemas use. This file adds the few pieces the schemas share and one way to report issues.
 */
export { v };

/** A finite number (JSON holds no NaN or infinity). */
export const num = v.pipe(v.number(), v.finite());

/** A safe integer. */
export const int = v.pipe(v.number(), v.safeInteger());

/** A JSON value: text, finite number, true/false, null, or lists and objects of JSON values. */
export type JsonValue = string | number | boolean | null | JsonValue[] | { [key: string]: JsonValue };
export const json: v.GenericSchema<JsonValue> = v.lazy(() =>
  v.union([v.string(), num, v.boolean(), v.null(), v.array(json), v.record(v.string(), json)]),
);

/** One problem a schema found: the dotted path to the value ("surveys.0.name") and what was expected. */
export interface SchemaIssue {
  path: string;
  message: string;
}

/**
 * Checks `input` against `schema`: the validated copy (keys in the schema's order, unknown keys
 * dropped except where the schema keeps them), or the issues found.
 */
export function checkSchema<S extends v.GenericSchema>(
  schema: S,
  input: unknown,
): { success: true; data: v.InferOutput<S> } | { success: false; issues: SchemaIssue[] } {
  const result = v.safeParse(schema, input);
  if (result.success) return { success: true, data: result.output };
  return {
    success: false,
    issues: result.issues.map((i) => ({ path: v.getDotPath(i) ?? "", message: i.message })),
  };
}
