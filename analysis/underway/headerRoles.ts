/**
 * Recognises the columns of an underway log from its headers, reusing the survey reader's header
 * rules (analysis/io suggestMapping and splitHeaderUnit) and adding the optical sensors a
 * flow-through system logs (fluorescence, turbidity).
 */
import { splitHeaderUnit } from "../io/headerUnits.ts";
import { suggestMapping } from "../io/suggestMapping.ts";
import type { UnderwayRole } from "./types.ts";

/** A recognised column of an underway log. */
export interface UnderwayColumnRole {
  index: number;
  header: string;
  role: UnderwayRole;
  /** Unit text as written in the header ("" when none). */
  unitText: string;
  /** Canonical unit when recognised ("°C", "mS/cm", "PSU", "NTU"). */
  unit?: string;
}

const FLUORESCENCE =
  /^(fluorescence|fluor|fluo|fl|chl|chla|chl a|chlorophyll|chlorophyll a|chl fluorescence|chlorophyll fluorescence)$/;
const TURBIDITY = /^(turbidity|turb|tu|backscatter turbidity)$/;
const DATE_IN_TEXT = /^\d{1,4}[-/.]\d{1,2}[-/.]\d{1,4}[T ]/;
const TIME_ONLY = /^(time|time utc|time of day|hhmmss)$/;

function simple(name: string): string {
  return name
    .toLowerCase()
    .replace(/[_\-.,:/]+/g, " ")
    .replace(/\s+/g, " ")
    .trim();
}

/**
 * Assigns a role to each header: date-time (or date + time of day), latitude, longitude, salinity,
 * conductivity, temperature (as the survey reader recognises them), fluorescence and turbidity.
 * The first column of each role wins; the others are ignored.
 *
 * @param headers header texts of the log
 * @param sampleRows a few data rows, used to tell a date column holding date-times from a plain date
 * @returns the recognised columns, in header order
 * @throws TypeError when headers is not an array of strings (from suggestMapping)
 */
export function underwayColumnRoles(
  headers: readonly string[],
  sampleRows: readonly (readonly string[])[] = [],
): UnderwayColumnRole[] {
  const mapping = suggestMapping(headers, sampleRows);
  const out: UnderwayColumnRole[] = [];
  const used = new Set<UnderwayRole>();
  headers.forEach((header, index) => {
    const parts = splitHeaderUnit(header);
    const name = simple(parts.name);
    const suggested = mapping.columns[index]?.role;
    let role: UnderwayRole | undefined;
    if (suggested === "dateTime") role = "time";
    else if (suggested === "date") role = "date";
    else if (suggested === "time" || TIME_ONLY.test(name))
      role = sampleRows.some((r) => DATE_IN_TEXT.test((r[index] ?? "").trim())) ? "time" : "timeOfDay";
    else if (suggested === "latitude" || suggested === "longitude" || suggested === "salinity") role = suggested;
    else if (suggested === "conductivity" || suggested === "temperature") role = suggested;
    else if (FLUORESCENCE.test(name)) role = "fluorescence";
    else if (TURBIDITY.test(name)) role = "turbidity";
    if (role === undefined || used.has(role)) return;
    used.add(role);
    out.push({
      index,
      header,
      role,
      unitText: parts.unitText ?? "",
      ...(parts.unit !== undefined ? { unit: parts.unit } : {}),
    });
  });
  return out;
}
