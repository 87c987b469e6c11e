/**
 * The data notice printed at the top of the briefing: the top-level
 * "disclaimer" of the map GeoJSON, else a feature note saying the data are
 * invented (as `brackline report` reads it from its map files).
 */
export function dataNoticeOf(geojson: unknown): string | undefined {
  const g = geojson as
    { disclaimer?: unknown; features?: Array<{ properties?: { note?: unknown } | null }> } | undefined;
  if (!g) return undefined;
  if (typeof g.disclaimer === "string" && g.disclaimer.trim()) return g.disclaimer.trim();
  const note = (Array.isArray(g.features) ? g.features : [])
    .map((f) => f.properties?.note)
    .find((n): n is string => typeof n === "string" && /invented/i.test(n));
  return note;
}

/** File name of the downloaded briefing, from the survey names. */
export function briefingFileName(surveyNames: readonly string[]): string {
  const slug = surveyNames
    .join("-")
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, "-")
    .replace(/^-+|-+$/g, "");
  return `briefing-${slug || "survey"}.html`;
}
