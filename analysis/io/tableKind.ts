import { suggestMapping } from "./suggestMapping.ts";

/**
 * Tells a station table from a survey file by its columns: a station table has a station id and a
 * place (latitude/longitude, projected x/y, or an along-channel distance) but no salinity,
 * conductivity, constituent or date column, and each station id once.
 *
 * @param headers the header texts
 * @param sampleRows some data rows (cell text in header order)
 * @returns "stationTable" or "survey"
 */
export function classifyTable(
  headers: readonly string[],
  sampleRows: readonly (readonly string[])[] = [],
): "stationTable" | "survey" {
  const m = suggestMapping(headers, sampleRows);
  const roles = new Set(m.columns.map((c) => c.role));
  const place =
    (roles.has("latitude") && roles.has("longitude")) || (roles.has("x") && roles.has("y")) || roles.has("distance");
  const measured = ["salinity", "conductivity", "constituent", "date", "dateTime", "depth"].some((r) =>
    roles.has(r as never),
  );
  if (!roles.has("station") || !place || measured) return "survey";
  const idIdx = m.columns.findIndex((c) => c.role === "station");
  const ids = sampleRows.map((r) => (r[idIdx] ?? "").trim()).filter((x) => x !== "");
  return new Set(ids).size === ids.length ? "stationTable" : "survey";
}
