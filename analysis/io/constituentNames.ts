/**
 * Constituent name normalisation: header names → element or species symbols.
 *
 * The synonym table below is the documented list; keys are lower-case with spaces, dashes, dots and
 * underscores removed. Element symbols (Fe, Mn, Cu, ...) are recognised directly (see
 * {@link ELEMENT_SYMBOLS}); the symbol's case is normalised ("FE" → "Fe").
 */
export const CONSTITUENT_SYNONYMS: Readonly<Record<string, string>> = {
  // nutrients
  silicate: "Si",
  silicic: "Si",
  silicicacid: "Si",
  dsi: "Si",
  sio2: "Si",
  sioh4: "Si",
  sio4: "Si",
  nitrate: "NO3",
  no3: "NO3",
  nitrite: "NO2",
  no2: "NO2",
  nitratenitrite: "NO3+NO2",
  "nitrate+nitrite": "NO3+NO2",
  no32: "NO3+NO2",
  "no3+no2": "NO3+NO2",
  nox: "NO3+NO2",
  ammonium: "NH4",
  ammonia: "NH4",
  nh4: "NH4",
  phosphate: "PO4",
  orthophosphate: "PO4",
  po4: "PO4",
  srp: "PO4",
  dip: "PO4",
  din: "DIN",
  // carbon, nitrogen, pigments, gases, particles
  doc: "DOC",
  don: "DON",
  dop: "DOP",
  poc: "POC",
  pn: "PN",
  pon: "PN",
  dic: "DIC",
  alkalinity: "TA",
  ta: "TA",
  chla: "Chla",
  chlorophylla: "Chla",
  chlorophyll: "Chla",
  chl: "Chla",
  oxygen: "O2",
  do: "O2",
  dissolvedoxygen: "O2",
  o2: "O2",
  spm: "SPM",
  turbidity: "Turbidity",
  turb: "Turbidity",
  tss: "SPM",
  suspendedparticulatematter: "SPM",
  // elements written as words
  iron: "Fe",
  manganese: "Mn",
  copper: "Cu",
  nickel: "Ni",
  cadmium: "Cd",
  barium: "Ba",
  zinc: "Zn",
  lead: "Pb",
  cobalt: "Co",
  uranium: "U",
  molybdenum: "Mo",
  aluminium: "Al",
  aluminum: "Al",
  arsenic: "As",
  chromium: "Cr",
  mercury: "Hg",
  strontium: "Sr",
  lithium: "Li",
  vanadium: "V",
  radium: "Ra",
  calcium: "Ca",
  magnesium: "Mg",
  sodium: "Na",
  potassium: "K",
  boron: "B",
  silicon: "Si",
};

/** Element symbols accepted as constituent names (trace metals and major ions common in estuarine work). */
export const ELEMENT_SYMBOLS: readonly string[] = [
  "Fe",
  "Mn",
  "Cu",
  "Ni",
  "Cd",
  "Ba",
  "Zn",
  "Pb",
  "Co",
  "U",
  "Mo",
  "Al",
  "As",
  "Cr",
  "Hg",
  "Sr",
  "Li",
  "V",
  "Ra",
  "Ca",
  "Mg",
  "Na",
  "K",
  "B",
  "Si",
  "P",
  "N",
  "Ag",
  "Sb",
  "Se",
  "Ti",
  "W",
  "Rb",
  "Cs",
  "Nd",
  "Ga",
  "Ge",
  "Sn",
  "Tl",
  "Th",
  "Y",
  "La",
  "Ce",
];

/** Qualifier words removed before lookup and kept in the name: "Discrete Chlorophyll-a" → "Chla (discrete)". */
export const NAME_QUALIFIERS: readonly string[] = [
  "dissolved",
  "total",
  "filtered",
  "discrete",
  "calculated",
  "particulate",
  "labile",
];

function key(text: string): string {
  return text.toLowerCase().replace(/[\s\-._]/g, "");
}

function lookup(text: string): string | undefined {
  const k = key(text);
  if (k.length === 0) return undefined;
  const syn = CONSTITUENT_SYNONYMS[k];
  if (syn !== undefined) return syn;
  const element = ELEMENT_SYMBOLS.find((s) => s.toLowerCase() === k);
  return element;
}

/**
 * Normalises a constituent name to its element or species symbol.
 *
 * A leading "d" or "p" before a symbol reads as dissolved or particulate ("dFe" → "Fe",
 * "pMn" → "Mn (particulate)").
 *
 * @param name the header's name part (unit already removed), e.g. "Silicate", "Iron", "FE", "Discrete Oxygen"
 * @returns the symbol ("Si", "Fe", "O2 (discrete)"), or undefined when the name is not a known constituent
 */
export function normaliseConstituentName(name: string): string | undefined {
  const direct = lookup(name);
  if (direct !== undefined) return direct;
  // "dFe" = dissolved Fe (the default meaning of a symbol here), "pFe" = particulate Fe.
  const prefixed = /^([dp])([A-Z].*)$/.exec(name.trim());
  const symbol = prefixed === null ? undefined : lookup(prefixed[2]);
  if (prefixed !== null && symbol !== undefined) return prefixed[1] === "d" ? symbol : `${symbol} (particulate)`;
  const words = name.trim().split(/[\s_]+/);
  const kept: string[] = [];
  const qualifiers: string[] = [];
  for (const w of words) {
    if (NAME_QUALIFIERS.includes(w.toLowerCase())) qualifiers.push(w.toLowerCase());
    else kept.push(w);
  }
  if (qualifiers.length === 0) return undefined;
  const base = lookup(kept.join(" "));
  return base === undefined ? undefined : `${base} (${qualifiers.join(" ")})`;
}
