/**
 * Types of the salinity-along-channel functions.
 */
import type { GeometryWarning } from "./types.ts";

/** One salinity observation placed along the channel. */
export interface SalinityPoint {
  /** Chainage [km from the mouth]. */
  km: number;
  /** Practical salinity (PSS-78, dimensionless). */
  salinity: number;
  /** Station id, for messages. */
  id?: string;
  /** Branch of the station, for messages and filtering. */
  branchId?: string;
}

/**
 * A salinity–chainage relation S(x) for one survey: knots joined by straight lines.
 * Between knots S is linear in km; outside [km[0], km[last]] it is undefined.
 */
export interface SalinityProfile {
  /** Knot chainages [km from the mouth], strictly increasing. */
  km: number[];
  /** Salinity at each knot (PSS-78). */
  salinity: number[];
  /**
   * "isotonic": decreasing isotonic (PAVA) fit, one knot per pooled block at its mean km;
   * "piecewiseLinear": through the data sorted by km (ties averaged), used when the data are far from monotone.
   */
  method: "isotonic" | "piecewiseLinear";
  /** True when S never increases landward along the knots. */
  monotone: boolean;
  /** Largest |fitted − observed| of the isotonic fit (salinity units); 0 for exactly monotone data. */
  maxIsotonicResidual: number;
  /** Number of observations used. */
  nPoints: number;
  warnings: GeometryWarning[];
}

/** Where one isohaline lies: every chainage at which S(x) crosses the value. */
export interface IsohalinePosition {
  /** The isohaline's salinity (PSS-78). */
  salinity: number;
  /** Crossing chainages [km from the mouth], increasing; empty when the value is outside the surveyed range. */
  km: number[];
}
