/** How a concentration unit converts to amount per volume or per mass. */
export interface MolarUnit {
  /** Moles per one unit of amount, e.g. 1e-9 for nmol. */
  molPerUnit: number;
  /** "L" (per litre) or "kg" (per kilogram) or "m3". */
  per: "L" | "kg" | "m3";
}

const PREFIX: Record<string, number> = { "": 1, m: 1e-3, µ: 1e-6, μ: 1e-6, u: 1e-6, n: 1e-9, p: 1e-12, f: 1e-15 };

/**
 * Parses a molar concentration unit such as "nmol/L", "µmol kg-1", "uM", "nM".
 *
 * @param unit unit text
 * @returns the amount factor and the "per" basis; undefined for non-molar units (e.g. µg/L)
 */
export function molarFactor(unit: string): MolarUnit | undefined {
  const u = unit.trim().replace(/\s+/g, " ");
  const m = /^([mµμunpf]?)mol\s*(?:\/\s*|\s)(l|L|kg|m3|m³)(?:-1|⁻¹)?$/.exec(u);
  if (m) {
    const basis = m[2]!.toLowerCase();
    return { molPerUnit: PREFIX[m[1]!]!, per: basis === "l" ? "L" : basis === "kg" ? "kg" : "m3" };
  }
  const molar = /^([mµμunpf]?)M$/.exec(u);
  if (molar) return { molPerUnit: PREFIX[molar[1]!]!, per: "L" };
  return undefined;
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
