// The file kinds readInputs reads and their names for people, apart from the kind detection
// (fileKind.ts, which parses text) so a label costs no parser.
/** File kinds readInputs reads. */
export type InputFileKind = "surveyText" | "stationTable" | "surveyGeoJson" | "centerline" | "surveyNetcdf" | "unknown";

/** Plain-words names of the file kinds (messages, dashboard labels). */
export const FILE_KIND_LABELS: Record<InputFileKind, string> = {
  surveyText: "survey table",
  stationTable: "station table",
  surveyGeoJson: "survey points (GeoJSON)",
  centerline: "channel centerline (GeoJSON)",
  surveyNetcdf: "survey (netCDF)",
  unknown: "not recognised",
};

/**
 * The role a file read by readInputs plays in a briefing's provenance table (CLI and dashboard alike).
 *
 * @param kind the kind readInputs recognised (`InputFileReport.kind`)
 * @returns "survey", "stations", "centerline" or "other"
 */
export function provenanceRoleOf(kind: InputFileKind | undefined): "survey" | "stations" | "centerline" | "other" {
  if (kind === "stationTable") return "stations";
  if (kind === "centerline") return "centerline";
  if (kind === "surveyText" || kind === "surveyGeoJson" || kind === "surveyNetcdf") return "survey";
  return "other";
}
