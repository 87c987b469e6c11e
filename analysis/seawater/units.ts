/**
 * The one concentration-units table of Brackline, and the parser that recognises unit text from file
 * headers. Canonical symbols use "µ" (U+00B5) and "L": "nmol/L", "µg/L", "µmol/kg", "µmol N/L".
 *
 * Decisions (documented for users):
 * - "µM", "uM", "nM", "pM", "mM", "M" are molar per litre (mol/L), as in chemistry.
 * - Amounts and masses without an atom label refer to the element named by the constituent
 *   (e.g. Fe in nmol/L is nmol of Fe atoms). Nutrients may carry an atom label: "µmol N/L", "mg P/L",
 *   "µmol/L as Si" — per atom of N, P or Si, never per molecule of NO3⁻, PO4³⁻ or Si(OH)4.
 * - "ppm", "ppb", "ppt", "‰", "%" and "psu" are REJECTED: in brackish water they can mean per mass or
 *   per volume (and "ppt" is also used for salinity); write µg/L or µg/kg instead.
 * - "mmol/m3" (= µmol/L) and similar per-cubic-metre forms are accepted.
 */
export interface CanonicalUnit {
  /** Canonical text, e.g. "nmol/L", "µg/kg", "µmol N/L". */
  symbol: string;
  /** Mass (g) or amount of substance (mol). */
  quantity: "mass" | "amount";
  /** Per litre of solution or per kilogram of solution. */
  basis: "perLitre" | "perKilogram";
  /** Value of 1 unit in g/L, g/kg, mol/L or mol/kg (base of its quantity and basis). */
  toBase: number;
  /** Atom the value is counted per ("N", "P", "Si"), when the unit says so. */
  atom?: "N" | "P" | "Si";
}

const PREFIXES: ReadonlyArray<[string, number]> = [
  ["p", 1e-12],
  ["n", 1e-9],
  ["µ", 1e-6],
  ["m", 1e-3],
  ["", 1],
];
const ATOMS = [undefined, "N", "P", "Si"] as const;

function buildTable(): Record<string, CanonicalUnit> {
  const out: Record<string, CanonicalUnit> = {};
  for (const [prefix, factor] of PREFIXES) {
    for (const quantity of ["mass", "amount"] as const) {
      for (const basis of ["perLitre", "perKilogram"] as const) {
        for (const atom of ATOMS) {
          const q = quantity === "mass" ? "g" : "mol";
          const symbol = `${prefix}${q}${atom ? ` ${atom}` : ""}/${basis === "perLitre" ? "L" : "kg"}`;
          out[symbol] = Object.freeze(
            atom ? { symbol, quantity, basis, toBase: factor, atom } : { symbol, quantity, basis, toBase: factor },
          );
        }
      }
    }
  }
  return out;
}

/** Every canonical unit, keyed by its symbol. */
export const UNITS: Readonly<Record<string, CanonicalUnit>> = Object.freeze(buildTable());

const AMBIGUOUS = /^(ppm|ppb|ppt|pptv|ppth|‰|%|psu|pss|per ?mil+e?)$/i;
const WORDS: ReadonlyArray<[RegExp, string]> = [
  [/\b(micro|µ)grams?\b/g, "µg"],
  [/\bmcg\b/g, "µg"],
  [/\bmilligrams?\b/g, "mg"],
  [/\bnanograms?\b/g, "ng"],
  [/\bpicograms?\b/g, "pg"],
  [/\bgrams?\b/g, "g"],
  [/\bmicromol(e|es)?\b/g, "µmol"],
  [/\bnanomol(e|es)?\b/g, "nmol"],
  [/\bpicomol(e|es)?\b/g, "pmol"],
  [/\bmillimol(e|es)?\b/g, "mmol"],
  [/\bmoles\b|\bmole\b/g, "mol"],
  [/\b(litres?|liters?)\b/g, "l"],
  [/\bkilograms?\b/g, "kg"],
];
const MOLAR_WORDS: Record<string, string> = {
  picomolar: "p",
  nanomolar: "n",
  micromolar: "µ",
  millimolar: "m",
  molar: "",
};
const ATOM_OF: Record<string, "N" | "P" | "Si"> = { n: "N", p: "P", si: "Si" };

function normalise(text: string): string {
  return text
    .normalize("NFKC")
    .replace(/\u03bc/g, "µ")
    .replace(/[\u2212\u2010-\u2014]/g, "-")
    .replace(/[·⋅*]/g, " ")
    .trim()
    .replace(/^[([{]\s*(.*?)\s*[)\]}]$/, "$1")
    .replace(/\s+/g, " ")
    .trim();
}

