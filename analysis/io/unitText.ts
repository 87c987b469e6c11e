/**
 * Reading unit text from column headers into canonical unit strings.
 *
 * A caller may supply its own parser (e.g. the shared seawater unit parser); this module's
 * {@link canonicalUnitText} is the built-in reader for the spellings found in survey headers.
 */

/** Turns unit text into a canonical unit string, or undefined when the text is not a known unit. */
export type UnitParser = (text: string) => string | undefined;

const PREFIX: Record<string, string> = { "": "", m: "m", u: "µ", n: "n", p: "p", f: "f" };
const PREFIX_WORD: Record<string, string> = { milli: "m", micro: "µ", nano: "n", pico: "p", femto: "f" };

const FIXED: Record<string, string> = {
  c: "°C",
  degc: "°C",
  "°c": "°C",
  degreescelsius: "°C",
  degreecelsius: "°C",
  celsius: "°C",
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

/** Molar and mass concentration written many ways: "nmol/L", "nM", "umol l-1", "ngL", "µmol/kg", "nmol kg-1". */
const CONC =
  /^(milli|micro|nano|pico|femto|[munpf]?)(mol|m|g|eq)(?:\/|per)?(l|kg|liter|litre|l-1|l\^-1|kg-1|kg\^-1)?$/;

/**
 * The built-in reader for unit text in headers.
 *
 * Accepts molar (mol/L, "M"), mass (g/L) and per-kilogram (mol/kg) concentrations with the prefixes
 * m, µ (u, μ, micro), n, p, f; temperature (°C), depth (m), salinity labels (PSU, ppt), conductivity,
 * %, NTU and discharge (m³/s). Spaces, dots and "-1"/"^-1" exponents are understood.
 *
 * @param text unit text as written, e.g. "µmol/l", "nmol kg-1", "ngL", "Micromolar", "micrograms/L"
 * @returns canonical unit ("µmol/L", "nmol/kg", "ng/L", "°C", ...) or undefined when unknown
 */
export function canonicalUnitText(text: string): string | undefined {
  let t = text.trim().replace(/[μ]/g, "µ").replace(/µ/g, "u").toLowerCase();
  if (t.length === 0 || t.length > 40) return undefined;
  t = t.replace(/^\((.*)\)$/, "$1").replace(/^\[(.*)\]$/, "$1");
  const compact = t.replace(/[\s.·*]/g, "").replace(/º/g, "°");
  if (FIXED[compact] !== undefined) return FIXED[compact];
  // Words: micromolar, nanomolar, micrograms/l, milligrams per liter.
  const worded = compact
    .replace(/molar$/, "m")
    .replace(/grams?/, "g")
    .replace(/moles?/, "mol")
    .replace(/liters?|litres?/, "l")
    .replace(/kilograms?/, "kg");
  const m = CONC.exec(worded);
  if (m === null) return undefined;
  const [, pre, base, per] = m;
  const prefix = PREFIX_WORD[pre] ?? PREFIX[pre];
  if (prefix === undefined) return undefined;
  if (base === "m") {
    // "nM", "uM": molar. A bare "m" is metres (handled above); "mm" would be millimolar or millimetres.
    if (per !== undefined || prefix === "" || prefix === "m") return undefined;
    return `${prefix}mol/L`;
  }
  if (per === undefined) return undefined;
  const denom = per.startsWith("kg") ? "kg" : "L";
  return `${prefix}${base}/${denom}`;
}

/** Canonical units that express an amount or mass of a constituent per volume or mass of water. */
export function isConcentrationUnit(unit: string): boolean {
  return /^(m|µ|n|p|f)?(mol|g|eq)\/(L|kg)$/.test(unit);
}
