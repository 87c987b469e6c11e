/**
 * The two invented surveys: discharge, end-members, prescribed reactions, noise and
 * formatting of every column. All values are choices for a demonstration, not data, loosely
 * guided by world-river and open-ocean orders of magnitude (Gaillardet, Viers & Dupré 2003;
 * Li 1982; from memory); the wet-season river end-members are lower (dilution at high discharge).
 */
import type { ReactionSpec } from "./reaction.ts";

/** A constituent column of the survey files. */
export interface ConstituentSpec {
  /** Symbol as in the column header, e.g. "Fe". */
  name: string;
  /** Unit as in the column header, e.g. "nmol/L". */
  unit: "nmol/L" | "µmol/L";
  /** Decimals written to the CSV. */
  decimals: number;
  /** Relative analytical noise (1 σ), e.g. 0.03 = 3 %. */
  relNoise: number;
  /** Absolute noise floor (1 σ), column units. */
  absNoise: number;
  /** Detection limit; values below are written "<DL". */
  detectionLimit?: number;
}

/** Per-survey end-members and reaction of one constituent. */
export interface ConstituentCase {
  riverConc: number;
  seaConc: number;
  /** Prescribed reaction; undefined = conservative. */
  reaction?: ReactionSpec;
}

/** One invented survey. */
export interface SurveySpec {
  /** Survey id written in the `survey` column and used in file names. */
  id: string;
  /** Human description. */
  label: string;
  /** Station id prefix ("W" or "D"). */
  stationPrefix: string;
  stationCount: number;
  dischargeM3s: number;
  seaSalinity: number;
  riverSalinity: number;
  /** Local date of the survey, YYYY-MM-DD. */
  date: string;
  /** ISO 8601 zone designator written in date_time ("Z" or ±hh:mm). */
  zone: string;
  /** First sample, minutes after local midnight. */
  startMinutes: number;
  temperatureRiverC: number;
  temperatureSeaC: number;
  pHRiver: number;
  pHSea: number;
  /** Depth of the pH minimum below the mixing line (pH units). */
  pHDip: number;
  constituents: Record<string, ConstituentCase>;
  /** Station (index, 0-based) whose Cu is deliberately wrong and flagged 4; undefined = none. */
  cuOutlierIndex?: number;
  /** Station (index) placed ~3 km off the channel to trigger an off-channel warning. */
  offChannelIndex?: number;
}

/** Column specs, in CSV order. */
export const CONSTITUENTS: ConstituentSpec[] = [
  { name: "Fe", unit: "nmol/L", decimals: 1, relNoise: 0.04, absNoise: 0.5, detectionLimit: 4 },
  { name: "Mn", unit: "nmol/L", decimals: 1, relNoise: 0.03, absNoise: 0.2 },
  { name: "Cu", unit: "nmol/L", decimals: 2, relNoise: 0.03, absNoise: 0.05 },
  { name: "Ni", unit: "nmol/L", decimals: 2, relNoise: 0.03, absNoise: 0.05 },
  { name: "Cd", unit: "nmol/L", decimals: 3, relNoise: 0.04, absNoise: 0.004, detectionLimit: 0.05 },
  { name: "Ba", unit: "nmol/L", decimals: 1, relNoise: 0.02, absNoise: 0.5 },
  { name: "Si", unit: "µmol/L", decimals: 1, relNoise: 0.02, absNoise: 0.2 },
  { name: "NO3", unit: "µmol/L", decimals: 2, relNoise: 0.02, absNoise: 0.1 },
  { name: "PO4", unit: "µmol/L", decimals: 3, relNoise: 0.03, absNoise: 0.01 },
];

function removal(fraction: number, riverConc: number, from: number, to: number, shape: number): ReactionSpec {
  return { deltaConc: -fraction * riverConc, fromSalinity: from, toSalinity: to, shape };
}

