// A new, empty workspace document, apart from the workspace reader and writer (workspace.ts, which
// validate with a schema) so the dashboard's first page can make one without the schema library.
import { WORKSPACE_FORMAT, WORKSPACE_VERSION } from "./workspaceFormat.ts";
import type { WorkspaceDocument } from "./workspaceSchema.ts";

/** A new, empty workspace document (current version). */
export function createWorkspace(name?: string): WorkspaceDocument {
  const ws: WorkspaceDocument = {
    format: WORKSPACE_FORMAT,
    version: WORKSPACE_VERSION,
    surveys: [],
    centerline: null,
    mappings: [],
    imports: [],
    settings: {},
    analysis: {},
  };
  if (name !== undefined) ws.name = name;
  return ws;
}
