/**
 * Map-ready geometry the worker derives from the channel and each survey's analysis (built by
 * analysis/workspace, so the map only draws). Only re-exported here (the types of analysis/workspace/overlay.ts) for the dashboard's map code.
 */
export type { ChannelOverlay, ConstituentOverlay, LonLat, SurveyOverlay } from "../../../analysis/index.ts";