function cases(river: Record<string, number>, sea: Record<string, number>): Record<string, ConstituentCase> {
  return {
    // Fe: flocculation, ~92.5 % removed, finished by S = 15, front-loaded (Boyle et al. 1977; Sholkovitz 1978)
    Fe: { riverConc: river.Fe, seaConc: sea.Fe, reaction: removal(0.925, river.Fe, 0.2, 15, 0.6) },
    // Mn, Cu, Ni: partial removal 30–40 % with the Fe-like salinity dependence (Sholkovitz 1978)
    Mn: { riverConc: river.Mn, seaConc: sea.Mn, reaction: removal(0.4, river.Mn, 0.3, 12, 0.8) },
    Cu: { riverConc: river.Cu, seaConc: sea.Cu, reaction: removal(0.35, river.Cu, 0.3, 10, 0.8) },
    Ni: { riverConc: river.Ni, seaConc: sea.Ni, reaction: removal(0.3, river.Ni, 0.3, 10, 0.8) },
    // Cd: desorption, flux × 3, maximum at mid salinity (Elbaz-Poulichet et al. 1987, CONFIRMED-2nd range × 2–20)
    Cd: {
      riverConc: river.Cd,
      seaConc: sea.Cd,
      reaction: { deltaConc: 2 * river.Cd, fromSalinity: 3, toSalinity: 16, shape: 1 },
    },
    // Ba: desorption, C*0 − C0 = +35 nmol/L at low salinity (Stecher & Kogut 1999: 30–40 nM)
    Ba: {
      riverConc: river.Ba,
      seaConc: sea.Ba,
      reaction: { deltaConc: 35, fromSalinity: 2, toSalinity: 10, shape: 1 },
    },
    // Si: conservative (Boyle et al. 1974; Fanning & Pilson 1973)
    Si: { riverConc: river.Si, seaConc: sea.Si },
    // NO3: near-conservative, 5 % removal spread over S 1–20
    NO3: { riverConc: river.NO3, seaConc: sea.NO3, reaction: removal(0.05, river.NO3, 1, 20, 1) },
    // PO4: small low-salinity release (buffering by desorption from particles), +10 % over S 0.3–5
    PO4: {
      riverConc: river.PO4,
      seaConc: sea.PO4,
      reaction: { deltaConc: 0.1 * river.PO4, fromSalinity: 0.3, toSalinity: 5, shape: 1 },
    },
  };
}

/** The two invented surveys (wet: high discharge, dry: low discharge). */
export const SURVEYS: SurveySpec[] = [
  {
    id: "wet-2025-03",
    label: "Wet season, high discharge (invented), 18 March 2025",
    stationPrefix: "W",
    stationCount: 34,
    dischargeM3s: 450,
    seaSalinity: 33.6,
    riverSalinity: 0.08,
    date: "2025-03-18",
    zone: "-02:00",
    startMinutes: 7 * 60 + 30,
    temperatureRiverC: 8.8,
    temperatureSeaC: 11.2,
    pHRiver: 7.24,
    pHSea: 8.04,
    pHDip: 0.22,
    constituents: cases(
      { Fe: 880, Mn: 260, Cu: 18, Ni: 10.5, Cd: 0.26, Ba: 150, Si: 130, NO3: 70, PO4: 1.7 },
      { Fe: 1.5, Mn: 3, Cu: 2, Ni: 3, Cd: 0.1, Ba: 45, Si: 5, NO3: 2, PO4: 0.5 },
    ),
    cuOutlierIndex: 19,
  },
  {
    id: "dry-2025-09",
    label: "Dry season, low discharge (invented), 9 September 2025",
    stationPrefix: "D",
    stationCount: 30,
    dischargeM3s: 60,
    seaSalinity: 34.3,
    riverSalinity: 0.15,
    date: "2025-09-09",
    zone: "Z",
    startMinutes: 8 * 60,
    temperatureRiverC: 21.6,
    temperatureSeaC: 18.4,
    pHRiver: 7.38,
    pHSea: 8.06,
    pHDip: 0.2,
    constituents: cases(
      { Fe: 1000, Mn: 300, Cu: 20, Ni: 12, Cd: 0.3, Ba: 170, Si: 150, NO3: 80, PO4: 2 },
      { Fe: 1.5, Mn: 3, Cu: 2, Ni: 3, Cd: 0.04, Ba: 45, Si: 5, NO3: 2, PO4: 0.5 },
    ),
    offChannelIndex: 11,
  },
];
