import type { Precision } from "./options.ts";
import { molarFactor } from "./units.ts";
import { parseUnit } from "../seawater/units.ts";
import { ATOMIC_WEIGHTS } from "../seawater/atomicWeights.ts";

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

/** Element a tabulated constituent is counted per, for mass units (DOC in mg C/L, NO3 in mg N/L). */
const COUNTED_ELEMENT: Readonly<Record<string, string>> = {
  DOC: "C",
  NO3: "N",
  NO2: "N",
  NH4: "N",
  PO4: "P",
  Si: "Si",
};

/**
 * The table key of a constituent name: exact, then case-insensitive, then without a parenthesised
 * column suffix ("DOC (DOC_mgL)", the name a second column of the same constituent gets).
 */
function tableKey(name: string): string | undefined {
  const keys = Object.keys(DEFAULT_PRECISION);
  const find = (n: string) => keys.find((k) => k === n) ?? keys.find((k) => k.toLowerCase() === n.toLowerCase());
  return find(name) ?? find(name.replace(/\s*\([^()]*\)\s*$/, ""));
}

/**
 * The tabulated absolute floor, given per amount in `tableUnit`, in the data's `unit`: a molar unit
 * by the ratio of amount factors; a mass unit (mg/L, µg/kg) through the atomic weight of the element
 * the constituent is counted per (CIAAW 2021). 0 when the unit cannot be converted.
 */
function absoluteIn(key: string, absolute: number, tableUnit: string, unit: string): number {
  const from = molarFactor(tableUnit);
  if (!from) return 0;
  const to = molarFactor(unit);
  if (to) return (absolute * from.molPerUnit) / to.molPerUnit;
  const mass = parseUnit(unit);
  const element = COUNTED_ELEMENT[key] ?? key;
  const weight = Object.hasOwn(ATOMIC_WEIGHTS, element) ? ATOMIC_WEIGHTS[element]!.gPerMol : undefined;
  if (!mass || mass.quantity !== "mass" || weight === undefined) return 0;
  return (absolute * from.molPerUnit * weight) / mass.toBase;
}

/**
 * Default analytical precision for a constituent in a given unit. The same constituent gets the same
 * precision whatever its unit (a file with DOC in µmol/L and in mg/L is weighted alike in both).
 *
 * @param name constituent symbol, e.g. "Fe" (case-sensitive first, then case-insensitive, then
 *   without a parenthesised column suffix such as "DOC (DOC_mgL)")
 * @param unit the data's concentration unit, e.g. "µmol/kg" or "mg/L"
 * @returns the precision and whether it came from the table
 */
export function defaultPrecision(name: string, unit: string): { precision: Precision; fromTable: boolean } {
  const key = tableKey(name);
  if (!key) return { precision: FALLBACK_PRECISION, fromTable: false };
  const d = DEFAULT_PRECISION[key]!;
  return { precision: { relative: d.relative, absolute: absoluteIn(key, d.absolute, d.unit, unit) }, fromTable: true };
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