/**
 * Recognises a concentration unit written in a file header and returns its canonical unit.
 * Accepts e.g. "nmol/L", "umol/L", "µM", "uM", "nM", "ug/L", "mg/l", "nmol kg-1", "µmol/kg",
 * "µmol kg⁻¹", "micromolar", "micrograms/L", "mmol m-3", "µmol N/L", "mg/L as P", "[nmol/L]".
 * @param text unit text (without the constituent name)
 * @returns the canonical unit, or undefined when the text is unknown or ambiguous ("ppb", "ppt", ...)
 * @see parseUnitOrThrow for the throwing variant with the reason.
 */
export function parseUnit(text: string): CanonicalUnit | undefined {
  return typeof text === "string" ? recognise(text).unit : undefined;
}

/**
 * As {@link parseUnit}, but throws instead of returning undefined.
 * @param text unit text
 * @returns the canonical unit
 * @throws {RangeError} naming the unit text and saying whether it is unknown or ambiguous
 * @throws {TypeError} when text is not a string
 * @see units.ts module comment for the accepted and rejected forms.
 */
export function parseUnitOrThrow(text: string): CanonicalUnit {
  if (typeof text !== "string") throw new TypeError(`parseUnitOrThrow: text must be a string, got ${typeof text}`);
  const { unit, reason } = recognise(text);
  if (!unit) throw new RangeError(`parseUnitOrThrow: ${reason} unit "${text}"`);
  return unit;
}

function recognise(text: string): { unit?: CanonicalUnit; reason: string } {
  const s = normalise(text);
  if (s === "") return { reason: "empty" };
  if (AMBIGUOUS.test(s)) {
    return { reason: "ambiguous (per mass or per volume? write µg/L, µg/kg, nmol/L or nmol/kg)" };
  }
  if (Object.hasOwn(UNITS, s)) return { unit: UNITS[s], reason: "" };
  // Molar: case-sensitive "M" (lower-case "nm" is a nanometre).
  const molar = /^([pnuµm]?)M(?:[ _-]?(N|P|Si))?$/.exec(s);
  if (molar) return lookup(molar[1], "mol", "L", 1, molar[2]?.toLowerCase(), undefined);
  let low = s.toLowerCase();
  const molarWord = /^(picomolar|nanomolar|micromolar|millimolar|molar)(?: (?:as )?(n|p|si))?$/.exec(low);
  if (molarWord) return lookup(MOLAR_WORDS[molarWord[1]], "mol", "L", 1, molarWord[2], undefined);
  for (const [re, rep] of WORDS) low = low.replace(re, rep);
  low = low.replace(/ ?\/ ?/g, "/").replace(/ per /g, "/");
  const m =
    /^([pnuµm]?)(g|mol)(?:[ _-]?(n|p|si)(?![a-z]))?(?:\/(l|kg|m3|m\^3|m³|dm3|dm³)|[ ](l\^?-1|kg\^?-1|m\^?-3|dm\^?-3))(?: (?:as )?(n|p|si))?$/.exec(
      low,
    );
  if (!m) return { reason: "unknown" };
  const den = (m[4] ?? m[5]).replace(/\^?-\d$/, "");
  const perM3 = den.startsWith("m");
  return lookup(m[1], m[2] as "g" | "mol", den === "kg" ? "kg" : "L", perM3 ? 1e-3 : 1, m[3], m[6]);
}

function lookup(
  prefix: string,
  q: "g" | "mol",
  den: "L" | "kg",
  scale: number,
  atomA: string | undefined,
  atomB: string | undefined,
) {
  if (atomA && atomB && atomA !== atomB) return { reason: "ambiguous (two different atoms)" };
  const atomKey = atomA ?? atomB;
  const atom = atomKey ? ATOM_OF[atomKey] : undefined;
  let factor = (PREFIXES.find(([p]) => p === (prefix === "u" ? "µ" : prefix))?.[1] ?? Number.NaN) * scale;
  // Per cubic metre: mmol/m3 = µmol/L; find the canonical prefix with that factor.
  const found = PREFIXES.find(([, f]) => Math.abs(f - factor) <= 1e-6 * f);
  if (!found) return { reason: "unknown (prefix out of range)" };
  factor = found[1];
  const symbol = `${found[0]}${q}${atom ? ` ${atom}` : ""}/${den}`;
  return Object.hasOwn(UNITS, symbol) ? { unit: UNITS[symbol], reason: "" } : { reason: "unknown" };
}
