/**
 * The archive series as one long table (one row per survey, constituent and quantity), for CSV.
 */
import type { ArchiveSummary } from "./types.ts";

/** Column headers of {@link archiveTableRows}. */
export const ARCHIVE_TABLE_COLUMNS = [
  "survey",
  "date",
  "season",
  "discharge_m3s",
  "discharge_source",
  "constituent",
  "class",
  "quantity",
  "unit",
  "value",
  "lower95",
  "upper95",
] as const;

/** One cell: text, number or empty. */
export type ArchiveCell = string | number | undefined;

/**
 * Long table of the archive: per survey the salt-intrusion length, then per constituent its class
 * (as a row with quantity "class"), % change and C*₀ with 95 % intervals, reaction-zone ends in km
 * and salinity, and the maximum's km and salinity. Empty cells mean "not available".
 *
 * @param a the archive summary
 * @returns header and rows, in survey date order
 */
export function archiveTableRows(a: ArchiveSummary): {
  header: readonly string[];
  rows: ArchiveCell[][];
} {
  const rows: ArchiveCell[][] = [];
  const push = (
    p: { survey: string; date?: string; season?: string; dischargeM3s?: number },
    source: string | undefined,
    constituent: string,
    cls: string,
    quantity: string,
    unit: string,
    value: number | string | undefined,
    lower?: number,
    upper?: number,
  ) => {
    if (value === undefined) return;
    rows.push([
      p.survey,
      p.date,
      p.season,
      p.dischargeM3s,
      source,
      constituent,
      cls,
      quantity,
      unit,
      value,
      lower,
      upper,
    ]);
  };
  for (const p of a.intrusion) {
    push(p, undefined, "", "", `salt_intrusion_S${p.saltIntrusionSalinity}`, "km", p.saltIntrusionKm);
    push(p, undefined, "", "", `salt_intrusion_S${p.saltIntrusionSalinity}_at_least`, "km", p.saltIntrusionAtLeastKm);
    push(p, undefined, "", "", `salt_intrusion_S${p.saltIntrusionSalinity}_at_most`, "km", p.saltIntrusionAtMostKm);
  }
  for (const s of a.series)
    for (const p of s.points) {
      const base = [p, p.dischargeSource, s.name, p.class] as const;
      push(...base, "class", "", p.class);
      push(...base, "percent_change", "%", p.percentChange?.value, p.percentChange?.lower, p.percentChange?.upper);
      const e = p.effectiveEndmember;
      push(...base, "effective_endmember_C0star", s.unit, e?.value, e?.lower, e?.upper);
      push(...base, "reaction_zone_seaward_km", "km", p.reactionZoneKm?.[0]);
      push(...base, "reaction_zone_landward_km", "km", p.reactionZoneKm?.[1]);
      push(...base, "reaction_zone_salinity_from", "", p.reactionZoneSalinity?.[0]);
      push(...base, "reaction_zone_salinity_to", "", p.reactionZoneSalinity?.[1]);
      push(...base, "maximum_km", "km", p.maximumKm);
      const m = p.maximumSalinity;
      push(...base, "maximum_salinity", "", m?.value, m?.lower, m?.upper);
    }
  return { header: ARCHIVE_TABLE_COLUMNS, rows };
}
