/** Sorting of the behaviour table: column keys, sort values and a stable comparator. */
import { behaviourLabel } from "./format.ts";
import type { ConstituentAnalysisView } from "./types.ts";
import { minOf } from "../../../../analysis/survey/arrayExtent.ts";

export type SortKey = "name" | "class" | "change" | "effective" | "zoneSalinity" | "zoneKm" | "maximum" | "warnings";
export type SortDirection = "ascending" | "descending";

/** Value a row sorts by in column `key`; undefined sorts last in either direction. */
export function sortValue(c: ConstituentAnalysisView, key: SortKey): string | number | undefined {
  switch (key) {
    case "name":
      return c.name;
    case "class":
      return behaviourLabel[c.class];
    case "change":
      return c.percentChange?.value;
    case "effective":
      return c.effectiveEndmember?.value;
    case "zoneSalinity":
      return c.reactionZone ? minOf(c.reactionZone.salinity) : undefined;
    case "zoneKm":
      return c.reactionZone?.km.length ? minOf(c.reactionZone.km.flat()) : undefined;
    case "maximum":
      return c.maximum?.salinity.value;
    case "warnings":
      return c.warnings.length;
  }
}

/** Rows sorted by `key` in `direction`; ties keep their original order; missing values last. */
export function sortRows(
  rows: readonly ConstituentAnalysisView[],
  key: SortKey,
  direction: SortDirection,
): ConstituentAnalysisView[] {
  const sign = direction === "ascending" ? 1 : -1;
  return rows
    .map((row, i) => ({ row, i, v: sortValue(row, key) }))
    .sort((a, b) => {
      if (a.v === undefined || b.v === undefined) {
        if (a.v === b.v) return a.i - b.i;
        return a.v === undefined ? 1 : -1;
      }
      const cmp =
        typeof a.v === "number" && typeof b.v === "number"
          ? a.v - b.v
          : String(a.v).localeCompare(String(b.v), "en", { numeric: true, sensitivity: "base" });
      return cmp !== 0 ? sign * cmp : a.i - b.i;
    })
    .map((x) => x.row);
}
