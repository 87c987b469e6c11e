import type { Precision } from "./options.ts";
import { molarFactor } from "./units.ts";

/**
 * Default analytical precision by constituent, relative % plus an absolute floor
 * given in the unit named here (converted to the data's unit). These are
 * typical values of the trade (common practice; relative 3–5 %), not sourced
 * figures: users should enter their laboratory's precision.
 */
export const DEFAULT_PRECISION: Record<string, { relative: number; absolute: number; unit: string }> = {
  Fe: { relative: 0.05, absolute: 0.2, unit: "nmol/L" },
  Mn: { relative: 0.05, absolute: 0.1, unit: "nmol/L" },
  Cu: { relative: 0.05, absolute: 0.1, unit: "nmol/L" },
  Ni: { relative: 0.05, absolute: 0.1, unit: "nmol/L" },
  Co: { relative: 0.05, absolute: 0.02, unit: "nmol/L" },
  Zn: { relative: 0.05, absolute: 0.2, unit: "nmol/L" },
  Pb: { relative: 0.05, absolute: 0.01, unit: "nmol/L" },
  Cd: { relative: 0.05, absolute: 0.005, unit: "nmol/L" },
  Al: { relative: 0.05, absolute: 0.5, unit: "nmol/L" },
  Ba: { relative: 0.03, absolute: 1, unit: "nmol/L" },
  U: { relative: 0.03, absolute: 0.05, unit: "nmol/L" },
  Si: { relative: 0.03, absolute: 0.1, unit: "µmol/L" },
  NO3: { relative: 0.03, absolute: 0.1, unit: "µmol/L" },
  NO2: { relative: 0.03, absolute: 0.02, unit: "µmol/L" },
  NH4: { relative: 0.05, absolute: 0.1, unit: "µmol/L" },
  PO4: { relative: 0.03, absolute: 0.02, unit: "µmol/L" },
  DOC: { relative: 0.03, absolute: 5, unit: "µmol/L" },
};

/** Fallback when the constituent is not in the table: 5 % relative, no floor. */
export const FALLBACK_PRECISION: Precision = { relative: 0.05, absolute: 0 };

/**
 * Default analytical precision for a constituent in a given unit.
 *
 * @param name constituent symbol, e.g. "Fe" (case-sensitive first, then case-insensitive)
 * @param unit the data's concentration unit, e.g. "µmol/kg"
 * @returns the precision and whether it came from the table
 */
export function defaultPrecision(name: string, unit: string): { precision: Precision; fromTable: boolean } {
  const key =
    Object.keys(DEFAULT_PRECISION).find((k) => k === name) ??
    Object.keys(DEFAULT_PRECISION).find((k) => k.toLowerCase() === name.toLowerCase());
  if (!key) return { precision: FALLBACK_PRECISION, fromTable: false };
  const d = DEFAULT_PRECISION[key]!;
  const from = molarFactor(d.unit);
  const to = molarFactor(unit);
  const absolute = from && to ? (d.absolute * from.molPerUnit) / to.molPerUnit : 0;
  return { precision: { relative: d.relative, absolute }, fromTable: true };
}

/**
 * Analytical standard deviation of one value: σ = sqrt((relative·C)² + absolute²),
 * never below 1e-12·(1 + |C|) so that weights stay finite.
 *
 * @param p precision
 * @param conc concentration in the constituent's unit
 * @returns σ in the same unit
 */
export function sigmaOf(p: Precision, conc: number): number {
  const s = Math.hypot(p.relative * conc, p.absolute);
  return Math.max(s, 1e-12 * (1 + Math.abs(conc)));
}
