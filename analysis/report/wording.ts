/**
 * Plain words for numbers and names in the briefing: fractions in words, multiples,
 * constituent names and behaviour classes.
 */
import type { BehaviourClass } from "../mixing/result.ts";

const FRACTIONS: ReadonlyArray<[number, string]> = [
  [1 / 2, "half"],
  [1 / 3, "a third"],
  [2 / 3, "two thirds"],
  [1 / 4, "a quarter"],
  [3 / 4, "three quarters"],
  [1 / 5, "a fifth"],
  [2 / 5, "two fifths"],
  [3 / 5, "three fifths"],
  [4 / 5, "four fifths"],
  [1 / 10, "a tenth"],
  [3 / 10, "three tenths"],
  [7 / 10, "seven tenths"],
  [9 / 10, "nine tenths"],
];

/**
 * A fraction 0 < f < 1 in words when a simple fraction lies within ±0.03 ("about nine tenths"),
 * the simplest such fraction first; otherwise a rounded percentage ("about 37 %").
 *
 * @param f fraction (0…1)
 * @returns words, e.g. "about two fifths"
 * @throws RangeError for f outside (0, 1] or not finite
 */
export function fractionInWords(f: number): string {
  if (!(f > 0 && f <= 1)) throw new RangeError(`fractionInWords: f must lie in (0, 1], got ${f}`);
  if (f >= 0.985) return "nearly all";
  if (f < 0.05) return `about ${Math.round(f * 100)} %`;
  const hit = FRACTIONS.find(([v]) => Math.abs(v - f) <= 0.03);
  return hit ? `about ${hit[1]}` : `about ${Math.round(f * 100)} %`;
}

const MULTIPLES = [
  "",
  "",
  "twice",
  "three times",
  "four times",
  "five times",
  "six times",
  "seven times",
  "eight times",
  "nine times",
  "ten times",
];

/**
 * A ratio m > 1 in words: "about twice", "about three times" (within ±0.15 of a whole number up
 * to ten), else "about 2.6 times"; ratios below 1.9 as a percentage more ("about a quarter more").
 *
 * @param m ratio (> 1)
 * @returns words
 * @throws RangeError for m ≤ 1 or not finite
 */
export function multipleInWords(m: number): string {
  if (!(m > 1) || !Number.isFinite(m)) throw new RangeError(`multipleInWords: m must be a finite number > 1, got ${m}`);
  if (m < 1.9) return `${fractionInWords(Math.min(1, m - 1))} more`;
  const r = Math.round(m);
  if (r <= 10 && Math.abs(m - r) <= 0.15) return `about ${MULTIPLES[r]} as much`;
  return `about ${m.toFixed(1)} times as much`;
}

const NAMES: Readonly<Record<string, string>> = {
  Fe: "dissolved iron",
  Mn: "dissolved manganese",
  Cu: "dissolved copper",
  Ni: "dissolved nickel",
  Cd: "dissolved cadmium",
  Ba: "dissolved barium",
  Zn: "dissolved zinc",
  Pb: "dissolved lead",
  Co: "dissolved cobalt",
  U: "dissolved uranium",
  Mo: "dissolved molybdenum",
  Sr: "dissolved strontium",
  Ra: "dissolved radium",
  Si: "silicate",
  NO3: "nitrate",
  NO2: "nitrite",
  NH4: "ammonium",
  PO4: "phosphate",
  DOC: "dissolved organic carbon",
  DIC: "dissolved inorganic carbon",
  TA: "total alkalinity",
};

/**
 * Plain name of a constituent for sentences: "dissolved iron (Fe)"; unknown names as given.
 *
 * @param name constituent name as in the survey, e.g. "Fe"
 * @returns the plain name with the symbol in brackets
 */
export function constituentWords(name: string): string {
  const n = NAMES[name];
  return n ? `${n} (${name})` : name;
}

const CLASS_WORDS: Readonly<Record<BehaviourClass, string>> = {
  conservative: "conservative",
  removal: "removal",
  addition: "addition",
  "removal-then-conservative": "removal, then conservative",
  "maximum-then-conservative": "mid-estuarine maximum, then conservative",
  "insufficient-data": "insufficient data",
};

/** Behaviour class in plain words. */
export function classWords(c: BehaviourClass): string {
  return CLASS_WORDS[c];
}
