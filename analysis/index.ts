// Brackline analysis core: the single source of every number the dashboard and CLI show.
// Pure TypeScript (no DOM); explicit named re-exports only, grouped by area.

// --- survey data model ---
export type { CellStatus, ValueCell, Station, Constituent, Survey, ImportIssue } from "./survey/survey.ts";
// --- end survey ---

// --- geometry ---
// --- end geometry ---

// --- mixing ---
export type {
  Estimate,
  Endmember,
  DilutionLine,
  StationDeviation,
  MixingWarning,
  BehaviourClass,
  ReactionZone,
  MidEstuarineMaximum,
} from "./mixing/result.ts";
// --- end mixing ---

// --- seawater ---
// --- end seawater ---

// --- io ---
// --- end io ---

// --- pipeline ---
// --- end pipeline ---

// --- compare ---
// --- end compare ---

// --- report ---
// --- end report ---
