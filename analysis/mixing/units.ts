import { parseUnit } from "../seawater/units.ts";

/** How a concentration unit converts to amount per volume or per mass. */
export interface MolarUnit {
  /** Moles per one unit of amount, e.g. 1e-9 for nmol. */
  molPerUnit: number;
  /** "L" (per litre) or "kg" (per kilogram) or "m3". */
  per: "L" | "kg" | "m3";
}

/**
 * Reads a molar concentration unit such as "nmol/L", "µmol kg-1", "uM", "nM" through the one units
 * table (analysis/seawater/units.ts).
 *
 * @param unit unit text
 * @returns the amount factor and the "per" basis; undefined for non-molar units (e.g. µg/L)
 */
export function molarFactor(unit: string): MolarUnit | undefined {
  const u = parseUnit(unit);
  if (!u || u.quantity !== "amount") return undefined;
  return { molPerUnit: u.toBase, per: u.basis === "perLitre" ? "L" : "kg" };
}

/**
 * Factor turning a concentration in `unit` into mol/m³ (for flux = Q·C with Q in m³/s).
 * 1 µmol/L = 1 mmol/m³; per-kg units need the density ρ [kg/m³]: C[mol/m³] = C[mol/kg]·ρ.
 *
 * @param unit concentration unit
 * @param densityKgM3 water density for per-kg units (ignored otherwise)
 * @returns mol/m³ per unit, or undefined for non-molar units
 */
export function toMolPerM3(unit: string, densityKgM3: number): number | undefined {
  const f = molarFactor(unit);
  if (!f) return undefined;
  if (f.per === "L") return f.molPerUnit * 1000;
  if (f.per === "m3") return f.molPerUnit;
  return f.molPerUnit * densityKgM3;
}
