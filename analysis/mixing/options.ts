/** One observation of a constituent, as the mixing analysis takes it. */
export interface MixingSample {
  stationId: string;
  /** Practical salinity (PSS-78). */
  salinity: number;
  /** Concentration in the constituent's unit; for a censored value, the substitute the caller chose (replaced by the documented rule when detectionLimit is given). */
  conc: number;
  /** True when the value was below detection. */
  censored: boolean;
  /** Detection limit in the constituent's unit (censored values). */
  detectionLimit?: number;
  /** False when QC rejected the value: kept in the data, left out of the analysis. */
  accepted: boolean;
}

/** A user-given end-member: value ± sd at a salinity. */
export interface EndmemberOverride {
  conc: number;
  concSd?: number;
  /** Salinity of the end-member; defaults to the data group's mean salinity (river: 0 when absent). */
  salinity?: number;
}

/** Analytical precision σ = sqrt((relative·C)² + absolute²), in the constituent's unit. */
export interface Precision {
  /** Relative precision as a fraction (0.03 = 3 %). */
  relative: number;
  /** Absolute floor in the constituent's unit. */
  absolute: number;
}

/** Options of {@link analyzeConstituent}. Every field is optional except name and unit. */
export interface AnalyzeOptions {
  name: string;
  /** Concentration unit, e.g. "nmol/L", "µmol/kg". */
  unit: string;
  river?: EndmemberOverride;
  sea?: EndmemberOverride;
  /** Analytical precision; default from {@link defaultPrecision}. */
  precision?: Precision;
  /** Significance factor k: a deviation is significant when |ΔC| > k·σ (default 2). */
  k?: number;
  riverDischargeM3s?: number;
  /** Cross-sectional area [m²]: a constant or a function of salinity. */
  crossSectionM2?: number | ((salinity: number) => number);
  /** Longitudinal dispersion coefficient K [m²/s]: a constant or a function of salinity. */
  dispersionM2s?: number | ((salinity: number) => number);
  /** |dS/dx| along the channel [salinity units per m] at a salinity; derived from salinityToKmPoint when absent. */
  salinityGradientPerM?: (salinity: number) => number;
  /** Density [kg/m³] for per-kg units (constant or function of salinity); default 1000 with a warning. */
  densityKgM3?: number | ((salinity: number) => number);
  bootstrapDraws?: number;
  seed?: number;
  /** Salinity interval → channel intervals [km from the mouth] (from the geometry helper). */
  salinityToKm?: (s1: number, s2: number) => Array<[number, number]>;
  /** Salinity → every channel position [km from the mouth] where it occurs. */
  salinityToKmPoint?: (s: number) => number[];
  /** Flushing time of the estuary [days] (fraction-of-freshwater method). */
  flushingTimeDays?: number;
  /** River end-member history before the survey: concentration [unit] at days before the survey. */
  riverHistory?: Array<{ daysBeforeSurvey: number; conc: number }>;
  /** Set by the caller when salinity does not increase monotonically seaward along the channel. */
  salinityNonMonotonic?: boolean;
  /** Substitute for below-detection values when the limit is known, as a fraction of the limit (default 0.5 = DL/2). */
  censoredFraction?: number;
  /** Number of grid points of the fitted curve (default 81). */
  gridPoints?: number;
}
