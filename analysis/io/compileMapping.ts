import { quantityUnit } from "../seawater/quantityUnits.ts";
import type { Constituent, ImportIssue } from "../survey/survey.ts";
import type { ColumnMapping, ColumnRole } from "./columnMapping.ts";
import { COLUMN_ROLES } from "./columnRoles.ts";
import { makeIssue } from "./importSummary.ts";
import { projDefinition } from "./projection.ts";
import type { UnitParser } from "./unitText.ts";
import { canonicalUnitText, concentrationUnitText } from "./unitText.ts";
import { variableKind } from "./variableKinds.ts";

/** Roles that take a single column. */
export type SingleRole = Exclude<ColumnRole, "constituent" | "flag" | "ignore">;

/** A constituent column ready to read. */
export interface ConstituentColumn {
  index: number;
  /** Key in Station.values (the symbol, made unique with the header when repeated). */
  key: string;
  constituent: Constituent;
}

/** A mapping resolved against the actual header row. */
export interface CompiledMapping {
  headers: string[];
  /**
   * Column index of each single-value role (undefined: not in the file). Every role is present as a
   * property, in one order, so each file's object has the same shape and the row-reading code that
   * reads it is compiled once per run, not once per file ({@link emptySingleRoles}).
   */
  single: Partial<Record<SingleRole, number>>;
  constituents: ConstituentColumn[];
  /** value column index → flag column index */
  flagOf: Map<number, number>;
  /** Conductivity unit factor to mS/cm. */
  conductivityToMScm?: number;
  constituentList: Constituent[];
}

/** Roles that take a single column, in one fixed order. */
const SINGLE_ROLES = COLUMN_ROLES.filter((r): r is SingleRole => r !== "constituent" && r !== "flag" && r !== "ignore");

/** A {@link CompiledMapping.single} with every role present and undefined (one object shape for every file). */
export function emptySingleRoles(): Partial<Record<SingleRole, number>> {
  const single: Partial<Record<SingleRole, number>> = {};
  for (const r of SINGLE_ROLES) single[r] = undefined;
  return single;
}

function looseHeader(h: string): string {
  return h.trim().toLowerCase();
}

/** Column positions by exact header and by trimmed lower-case header, built once (linear in the columns). */
function headerIndex(headers: readonly string[]): { exact: Map<string, number[]>; loose: Map<string, number[]> } {
  const exact = new Map<string, number[]>();
  const loose = new Map<string, number[]>();
  headers.forEach((h, i) => {
    const e = exact.get(h);
    if (e === undefined) exact.set(h, [i]);
    else e.push(i);
    const k = looseHeader(h);
    const l = loose.get(k);
    if (l === undefined) loose.set(k, [i]);
    else l.push(i);
  });
  return { exact, loose };
}

/** Units the single-value roles are read in; a header naming another unit is an error, never converted by guess. */
const EXPECTED_UNIT: Partial<Record<SingleRole, string>> = {
  depth: "m",
  distance: "km",
  discharge: "m³/s",
  temperature: "°C",
};

/**
 * Resolves a ColumnMapping against a header row: finds each mapped column, checks units and the
 * EPSG code, and lists the file-level problems (never throws).
 *
 * @param headers the file's header texts
 * @param mapping the confirmed mapping
 * @param file file name for issues
 * @param parseUnit unit reader used to validate mapping units
 * @returns the compiled mapping and file-level issues (row 0)
 */
