/**
 * The survey data model shared by every part of Brackline.
 *
 * Readers in `analysis/io` produce it, geometry and mixing consume it, and the
 * dashboard and CLI display it. Every parsed value keeps the text it came from.
 */

/** How a single cell of a survey file was understood. */
export type CellStatus =
  /** a plain number */
  | "measured"
  /** below the detection limit ("<0.05", "BDL", "ND"): a censored value */
  | "belowDetection"
  /** blank, "NA", "-999" or another missing-value marker */
  | "missing"
  /** text that could not be read as a value of the expected kind */
  | "invalid";

/** One parsed value together with the user's original text. */
export interface ValueCell {
  /** Parsed value in the column's unit; `undefined` unless status is "measured". */
  value: number | undefined;
  /** The text exactly as it stood in the file. */
  original: string;
  status: CellStatus;
  /** Detection limit in the column's unit when status is "belowDetection" and a limit was given. */
  detectionLimit?: number;
  /** The original QC flag text, when the file carried a flag for this value. */
  qcFlag?: string;
  /** False when the QC flag maps to "reject"; rejected values are kept but not analysed. */
  accepted: boolean;
  /**
   * Practical salinity of the sample(s) this value came from, when layer selection combined several
   * depths of a station (the mixing analysis pairs the value with it rather than the station's salinity).
   */
  sampleSalinity?: number;
  /** Depth of the sample(s) this value came from [m], when layer selection chose it. */
  sampleDepthM?: number;
  /** Depth of the salinity paired with this value when it was taken from another depth than the value [m]. */
  salinityDepthM?: number;
}

/** One sample (a station at one time and depth). */
export interface Station {
  /** Station identifier as written in the file. */
  id: string;
  /** Sampling time, ISO 8601 (UTC when the zone is known, else local without offset). */
  time?: string;
  /** Position as [lon, lat] in decimal degrees (WGS84); undefined when unknown. */
  lonLat?: [number, number];
  /** Sample depth below the surface [m]. */
  depthM?: number;
  /** Practical salinity (PSS-78). */
  salinity: ValueCell;
  /** In situ temperature [°C, ITS-90]. */
  temperatureC?: ValueCell;
  /** pH as measured (scale as given by the file). */
  pH?: ValueCell;
  /** Constituent values keyed by constituent name (see {@link Constituent.name}). */
  values: Record<string, ValueCell>;
  /** 1-based row number in the source file (header is row 1). */
  sourceRow: number;
  /** Source file name. */
  sourceFile: string;
}

/** A measured constituent (dissolved metal, nutrient, ...). */
export interface Constituent {
  /** Element or species symbol as in the file, e.g. "Fe", "Si", "NO3". */
  name: string;
  /** Canonical unit string, e.g. "nmol/L", "µmol/L", "nmol/kg", "µg/L". */
  unit: string;
  /** The header text the constituent came from. */
  header: string;
  /**
   * "tracer": dissolved constituent analysed against the dilution line (the default);
   * "nonMixing": oxygen, pigments, particles, optical measures — shown along the channel, no end-members.
   */
  kind?: "tracer" | "nonMixing";
  /** Why a variable is "nonMixing" (shown to the user). */
  kindReason?: string;
}

/** One survey (cruise or sampling campaign) of one estuary. */
export interface Survey {
  /** Human name, e.g. "Wet season 2025-03". */
  name: string;
  /** First and last sampling dates, ISO 8601 (date or date-time). */
  startDate?: string;
  endDate?: string;
  /** River (fresh-water) discharge during the survey [m³/s], when known. */
  riverDischargeM3s?: number;
  stations: Station[];
  constituents: Constituent[];
}

/** A problem found while reading a file; never thrown, always returned. */
export interface ImportIssue {
  file: string;
  /** 1-based row number in the file (header is row 1); 0 for file-level problems. */
  row: number;
  /** Column header text ("" for row- or file-level problems). */
  column: string;
  /** The offending text as found. */
  value: string;
  /** What was expected instead, in plain words. */
  expected: string;
  severity: "error" | "warning";
}
