// The workspace document's version, format tag and size caps, apart from its schema
// (workspaceSchema.ts) so code that only makes a new document needs no schema library.
/** Current workspace document version. */
export const WORKSPACE_VERSION = 2;
/** The format tag every workspace document carries. */
export const WORKSPACE_FORMAT = "brackline-workspace";

/** Size caps of a workspace document (see README "Limits"). */
export const WORKSPACE_LIMITS = {
  /** Longest workspace text read [characters]. */
  maxChars: 100_000_000,
  /** Most stations over all surveys. */
  maxStations: 100_000,
  /** Most surveys. */
  maxSurveys: 1_000,
  /** Most constituents per survey. */
  maxConstituents: 500,
  /** Most vertices in the centerline. */
  maxCenterlineVertices: 1_000_000,
  /** Longest text field (ids, names, original cell text) [characters]. */
  maxTextChars: 10_000,
} as const;
