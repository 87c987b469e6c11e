import { cdChlorideSpeciation, type CdSpeciationOptions } from "./cdChloride.ts";
import { DAVIES_MAX_IONIC_STRENGTH } from "./davies.ts";
import { CD_CHLORIDE_SETS, type CdChlorideSet } from "./cdChlorideSets.ts";
import { checkGrid } from "./grid.ts";
import type { SeriesSet } from "./plotSeries.ts";

const LABELS: Record<string, string> = {
  "Cd+2": "Cd²⁺",
  "CdCl+": "CdCl⁺",
  CdCl2: "CdCl₂⁰",
  "CdCl3-": "CdCl₃⁻",
  "CdCl4-2": "CdCl₄²⁻",
};

/**
 * Cd²⁺ and chloro-complex fractions along the salinity gradient, from river to sea, with chloride and
 * ionic strength from the major-ion mixing model at each salinity (see cdChlorideSpeciation).
 * @param set constant set or id ("cdCl3WithEnthalpy", "cdCl4At25C")
 * @param salinityGrid practical salinities within the mixing model's end-members
 * @param temperatureC temperature [°C]
 * @param options Davies, mixing and extra-ligand options (chlorideMolKgH2O is ignored here)
 * @returns x = salinity, one series per species in %, plus "ionicStrength" [mol/kg-H2O]; warnings
 * @throws {RangeError} for an unknown set id or a grid value outside the end-members
 * @see Turner, Whitfield & Dickson (1981) GCA 45, 855–881 (from memory); Powell et al. (2011) Pure Appl. Chem. 83, 1163–1214.
 */
export function cdSpeciationVsSalinity(
  set: CdChlorideSet | string,
  salinityGrid: readonly number[],
  temperatureC: number,
  options: CdSpeciationOptions = {},
): SeriesSet {
  const s = typeof set === "string" ? CD_CHLORIDE_SETS[set as keyof typeof CD_CHLORIDE_SETS] : set;
  if (!s)
    throw new RangeError(
      `cdSpeciationVsSalinity: unknown set "${String(set)}" (known: ${Object.keys(CD_CHLORIDE_SETS).join(", ")})`,
    );
  checkGrid(
    "cdSpeciationVsSalinity",
    "salinityGrid",
    salinityGrid,
    options.mixing?.riverSalinity ?? 0,
    options.mixing?.seaSalinity ?? 35,
  );
  const perPoint = { ...options, chlorideMolKgH2O: undefined };
  const results = salinityGrid.map((salinity) => cdChlorideSpeciation(s, { salinity, temperatureC }, perPoint));
  const keys = Object.keys(results[0].fractions);
  const warnings = [...new Set(results.flatMap((r) => r.warnings.filter((w) => !w.startsWith("Davies"))))];
  const above = salinityGrid.filter((_, i) => results[i].ionicStrength > DAVIES_MAX_IONIC_STRENGTH);
  if (above.length > 0) {
    warnings.push(
      `Davies activity coefficients used above their validity limit (I > ${DAVIES_MAX_IONIC_STRENGTH} mol/kg) for S ≥ ${Math.min(...above)}; treat those fractions as indicative only`,
    );
  }
  return {
    x: [...salinityGrid],
    xLabel: "Practical salinity",
    xUnit: "",
    series: [
      ...keys.map((key) => ({
        key,
        label: LABELS[key] ?? key,
        unit: "%",
        values: results.map((r) => 100 * r.fractions[key]),
      })),
      {
        key: "ionicStrength",
        label: "Ionic strength",
        unit: "mol/kg-H2O",
        values: results.map((r) => r.ionicStrength),
      },
    ],
    warnings,
    source: s.source,
  };
}
