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

/** File name of the downloaded briefing, from the survey names (first and last, and how many, beyond two). */
export function briefingFileName(surveyNames: readonly string[]): string {
  const n = surveyNames.length;
  const parts = n > 2 ? [surveyNames[0]!, "to", surveyNames[n - 1]!, `${n}-surveys`] : surveyNames;
  const slug = parts
    .join("-")
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, "-")
    .replace(/^-+|-+$/g, "");
  return `briefing-${slug || "survey"}.html`;
}
