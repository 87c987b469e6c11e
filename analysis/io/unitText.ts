import { parseUnit } from "../seawater/units.ts";

/**
 * Reading unit text from column headers into canonical unit strings.
 *
 * A caller may supply its own parser (e.g. the shared seawater unit parser); this module's
 * {@link canonicalUnitText} is the built-in reader for the spellings found in survey headers.
 */

/** Turns unit text into a canonical unit string, or undefined when the text is not a known unit. */
export type UnitParser = (text: string) => string | undefined;

const FIXED: Record<string, string> = {
  c: "°C",
  degc: "°C",
  "°c": "°C",
  degreescelsius: "°C",
  degreecelsius: "°C",
  celsius: "°C",
  degree_celsius: "°C",
  degrees_celsius: "°C",
  degree_c: "°C",
  deg_c: "°C",
  "°celsius": "°C",
  m: "m",
  meter: "m",
  meters: "m",
  metre: "m",
  metres: "m",
  km: "km",
  dbar: "dbar",
  ppt: "ppt",
  "‰": "ppt",
  permil: "ppt",
  psu: "PSU",
  pss: "PSU",
  pss78: "PSU",
  "pss-78": "PSU",
  "%": "%",
  percent: "%",
  "ms/cm": "mS/cm",
  mscm: "mS/cm",
  "µs/cm": "µS/cm",
  uscm: "µS/cm",
  "s/m": "S/m",
  ntu: "NTU",
  "m3/s": "m³/s",
  "m³/s": "m³/s",
  m3s: "m³/s",
  cms: "m³/s",
  "m3s-1": "m³/s",
  "m³s-1": "m³/s",
};

/** Compact header suffixes without a slash ("ngL", "umolL", "nmolkg") get one before parsing. */
const COMPACT = /^([pnuµm]?)(g|mol)(l|kg)$/i;

/**
 * The concentration reader: the shared units table and parser (analysis/seawater/units.ts), after
 * giving compact header suffixes a slash ("Cd_ngL" → "ng/L").
 *
 * @param text unit text, e.g. "nmol/L", "uM", "ngL", "nmol kg-1", "Micromolar"
 * @returns the canonical concentration symbol ("ng/L", "µmol/L", ...), or undefined when unknown or ambiguous
 */
export function concentrationUnitText(text: string): string | undefined {
  const t = text.trim().replace(/\u03bc/g, "µ");
  const c = COMPACT.exec(t);
  const prepared = c === null ? t : `${c[1]}${c[2]}/${c[3].toLowerCase() === "l" ? "L" : "kg"}`;
  return parseUnit(prepared)?.symbol;
}

/**
 * The reader for unit text in headers: concentrations through the shared units parser
 * ({@link concentrationUnitText}); besides those, temperature (°C), depth (m, km), pressure (dbar),
 * salinity labels (PSU, ppt — accepted only as salinity labels, never as concentrations),
 * conductivity, %, NTU and discharge (m³/s).
 *
 * @param text unit text as written, e.g. "µmol/l", "nmol kg-1", "ngL", "Micromolar", "micrograms/L", "Degrees Celsius"
 * @returns canonical unit ("µmol/L", "nmol/kg", "ng/L", "°C", ...) or undefined when unknown
 */
export function canonicalUnitText(text: string): string | undefined {
  let t = text.trim().replace(/[μ]/g, "µ").replace(/µ/g, "u").toLowerCase();
  if (t.length === 0 || t.length > 40) return undefined;
  t = t.replace(/^\((.*)\)$/, "$1").replace(/^\[(.*)\]$/, "$1");
  const compact = t.replace(/[\s.·*]/g, "").replace(/º/g, "°");
  if (FIXED[compact] !== undefined) return FIXED[compact];
  return concentrationUnitText(text);
}

/** True when the unit text is a concentration of the shared units table. */
export function isConcentrationUnit(unit: string): boolean {
  return concentrationUnitText(unit) !== undefined;
}
