import type { ColumnAssignment, ColumnMapping } from "./columnMapping.ts";
import { columnMappingSchema, columnAssignmentSchema } from "./columnMapping.ts";
import { parseDelimitedText } from "./delimitedRecords.ts";
import { detectDialect, stripBom } from "./dialect.ts";
import { suggestMapping } from "./suggestMapping.ts";
import { canonicalUnitText, concentrationUnitText } from "./unitText.ts";
import { checkSchema, v } from "./validation.ts";

/** Headers and the first data rows of a delimited text (enough to suggest a mapping). */
export function headOfText(text: string, rows = 50): { headers: string[]; sample: string[][] } {
  const clean = stripBom(text);
  const cut = clean.slice(0, 262144);
  const dialect = detectDialect(cut.slice(0, 65536));
  const head = (part: string): { records: string[][]; total: number } => {
    const records: string[][] = [];
    let total = 0;
    parseDelimitedText(part, dialect, (r) => {
      total++;
      if (records.length <= rows) records.push(r.fields);
    });
    return { records, total };
  };
  // First the first 2·(rows + 2) lines only: when they hold more records than are kept, every kept
  // record ended before the cut, so they are the records the longer parse below gives.
  let end = -1;
  for (let i = 0; i < 2 * (rows + 2) && (i === 0 || end >= 0); i++) end = cut.indexOf("\n", end + 1);
  const quick = end >= 0 ? head(cut.slice(0, end + 1)) : undefined;
  const records =
    quick && quick.total >= rows + 2
      ? quick.records
      : head(cut.slice(0, cut.lastIndexOf("\n") + 1 || cut.length)).records;
  return { headers: (records[0] ?? []).map((h) => h.trim()), sample: records.slice(1) };
}

/** The suggested mapping of a delimited text (as `brackline mapping` prints it for editing). */
export function suggestMappingForText(text: string): ColumnMapping {
  const { headers, sample } = headOfText(text);
  return suggestMapping(headers, sample);
}

/** A user's unit for a column: `--unit "Silicate=µmol/L"`. */
export interface UnitOverride {
  /** Header, header name without unit, or constituent symbol (case-insensitive). */
  column: string;
  unit: string;
}

/**
 * Reads `Column=unit` (the text of one `--unit` option).
 *
 * @param text e.g. "Silicate=µmol/L", "Nitrate_+_Nitrite=umol/L"
 * @returns the override, or a message saying what is wrong
 */
export function parseUnitOverride(text: string): UnitOverride | { error: string } {
  const i = text.lastIndexOf("=");
  if (i <= 0 || i === text.length - 1)
    return { error: `--unit: expected "<column>=<unit>", e.g. --unit "Silicate=µmol/L"; got "${text}"` };
  const column = text.slice(0, i).trim();
  const unit = text.slice(i + 1).trim();
  if (canonicalUnitText(unit) === undefined)
    return {
      error: `--unit: "${unit}" is not a unit Brackline knows (e.g. µmol/L, nmol/L, µg/L, mg/L, nmol/kg); got "${text}"`,
    };
  return { column, unit };
}

const norm = (s: string): string => s.trim().toLowerCase();

function matches(c: ColumnAssignment, column: string): boolean {
  const k = norm(column);
  return norm(c.header) === k || (c.name !== undefined && norm(c.name) === k);
}

/**
 * Applies the user's units to a mapping. A unit given for an unrecognised column makes it a
 * constituent named by its header.
 *
 * @param mapping the mapping
 * @param overrides the units
 * @returns the new mapping and the overrides that matched no column
 */
export function applyUnitOverrides(
  mapping: ColumnMapping,
  overrides: readonly UnitOverride[],
): { mapping: ColumnMapping; unmatched: UnitOverride[] } {
  const used = new Set<UnitOverride>();
  const columns = mapping.columns.map((c) => {
    const o = overrides.find((x) => matches(c, x.column));
    if (o === undefined) return c;
    used.add(o);
    const unit = concentrationUnitText(o.unit) ?? canonicalUnitText(o.unit) ?? o.unit;
    if (c.role === "ignore")
      return { ...c, role: "constituent" as const, name: c.header, unit, reason: `unit ${unit} given by the user` };
    return { ...c, unit, reason: `${c.reason ?? c.role}; unit ${unit} given by the user` };
  });
  return { mapping: { ...mapping, columns }, unmatched: overrides.filter((o) => !used.has(o)) };
}

/** The usual unit of a constituent, for the example in a message (never applied without the user). */
/** A mapping file as users write it: `shape` and column `role`s may be left out (merged with the suggestion). */
export const partialMappingSchema = v.object({
  ...columnMappingSchema.entries,
  shape: v.optional(v.string()),
  columns: v.array(v.partial(columnAssignmentSchema, ["role"])),
});

/**
 * Merges a user's (possibly partial) mapping file with the suggestion for a file: columns named in
 * the user's mapping take its fields over the suggestion's; every other column keeps the suggestion
 * (nothing is dropped because the user named only some columns); columns of other files are skipped.
 *
 * @param user the parsed JSON of the mapping file
 * @param suggested the suggestion for this file
 * @returns the merged mapping, or the problems that make the mapping file unusable (field path and message)
 */
export function mergeMapping(
  user: unknown,
  suggested: ColumnMapping,
): { mapping: ColumnMapping } | { errors: string[] } {
  const parsed = checkSchema(partialMappingSchema, user);
  if (!parsed.success)
    return {
      errors: parsed.issues.map((i) => `${i.path !== "" ? i.path : "(top level)"}: ${i.message}`),
    };
  const u = parsed.data;
  const columns = suggested.columns.map((c) => {
    const mine = u.columns.find((x) => x.header !== undefined && norm(x.header) === norm(c.header));
    return mine === undefined ? c : ({ ...c, ...mine, header: c.header } as ColumnAssignment);
  });
  const { columns: _ignored, shape: _shape, ...top } = u;
  return { mapping: { ...suggested, ...top, shape: suggested.shape, columns } };
}

export { missingUnits, unusedColumns, type MissingUnit, type UnusedColumn } from "./mappingGaps.ts";
