/**
 * Map-ready geometry the worker derives from the channel and each survey's analysis (built by
 * analysis/workspace, so the map only draws). Re-exported here for the dashboard's map code.
 */
export type { ChannelOverlay, ConstituentOverlay, LonLat, SurveyOverlay } from "../../../analysis/index.ts";
import type { SurveyOverlay } from "../../../analysis/index.ts";

export function emptySurveyOverlay(): SurveyOverlay {
  return { isohalines: [], constituents: {} };
}
