import { requireStringArray } from "./argChecks.ts";
import type { ColumnAssignment, ColumnMapping, ColumnRole } from "./columnMapping.ts";
import { normaliseConstituentName } from "./constituentNames.ts";
import { fileShapeSignature } from "./fileShape.ts";
import { splitHeaderUnit } from "./headerUnits.ts";
import type { UnitParser } from "./unitText.ts";
import { canonicalUnitText, concentrationUnitText } from "./unitText.ts";
import { detectDateOrder } from "./dateTime.ts";
import { variableKind } from "./variableKinds.ts";
import { flagTarget, isRowFlagHeader } from "./qcFlags.ts";

/** Header patterns (tested on the lower-case name part, separators as single spaces). */
const ROLE_PATTERNS: ReadonlyArray<[ColumnRole, RegExp]> = [
  ["station", /^(station|stn|sta|site)( ?(id|number|no|name|code))?$/],
  ["survey", /^(survey|cruise|campaign|trip)( ?(id|name|no))?$/],
  ["dateTime", /^(date ?time|timestamp|sampling time|datetime utc|date time utc|iso time)$/],
  ["date", /^(date|sampling date|sample date|day)$/],
  ["time", /^(time|time utc|time local|sampling time of day|hhmm)$/],
  ["latitude", /^(lat|latitude|lat dd|lat deg|latitude degree|latitude deg|decimal latitude)$/],
  ["longitude", /^(lon|long|lng|longitude|lon dd|lon deg|longitude degree|longitude deg|decimal longitude)$/],
  ["x", /^(x|easting|east|x coord|x coordinate)( epsg ?\d+)?$/],
  ["y", /^(y|northing|north|y coord|y coordinate)( epsg ?\d+)?$/],
  ["depth", /^(depth|sample depth|depth below surface|z|sampling depth)$/],
  ["salinity", /^(salinity|sal|psal|practical salinity|sss|salinity pss ?78)$/],
  ["conductivity", /^(conductivity|cond|spcond|specific conductance|ec)$/],
  ["temperature", /^(temperature|temp|t|water temperature|water temp|temp water)$/],
  ["pH", /^(ph|ph nbs|ph total|ph t|ph insitu|ph in situ)$/],
  ["discharge", /^(discharge|river discharge|river flow|flow|q river)$/],
  ["distance", /^(distance|along channel distance|distance along channel|channel distance|distance from .*)$/],
];

function simplify(name: string): string {
  return name
    .toLowerCase()
    .replace(/[_\-.,:/]+/g, " ")
    .replace(/\s+/g, " ")
    .trim();
}

function looksLikeLabels(values: readonly string[]): boolean {
  const nonBlank = values.map((v) => v.trim()).filter((v) => v.length > 0 && v.toUpperCase() !== "NA");
  return nonBlank.length > 0 && nonBlank.every((v) => /^(s|b|m|surf|surface|bot|bottom|mid|middle)$/i.test(v));
}

function looksLikeDateTime(values: readonly string[]): boolean {
  return values.some((v) => /\d[T ]\d{1,2}:\d{2}/.test(v.trim()));
}

/**
 * Suggests how to read each column from its header and a few sample rows.
 *
 * Roles come from header patterns (station, survey, date/time, latitude/longitude, projected x/y,
 * depth, salinity, conductivity, temperature, pH, QC flags, discharge, along-channel distance); any
 * other header whose name is a known constituent (see CONSTITUENT_SYNONYMS) becomes a constituent
 * with its unit taken from the header. Unrecognised columns are "ignore". A constituent whose unit
 * is missing or unknown keeps `unit` undefined: the import reports it until the user sets the unit.
 *
 * @param headers the header texts
 * @param sampleRows a few data rows (arrays of cell text in header order) for value-based checks
 * @param parseUnit unit reader (defaults to the built-in header unit reader)
 * @returns a JSON-serialisable mapping to confirm or correct
 * @throws TypeError when headers is not an array of strings
 */
export function suggestMapping(
  headers: readonly string[],
  sampleRows: readonly (readonly string[])[] = [],
  parseUnit: UnitParser = canonicalUnitText,
): ColumnMapping {
  requireStringArray("suggestMapping", "headers", headers);
  const used = new Set<ColumnRole>();
  const columns: ColumnAssignment[] = headers.map((header, i) => {
    const samples = sampleRows.map((r) => r[i] ?? "");
    const parts = splitHeaderUnit(header, parseUnit);
    const simple = simplify(parts.name);
    const unitFields = {
      ...(parts.unit !== undefined ? { unit: parts.unit } : {}),
      ...(parts.unitText !== undefined ? { unitText: parts.unitText } : {}),
    };
    const target = flagTarget(header, headers);
    if (target !== undefined) return { header, role: "flag", flagFor: target, reason: `QC flag of "${target}"` };
    if (isRowFlagHeader(header)) return { header, role: "rowFlag", reason: "row-level QC flag" };
    for (const [role, re] of ROLE_PATTERNS) {
      if (!re.test(simple)) continue;
      let r: ColumnRole = role;
      if (role === "depth" && looksLikeLabels(samples)) r = "depthLabel";
      if (role === "date" && looksLikeDateTime(samples)) r = "dateTime";
      if (used.has(r) && r !== "constituent") return { header, role: "ignore", reason: `second ${r} column` };
      used.add(r);
      return { header, role: r, ...unitFields, reason: `header "${header}" reads as ${r}` };
    }
    const name = normaliseConstituentName(parts.name);
    if (name !== undefined) {
      const conc = parts.unitText === undefined ? undefined : concentrationUnitText(parts.unitText);
      const kind = variableKind(name, conc ?? parts.unit, conc !== undefined);
      const unit = conc ?? (kind.kind === "nonMixing" ? parts.unit : undefined);
      const unitFields = {
        ...(unit !== undefined ? { unit } : {}),
        ...(parts.unitText !== undefined ? { unitText: parts.unitText } : {}),
      };
      const why =
        unit !== undefined
          ? `unit ${unit}`
          : parts.unitText !== undefined
            ? `unknown unit "${parts.unitText}"`
            : "no unit in header";
      const kindWhy = kind.kind === "nonMixing" ? `; not a mixing tracer (${kind.reason ?? ""})` : "";
      return {
        header,
        role: "constituent",
        name,
        ...unitFields,
        kind: kind.kind,
        reason: `constituent ${name}, ${why}${kindWhy}`,
      };
    }
    return { header, role: "ignore", reason: "not recognised" };
  });
  const mapping: ColumnMapping = { shape: fileShapeSignature(headers), columns };
  const dateCol = columns.findIndex((c) => c.role === "date" || c.role === "dateTime");
  if (dateCol >= 0) {
    const order = detectDateOrder(sampleRows.map((r) => r[dateCol] ?? ""));
    if (order !== undefined) mapping.dateOrder = order;
  }
  const epsgMatch = headers.map((h) => /epsg[:\s_-]*(\d{4,5})/i.exec(h)).find((m) => m !== null);
  if (epsgMatch) mapping.epsg = Number(epsgMatch[1]);
  return mapping;
}
