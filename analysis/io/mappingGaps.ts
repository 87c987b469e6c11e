// What a column mapping leaves unread: constituent columns without a unit, numeric columns without a
// role. Apart from mappingChoices.ts (which validates mapping files with a schema) so the dashboard's
// first page can use them without the schema library.
import type { ColumnMapping } from "./columnMapping.ts";
import { concentrationUnitText } from "./unitText.ts";

const norm = (s: string): string => s.trim().toLowerCase();

function usualUnit(symbol: string): string {
  return /^(Si|NO3|NO2|NO3\+NO2|NH4|PO4|DIN|DOC|DON|DOP|DIC|TA)\b/.test(symbol) ? "µmol/L" : "nmol/L";
}

/** A constituent column the mapping cannot read for want of a unit. */
export interface MissingUnit {
  header: string;
  name: string;
  kind: "tracer" | "nonMixing";
  /** The option that supplies it, e.g. `--unit "Silicate=µmol/L"` (check the unit in the data source). */
  option: string;
}

/**
 * Lists the constituent columns without a usable unit.
 *
 * @param mapping the mapping (suggested, merged or with overrides applied)
 * @returns one entry per such column
 */
export function missingUnits(mapping: ColumnMapping): MissingUnit[] {
  return mapping.columns
    .filter((c) => c.role === "constituent")
    .filter((c) => c.unit === undefined || (c.kind !== "nonMixing" && concentrationUnitText(c.unit) === undefined))
    .map((c) => ({
      header: c.header,
      name: c.name ?? c.header,
      kind: c.kind ?? "tracer",
      option: `--unit "${c.header}=${c.kind === "nonMixing" ? "<unit>" : usualUnit(c.name ?? "")}"`,
    }));
}

/** A numeric column that will not be used, and why. */
export interface UnusedColumn {
  header: string;
  reason: string;
}

/**
 * Lists the numeric columns that are neither used nor reported as errors, with the reason.
 *
 * @param mapping the mapping that will be applied
 * @param sample the first data rows (cell text in header order)
 * @param headers the headers
 * @returns one entry per unused column whose sample cells are mostly numbers
 */
export function unusedColumns(
  mapping: ColumnMapping,
  headers: readonly string[],
  sample: readonly (readonly string[])[],
): UnusedColumn[] {
  const out: UnusedColumn[] = [];
  headers.forEach((h, i) => {
    const c = mapping.columns.find((x) => norm(x.header) === norm(h));
    if (c !== undefined && c.role !== "ignore") return;
    const cells = sample.map((r) => (r[i] ?? "").trim()).filter((x) => x !== "" && x.toUpperCase() !== "NA");
    const numeric = cells.filter((x) => Number.isFinite(Number(x.replace(",", "."))));
    if (cells.length === 0 || numeric.length < cells.length / 2) return;
    const why = c?.reason ?? "not in the mapping";
    out.push({
      header: h,
      reason: `${why === "not recognised" ? "not a recognised constituent or column role" : why}; to use it, give it a role in the mapping (brackline mapping prints one) or a unit (--unit "${h}=<unit>")`,
    });
  });
  return out;
}
