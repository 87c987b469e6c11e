import { checkSchema, type SchemaIssue } from "./validation.ts";
import type { ImportIssue } from "../survey/survey.ts";
import { makeIssue } from "./importSummary.ts";
import { WORKSPACE_MIGRATIONS } from "./workspaceMigrations.ts";
import type { WorkspaceDocument } from "./workspaceSchema.ts";
import {
  isTileUrlTemplate,
  surveySchema,
  WORKSPACE_LIMITS,
  WORKSPACE_VERSION,
  workspaceSchema,
} from "./workspaceSchema.ts";
import { appendAll } from "../survey/arrayExtent.ts";

const FILE = "workspace";

export { createWorkspace } from "./newWorkspace.ts";

/**
 * Writes a workspace document as JSON text after validating it against the current schema.
 *
 * @param ws the workspace document
 * @returns pretty-printed JSON (2-space indent, keys in schema order)
 * @throws TypeError naming the first invalid path when the document does not match the schema
 *   (e.g. a non-finite number, which JSON cannot hold)
 */
export function exportWorkspace(ws: WorkspaceDocument): string {
  const checked = checkSchema(workspaceSchema, ws);
  if (!checked.success) {
    const first = checked.issues[0];
    throw new TypeError(
      `exportWorkspace(): ws.${first?.path ?? ""} is invalid: ${first?.message ?? "schema mismatch"}`,
    );
  }
  // The validated copy has the schema's key order, so export(import(export(ws))) is byte-identical.
  return JSON.stringify(checked.data, null, 2);
}

function countVertices(x: unknown, depth = 0): number {
  if (!Array.isArray(x) || depth > 6) return 0;
  if (x.length > 0 && typeof x[0] === "number") return 1;
  let n = 0;
  for (const y of x) n += countVertices(y, depth + 1);
  return n;
}

/** Checks the size caps before the (costly) schema validation. */
function sizeProblem(record: Record<string, unknown>): ImportIssue | undefined {
  const surveys = Array.isArray(record.surveys) ? (record.surveys as unknown[]) : [];
  let stations = 0;
  for (const s of surveys) {
    const st = (s as { stations?: unknown } | null)?.stations;
    if (Array.isArray(st)) stations += st.length;
  }
  if (stations > WORKSPACE_LIMITS.maxStations)
    return makeIssue(
      FILE,
      0,
      "surveys",
      `${stations} stations`,
      `at most ${WORKSPACE_LIMITS.maxStations} stations in one workspace; split the surveys over several workspaces`,
    );
  const c = record.centerline as { geometry?: { coordinates?: unknown }; features?: unknown } | null | undefined;
  const features = Array.isArray(c?.features) ? (c.features as { geometry?: { coordinates?: unknown } }[]) : [c];
  let vertices = 0;
  for (const f of features) vertices += countVertices(f?.geometry?.coordinates);
  if (vertices > WORKSPACE_LIMITS.maxCenterlineVertices)
    return makeIssue(
      FILE,
      0,
      "centerline",
      `${vertices} vertices`,
      `a centerline of at most ${WORKSPACE_LIMITS.maxCenterlineVertices} vertices; simplify it`,
    );
  return undefined;
}

function schemaIssues(found: SchemaIssue[], prefix: string): ImportIssue[] {
  return found.slice(0, 50).map((i) => makeIssue(FILE, 0, `${prefix}${i.path}`, "", i.message));
}

/**
 * Reads a workspace document from JSON text: migrates older versions step by step (1 → 2, ...),
 * then validates with the current schema. A survey that fails validation is left out with an issue
 * naming its path; any other invalid part makes the whole document unreadable (workspace undefined).
 * Never throws.
 *
 * @param text JSON text written by exportWorkspace (any version)
 * @returns the workspace (undefined when unreadable) and the issues found
 */
