import type { Estimate, FluxSummary, MixingWarning } from "./result.ts";
import { molarFactor, toMolPerM3 } from "./units.ts";

/** Relative density error above which a per-kg → per-L shortcut matters (common practice). */
export const DENSITY_WARN_FRACTION = 0.03;

/**
 * Fluxes of Boyle et al. (1974): gross river input F_riv = Q·C₀, effective export
 * F_eff = Q·C*₀ and net estuarine change Q·(C*₀ − C₀) (negative = sink), in mol/s.
 * Volumetric units: 1 µmol/L = 1 mmol/m³. Per-kg units are multiplied by the density
 * at the river salinity (option densityKgM3; default 1000 kg/m³ with a warning —
 * the error is ≈ 2.5 % at S ≈ 35 and ≈ 0 for river water).
 *
 * @param q river discharge [m³/s], > 0
 * @param unit concentration unit
 * @param c0 river end-member C₀ with interval [unit]
 * @param cStar effective end-member C*₀ with interval [unit]
 * @param delta interval of C*₀ − C₀ [unit]
 * @param riverSalinity S_r (for the density)
 * @param density option densityKgM3
 * @returns the flux summary and warnings; undefined summary for non-molar units
 * @see bibliography key boyle1974.
 */
export function fluxSummary(
  q: number,
  unit: string,
  c0: Estimate,
  cStar: Estimate,
  delta: [number, number] | undefined,
  riverSalinity: number,
  density: number | ((s: number) => number) | undefined,
): { flux?: FluxSummary; warnings: MixingWarning[] } {
  const warnings: MixingWarning[] = [];
  const mu = molarFactor(unit);
  if (!mu) {
    warnings.push({
      code: "flux-unit",
      message: `Fluxes need a molar concentration unit (e.g. nmol/L, µmol/kg); "${unit}" is not one, so no flux is given.`,
    });
    return { warnings };
  }
  let rho = 1000;
  let note = "";
  if (mu.per === "kg") {
    if (density === undefined) {
      warnings.push({
        code: "per-kg-as-per-litre",
        message: `Concentrations in ${unit} were converted to per-volume with ρ = 1000 kg/m³ (1 kg ≈ 1 L). River water is ≈ 1000 kg/m³, but seawater at S ≈ 35 is ≈ 1025 kg/m³ (≈ 2.5 %); supply a density when better than ${DENSITY_WARN_FRACTION * 100} % matters.`,
      });
      note = "; per-kg treated as per-L (ρ = 1000 kg/m³)";
    } else {
      rho = typeof density === "number" ? density : density(riverSalinity);
      if (!(rho > 900 && rho < 1100))
        throw new RangeError(`analyzeConstituent: densityKgM3 must be in (900, 1100) kg/m³, got ${rho}`);
      note = `; per-kg converted with ρ(S_r) = ${rho.toFixed(2)} kg/m³`;
    }
  }
  const fac = toMolPerM3(unit, rho)!;
  // Interval widened to contain the point estimate (never an estimate outside its own interval).
  const est = (v: number, lo: number, hi: number): Estimate => ({
    value: q * fac * v,
    lower: q * fac * Math.min(lo, v),
    upper: q * fac * Math.max(hi, v),
    unit: "mol/s",
  });
  const d = cStar.value - c0.value;
  return {
    flux: {
      grossRiver: est(c0.value, c0.lower, c0.upper),
      effectiveExport: est(cStar.value, cStar.lower, cStar.upper),
      netChange: est(d, delta?.[0] ?? d, delta?.[1] ?? d),
      dischargeM3s: q,
      unitNote: `flux [mol/s] = Q [m³/s] × C [${unit}] × ${fac.toExponential(3)} (mol/m³ per ${unit})${note}; ×86.4 gives kmol/d`,
    },
    warnings,
  };
}