export function compileMapping(
  headers: readonly string[],
  mapping: ColumnMapping,
  file: string,
  parseUnit: UnitParser = canonicalUnitText,
): { compiled: CompiledMapping; issues: ImportIssue[] } {
  const issues: ImportIssue[] = [];
  const compiled: CompiledMapping = {
    headers: [...headers],
    single: emptySingleRoles(),
    constituents: [],
    flagOf: new Map(),
    constituentList: [],
  };
  const columns = headerIndex(headers);
  for (const [h, list] of columns.exact)
    if (list.length > 1)
      issues.push(
        makeIssue(
          file,
          1,
          h,
          h,
          `one column per header; "${h}" heads columns ${list.map((i) => i + 1).join(", ")} (told apart by position; rename them to make the file unambiguous)`,
          "warning",
        ),
      );
  // Repeated headers are matched to the mapping's assignments in order (first assignment → first column).
  const taken = new Map<string, number>();
  const nextIndex = (h: string): number => {
    const list = columns.exact.get(h) ?? columns.loose.get(looseHeader(h)) ?? [];
    const n = taken.get(h) ?? 0;
    taken.set(h, n + 1);
    return list[Math.min(n, list.length - 1)] ?? -1;
  };
  const indexOf = (h: string): number => {
    const list = columns.exact.get(h) ?? columns.loose.get(looseHeader(h));
    return list?.[0] ?? -1;
  };
  const keys = new Set<string>();
  for (const col of mapping.columns) {
    const i = nextIndex(col.header);
    if (i < 0) {
      if (col.role !== "ignore")
        issues.push(makeIssue(file, 0, col.header, "", `column "${col.header}" named in the mapping`, "warning"));
      continue;
    }
    if (col.role === "ignore") {
      if (col.reason?.startsWith("second ") === true)
        issues.push(
          makeIssue(
            file,
            1,
            col.header,
            col.header,
            `one ${col.reason.slice(7)}; column ${i + 1} is not used`,
            "warning",
          ),
        );
      continue;
    }
    if (col.role === "flag") {
      const target = col.flagFor === undefined ? -1 : indexOf(col.flagFor);
      if (target < 0)
        issues.push(
          makeIssue(file, 0, col.header, col.flagFor ?? "", "the value column this flag belongs to", "warning"),
        );
      else compiled.flagOf.set(target, i);
      continue;
    }
    if (col.role === "constituent") {
      const symbol = col.name ?? col.header;
      const conc = col.unit === undefined ? undefined : concentrationUnitText(col.unit);
      const other = col.unit === undefined || conc !== undefined ? undefined : parseUnit(col.unit);
      const kind = variableKind(symbol, conc ?? other, conc !== undefined);
      const unit = conc ?? (kind.kind === "nonMixing" ? other : undefined);
      if (unit === undefined) {
        const found = col.unit ?? col.unitText ?? "";
        issues.push(
          makeIssue(
            file,
            0,
            col.header,
            found,
            `a ${kind.kind === "nonMixing" ? "unit" : "concentration unit from the units table (e.g. nmol/L, µmol/kg, µg/L; ppm/ppb/ppt are ambiguous)"} — set it with --unit "${col.header}=<unit>" or in the column mapping; column not imported`,
            kind.kind === "nonMixing" ? "warning" : "error",
          ),
        );
        continue;
      }
      const name = symbol;
      let key = name;
      if (keys.has(key)) {
        key = keys.has(`${name} (${col.header})`) ? `${name} (column ${i + 1})` : `${name} (${col.header})`;
        issues.push(makeIssue(file, 0, col.header, name, `one column per constituent; stored as "${key}"`, "warning"));
      }
      keys.add(key);
      const chosenKind = col.kind ?? kind.kind;
      const constituent: Constituent = { name: key, unit, header: col.header };
      if (chosenKind === "nonMixing") {
        constituent.kind = "nonMixing";
        if (kind.reason !== undefined) constituent.kindReason = kind.reason;
      }
      compiled.constituents.push({ index: i, key, constituent });
      compiled.constituentList.push(constituent);
      continue;
    }
    const role = col.role as SingleRole;
    const wanted = EXPECTED_UNIT[role];
    const given = col.unit ?? col.unitText;
    if (wanted !== undefined && given !== undefined && given !== "" && parseUnit(given) !== wanted) {
      issues.push(
        makeIssue(
          file,
          0,
          col.header,
          given,
          `${role} in ${wanted} (convert the column or correct the mapping); column not used`,
        ),
      );
      continue;
    }
    if (compiled.single[role] !== undefined) {
      issues.push(makeIssue(file, 0, col.header, role, `one "${role}" column; this one is not used`, "warning"));
      continue;
    }
    compiled.single[role] = i;
    if (role === "conductivity") {
      const u = col.unit === undefined ? undefined : parseUnit(col.unit);
      const f = u === undefined ? undefined : quantityUnit("conductivity", u)?.factor;
      if (f === undefined)
        issues.push(makeIssue(file, 0, col.header, col.unit ?? "", "a conductivity unit (mS/cm, µS/cm or S/m)"));
      else compiled.conductivityToMScm = f;
    }
  }
  const s = compiled.single;
  if (
    (s.x !== undefined || s.y !== undefined) &&
    (mapping.epsg === undefined || projDefinition(mapping.epsg) === undefined)
  ) {
    issues.push(
      makeIssue(
        file,
        0,
        headers[s.x ?? s.y ?? 0] ?? "",
        String(mapping.epsg ?? ""),
        "a supported EPSG code for the x/y columns (e.g. 27700, 2154, 25832, 326xx/327xx)",
      ),
    );
  }
  if (s.station === undefined)
    issues.push(makeIssue(file, 0, "", "", "a station column; rows are named by their row number", "warning"));
  if (s.salinity === undefined && s.conductivity === undefined)
    issues.push(makeIssue(file, 0, "", "", "a salinity (or conductivity) column", "warning"));
  return { compiled, issues };
}

/** Exposed for tests and the dialog: which roles a compiled mapping found. */
export function compiledRoles(c: CompiledMapping): SingleRole[] {
  return (Object.keys(c.single) as SingleRole[]).filter((r) => c.single[r] !== undefined);
}