export function importWorkspace(text: string): { workspace: WorkspaceDocument | undefined; issues: ImportIssue[] } {
  const issues: ImportIssue[] = [];
  if (text.length > WORKSPACE_LIMITS.maxChars) {
    issues.push(
      makeIssue(
        FILE,
        0,
        "",
        `${text.length} characters`,
        `a workspace of at most ${WORKSPACE_LIMITS.maxChars} characters (about ${WORKSPACE_LIMITS.maxStations} stations); split the surveys over several workspaces`,
      ),
    );
    return { workspace: undefined, issues };
  }
  let doc: unknown;
  try {
    doc = JSON.parse(text.replace(/^\uFEFF/, "")) as unknown;
  } catch (err) {
    issues.push(
      makeIssue(FILE, 0, "", text.slice(0, 80), `JSON text (${err instanceof Error ? err.message : "parse error"})`),
    );
    return { workspace: undefined, issues };
  }
  if (typeof doc !== "object" || doc === null || Array.isArray(doc)) {
    issues.push(makeIssue(FILE, 0, "", String(doc).slice(0, 80), "a workspace object"));
    return { workspace: undefined, issues };
  }
  let version = (doc as { version?: unknown }).version;
  if (typeof version !== "number" || !Number.isInteger(version) || version < 1) {
    issues.push(makeIssue(FILE, 0, "version", String(version), `a workspace version 1…${WORKSPACE_VERSION}`));
    return { workspace: undefined, issues };
  }
  if (version > WORKSPACE_VERSION) {
    issues.push(
      makeIssue(
        FILE,
        0,
        "version",
        String(version),
        `version ${WORKSPACE_VERSION} or older (written by a newer Brackline)`,
      ),
    );
    return { workspace: undefined, issues };
  }
  while (version < WORKSPACE_VERSION) {
    const step = WORKSPACE_MIGRATIONS[version];
    const parsed = step === undefined ? undefined : checkSchema(step.schema, doc);
    if (step === undefined || parsed === undefined || !parsed.success) {
      if (parsed !== undefined && !parsed.success) appendAll(issues, schemaIssues(parsed.issues, ""));
      issues.push(makeIssue(FILE, 0, "version", String(version), `a valid version ${version} document to migrate`));
      return { workspace: undefined, issues };
    }
    doc = step.migrate(parsed.data as never);
    issues.push(makeIssue(FILE, 0, "version", String(version), `version ${version + 1} (migrated)`, "warning"));
    version += 1;
  }
  const record = doc as Record<string, unknown>;
  const size = sizeProblem(record);
  if (size !== undefined) {
    issues.push(size);
    return { workspace: undefined, issues };
  }
  if (Array.isArray(record.surveys)) {
    record.surveys = record.surveys.filter((s, i) => {
      const r = checkSchema(surveySchema, s);
      if (!r.success)
        issues.push(
          ...schemaIssues(r.issues, `surveys.${i}.`),
          makeIssue(FILE, 0, `surveys.${i}`, "", "a valid survey; this survey was left out", "warning"),
        );
      return r.success;
    });
  }
  const result = checkSchema(workspaceSchema, record);
  if (!result.success) {
    appendAll(issues, schemaIssues(result.issues, ""));
    return { workspace: undefined, issues };
  }
  const tiles = result.data.settings.tileUrl;
  if (tiles !== undefined && tiles !== "" && !isTileUrlTemplate(tiles)) {
    delete result.data.settings.tileUrl;
    result.data.settings.useTiles = false;
    issues.push(
      makeIssue(
        FILE,
        0,
        "settings.tileUrl",
        tiles,
        "an https:// tile URL template with {z}, {x} and {y}; the tile URL was left out",
        "warning",
      ),
    );
  } else if (tiles !== undefined && tiles !== "" && result.data.settings.useTiles === true) {
    // A shared workspace must not make the browser contact a server the user did not choose.
    result.data.settings.useTiles = false;
    issues.push(
      makeIssue(
        FILE,
        0,
        "settings.tileUrl",
        tiles,
        "tiles from a server you chose: the workspace names an external tile server, left off until you turn it on",
        "warning",
      ),
    );
  }
  // JSON drops undefined values; give every cell its `value` key back so cells match the survey model.
  const workspace = result.data as unknown as WorkspaceDocument;
  for (const survey of workspace.surveys) {
    for (const st of survey.stations) {
      for (const cell of [st.salinity, st.temperatureC, st.pH, ...Object.values(st.values)]) {
        if (cell !== undefined && !Object.hasOwn(cell, "value")) cell.value = undefined;
      }
    }
  }
  return { workspace, issues };
}
