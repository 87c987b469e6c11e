/**
 * Methods text and reference list of the briefing, drawn from the bibliography
 * (referencesBibliography.ts). Only entries whose details were confirmed are listed; entries
 * recalled from memory are cited in the text as "method after …" and not listed.
 */
import { bibEntry, referenceList } from "./referencesBibliography.ts";

/** Author–year form of an entry: "Boyle et al. 1974", "Officer & Lynch 1981". */
export function authorYear(key: string): string {
  const e = bibEntry(key);
  const surnames = e.authors.split(/\.,\s+/).map((a) => a.split(",")[0].trim());
  const names =
    surnames.length === 1
      ? surnames[0]
      : surnames.length === 2
        ? `${surnames[0]} & ${surnames[1]}`
        : `${surnames[0]} et al.`;
  return `${names} ${e.year}`;
}

/**
 * In-text citation of entries: confirmed ones by author and year, those recalled from memory as
 * "method after …" (never presented as checked).
 * @param keys bibliography keys
 * @returns e.g. "Boyle et al. 1974; method after Liss 1976; Officer 1979"
 * @throws {RangeError} for an unknown key
 */
export function cite(...keys: string[]): string {
  const checked = keys.filter((k) => bibEntry(k).checked === "confirmed").map(authorYear);
  const recalled = keys.filter((k) => bibEntry(k).checked !== "confirmed").map(authorYear);
  return [...checked, ...(recalled.length ? [`method after ${recalled.join("; ")}`] : [])].join("; ");
}

/** Keys the methods text cites (the comparison paragraph's only when surveys are compared). */
const METHODS_KEYS = [
  "liss1976",
  "boyle1974",
  "craven1979",
  "efron1993",
  "officer1979",
  "officerLynch1981",
  "loderReichard1981",
  "cifuentes1990",
  "regnier1998",
] as const;
const COMPARISON_KEYS = ["hansenRattray1965", "chatwin1976", "monismith2002", "savenije1993"] as const;

/**
 * The briefing's reference list: the confirmed entries among those its methods text cites.
 * @param comparison true when surveys are compared
 * @returns formatted references, alphabetical
 */
export function briefingReferences(comparison: boolean): string[] {
  return referenceList(comparison ? [...METHODS_KEYS, ...COMPARISON_KEYS] : METHODS_KEYS);
}

/**
 * Methods paragraphs of the briefing.
 *
 * @param fitMethod how the C–S curves were fitted (from the analyses), when known
 * @param bootstrap draws and seed of the bootstrap, when known
 * @param comparison true when surveys are compared
 * @see bibliography keys in METHODS_KEYS and COMPARISON_KEYS.
 */
export function methodsParagraphs(
  fitMethod: string | undefined,
  bootstrap: { draws: number; seed: number } | undefined,
  comparison: boolean,
): string[] {
  const out = [
    "Stations are placed on the channel centerline (the GeoJSON line given, RFC 7946, or without one a line built from the station positions ordered along the salinity gradient) as distance from the mouth along the channel in km; salinity along the channel is fitted as a profile that falls landward, and isohaline positions are interpolated between stations. The salt intrusion length is the distance of the S = 2 isohaline from the mouth (common practice).",
    `Each dissolved constituent is plotted against salinity and compared with the theoretical dilution line, the straight line joining the river and sea end-members that a conservatively mixing constituent would follow (${cite("liss1976", "boyle1974")}). A constituent is called non-conservative only when the stations depart from the line by more than twice the analytical precision and the curvature tests agree (common practice).`,
    `The concentration–salinity curve is fitted as ${fitMethod ?? "a smoothing spline"} (${cite("craven1979")}). The seaward straight phase and the landward curve are fitted together as a continuous two-phase regression whose break salinity maximises the likelihood (common practice for segmented regression). Uncertainties are 95 % intervals from a parametric bootstrap on the fixed station design: new measurement noise is drawn at every station and the whole fit, break included, is repeated${bootstrap ? ` (${bootstrap.draws} draws, seed ${bootstrap.seed})` : ""} (${cite("efron1993")}).`,
    `The river end-member C₀ is read off the fitted curve at salinity 0 (or at the river's stated salinity), and the effective river end-member C*₀ is the straight seaward part of the curve extrapolated back to the same salinity, so that values are comparable between surveys. The net change, 100·(C*₀ − C₀)/C₀ in %, is negative for removal and positive for addition; with the river discharge Q, the river supplies Q·C₀, Q·C*₀ passes to the sea, and Q·(C*₀ − C₀) is the estuary's net sink or source in mol/s (${cite("boyle1974")}).`,
    "Reaction zones are the salinity ranges where the curve departs significantly from conservative mixing, placed on the channel through the survey's salinity profile; a mid-estuarine maximum is the highest point of the curve above the dilution line.",
    `All of this assumes steady river flow and end-members over at least one flushing time, two end-members only and the same mixing for salt and the constituent (${cite("officer1979", "officerLynch1981")}). A changing river concentration can make a conservative constituent look removed or added (${cite("loderReichard1981", "cifuentes1990")}), and straight lines can arise in changing conditions (${cite("regnier1998")}).`,
  ];
  if (comparison)
    out.push(
      `Surveys are compared as later minus reference survey. The 95 % interval of a difference combines the two surveys' intervals in quadrature, an approximation that treats the surveys as independent. The apparent discharge exponent n in L ∝ Qⁿ is the slope of ln L against ln Q; it is set beside the classical theoretical −1 (constant dispersion) and −1/3 (gravitational circulation; ${cite("hansenRattray1965", "chatwin1976")}) and the −1/7 reported for northern San Francisco Bay (${cite("monismith2002")}). Other estuaries give other exponents (${cite("savenije1993")}).`,
    );
  return out;
}
