import type { NetCDFReader } from "netcdfjs";
import type { ImportIssue } from "../survey/survey.ts";
import { cfTimeToIso, parseCfTimeUnits } from "./cfTime.ts";
import type { ColumnAssignment, ColumnRole } from "./columnMapping.ts";
import { makeIssue } from "./importSummary.ts";
import { concentrationUnitText } from "./unitText.ts";
import type { NcVar } from "./netcdfCf.ts";
import { attr, constituentName, DEFAULT_FILL, ROLE_BY_STANDARD_NAME } from "./netcdfCf.ts";

/** One netCDF variable laid out as a text column. */
export interface NetcdfColumn {
  header: string;
  role: ColumnRole;
  name?: string;
  unit?: string;
  unitText?: string;
  text: (row: number) => string;
}

/** Mapping entry for a netCDF column. */
export function cfColumn(c: NetcdfColumn): ColumnAssignment {
  const out: ColumnAssignment = { header: c.header, role: c.role, reason: "CF attributes" };
  if (c.name !== undefined) out.name = c.name;
  if (c.unit !== undefined) out.unit = c.unit;
  if (c.unitText !== undefined) out.unitText = c.unitText;
  return out;
}

/**
 * Lays the variables of a CF station/profile file out as text columns over the rows spanned by the
 * salinity variable's dimensions (see readNetcdfStations).
 *
 * @param reader an opened netcdfjs reader
 * @returns the columns, the row count and issues, or an error text when no data variable is found
 */
export function netcdfColumns(
  reader: NetCDFReader,
): { columns: NetcdfColumn[]; rowCount: number; issues: ImportIssue[] } | { error: string } {
  const vars = reader.variables as unknown as NcVar[];
  const dims = reader.dimensions;
  const recId = reader.recordDimension.id;
  const size = (d: number): number => (d === recId ? reader.recordDimension.length : (dims[d]?.size ?? 0));
  const issues: ImportIssue[] = [];
  const sn = (v: NcVar): string => String(attr(v, "standard_name") ?? "");
  const main =
    vars.find((v) => ROLE_BY_STANDARD_NAME[sn(v)] === "salinity") ??
    vars.find((v) => ROLE_BY_STANDARD_NAME[sn(v)] === "temperature") ??
    vars.find((v) => ROLE_BY_STANDARD_NAME[sn(v)] === "conductivity");
  if (main === undefined)
    return { error: "no variable with standard_name sea_water_practical_salinity or sea_water_temperature" };
  const mainDims = main.dimensions;
  const rowCount = mainDims.reduce((a, d) => a * size(d), 1);
  const coordOf = (row: number): number[] => {
    const c: number[] = new Array<number>(mainDims.length);
    let r = row;
    for (let k = mainDims.length - 1; k >= 0; k -= 1) {
      const n = size(mainDims[k]);
      c[k] = r % n;
      r = Math.floor(r / n);
    }
    return c;
  };
  const columns: NetcdfColumn[] = [];
  for (const v of vars) {
    const isChar = v.type === "char";
    const own = isChar ? v.dimensions.slice(0, -1) : v.dimensions;
    if (!own.every((d) => mainDims.includes(d))) continue;
    const raw = (reader.getDataVariable(v.name) as unknown[]).flat(2) as (number | string)[];
    const strlen = isChar ? size(v.dimensions[v.dimensions.length - 1] ?? 0) : 1;
    const indexOf = (row: number): number => {
      const c = coordOf(row);
      let i = 0;
      for (const d of own) i = i * size(d) + c[mainDims.indexOf(d)];
      return i;
    };
    const fill = [attr(v, "_FillValue"), attr(v, "missing_value"), DEFAULT_FILL[v.type]].filter(
      (x): x is number => typeof x === "number",
    );
    const role: ColumnRole =
      attr(v, "cf_role") === "timeseries_id" || attr(v, "cf_role") === "profile_id"
        ? "station"
        : (ROLE_BY_STANDARD_NAME[sn(v)] ?? "ignore");
    const unitsAttr = attr(v, "units");
    const unitText = typeof unitsAttr === "string" ? unitsAttr : undefined;
    const time =
      role === "dateTime" && unitText !== undefined
        ? parseCfTimeUnits(unitText, String(attr(v, "calendar") ?? "standard"))
        : undefined;
    if (role === "dateTime" && time === undefined)
      issues.push(
        makeIssue("", 0, v.name, unitText ?? "", 'CF time units like "days since 1970-01-01" (standard calendar)'),
      );
    const text = (row: number): string => {
      const i = indexOf(row);
      if (isChar)
        return raw
          .slice(i * strlen, (i + 1) * strlen)
          .join("")
          .replace(/\0/g, "")
          .trim();
      const x = raw[i];
      if (
        typeof x !== "number" ||
        fill.some((f) => x === f || Math.abs(x - f) <= Math.abs(f) * 1e-6) ||
        !Number.isFinite(x)
      )
        return "";
      if (role === "dateTime") return time === undefined ? String(x) : (cfTimeToIso(x, time) ?? String(x));
      return v.type === "float" ? String(Number(x.toPrecision(7))) : String(x);
    };
    const col: NetcdfColumn = { header: v.name, role, text };
    if (unitText !== undefined) col.unitText = unitText;
    if (role === "ignore" && !isChar && unitText !== undefined) {
      const unit = concentrationUnitText(unitText);
      if (unit !== undefined) Object.assign(col, { role: "constituent", name: constituentName(v), unit });
    }
    columns.push(col);
  }
  if (!columns.some((c) => c.role === "station")) {
    // No station id variable: number the stations along the first dimension of the data.
    columns.unshift({ header: "station (index)", role: "station", text: (row) => String((coordOf(row)[0] ?? 0) + 1) });
    issues.push(
      makeIssue(
        "",
        0,
        "station (index)",
        "",
        "a station id variable (cf_role timeseries_id or profile_id); stations are numbered 1, 2, … instead",
        "warning",
      ),
    );
  }
  return { columns, rowCount, issues };
}
