import { carbonatePhFromTaDic } from "./carbonatePh.ts";
import type { CarbonateK1K2Set } from "./carbonateConstants.ts";
import { checkGrid } from "./grid.ts";
import type { SeriesSet } from "./plotSeries.ts";

/** A CO2-system end-member; TA and DIC per kg (mass-based units mix linearly, per-litre ones do not). */
export interface CarbonateEndmember {
  salinity: number;
  taUmolKg: number;
  dicUmolKg: number;
  /** Temperature [°C]; when both end-members give one, temperature mixes linearly too. */
  temperatureC?: number;
}

/** Input of {@link carbonatePhAlongMixingLine}. */
export interface CarbonateMixingInput {
  river: CarbonateEndmember;
  sea: CarbonateEndmember;
  /** Salinities to evaluate, within the end-members. */
  salinityGrid: readonly number[];
  /** Temperature [°C] for every point; overrides end-member temperatures. */
  temperatureC?: number;
  /** K1, K2 set (default "millero2010"). */
  k1k2Set?: CarbonateK1K2Set;
}

/** pH along the mixing line, with the minimum. */
export interface CarbonateMixingSeries extends SeriesSet {
  /** Lowest pH_T on the line (golden-section refined between grid points), or undefined if the line has no interior minimum. */
  minimum?: { salinity: number; pHTotal: number };
}

/**
 * pH (total scale) along the conservative mixing line of TA and DIC: f = (S − S_r)/(S_s − S_r),
 * TA = f·TA_s + (1 − f)·TA_r, DIC likewise; constants recomputed at each (S, T) (Millero 2010 K1, K2
 * converted from SWS to total; Dickson 1990 KB, KS; Millero 1995 KW; Perez & Fraga 1987 KF). Mixing of two
 * waters on a curved pH scale typically gives a pH minimum at low salinity.
 * @param input end-members, salinity grid, temperature and constant set
 * @returns x = salinity; series "pH_T", "TA" and "DIC" [µmol/kg], "pK1_T", "pK2_T"; minimum; warnings
 * @throws {RangeError} for end-members with S_sea ≤ S_river, a grid value outside them, missing temperature,
 *   or a point where no pH in 2…12 fits
 * @see bibliography keys millero2010, dicksonSabineChristian2007 (mixing of TA and DIC by mass: common practice).
 */
export function carbonatePhAlongMixingLine(input: CarbonateMixingInput): CarbonateMixingSeries {
  const fn = "carbonatePhAlongMixingLine";
  const { river, sea } = input;
  if (!(sea.salinity > river.salinity))
    throw new RangeError(`${fn}: sea.salinity (${sea.salinity}) must exceed river.salinity (${river.salinity})`);
  checkGrid(fn, "salinityGrid", input.salinityGrid, river.salinity, sea.salinity);
  const set = input.k1k2Set ?? "millero2010";
  const tempAt = (f: number): number => {
    if (input.temperatureC !== undefined) return input.temperatureC;
    if (river.temperatureC === undefined || sea.temperatureC === undefined) {
      throw new RangeError(`${fn}: give temperatureC, or temperatureC on both end-members`);
    }
    return f * sea.temperatureC + (1 - f) * river.temperatureC;
  };
  const at = (s: number) => {
    const f = (s - river.salinity) / (sea.salinity - river.salinity);
    const ta = f * sea.taUmolKg + (1 - f) * river.taUmolKg;
    const dic = f * sea.dicUmolKg + (1 - f) * river.dicUmolKg;
    const r = carbonatePhFromTaDic(s, tempAt(f), ta, dic, set);
    if (!r) throw new RangeError(`${fn}: no pH in 2…12 matches TA = ${ta}, DIC = ${dic} µmol/kg at S = ${s}`);
    return { ta, dic, r };
  };
  const pts = input.salinityGrid.map(at);
  const pH = pts.map((p) => p.r.pHTotal);
  let minimum: CarbonateMixingSeries["minimum"];
  const order = input.salinityGrid.map((s, i) => [s, i] as const).sort((a, b) => a[0] - b[0]);
  for (let k = 1; k < order.length - 1; k++) {
    const [, i] = order[k];
    if (pH[i] <= pH[order[k - 1][1]] && pH[i] <= pH[order[k + 1][1]]) {
      minimum = goldenMin((s) => at(s).r.pHTotal, order[k - 1][0], order[k + 1][0]);
      break;
    }
  }
  const warnings = [...new Set(pts.flatMap((p) => p.r.warnings))];
  warnings.push("Organic alkalinity, phosphate, silicate and activity corrections in river water are neglected");
  return {
    x: [...input.salinityGrid],
    xLabel: "Practical salinity",
    xUnit: "",
    series: [
      { key: "pH_T", label: "pH (total scale)", unit: "pH_T", values: pH },
      { key: "TA", label: "Total alkalinity", unit: "µmol/kg", values: pts.map((p) => p.ta) },
      { key: "DIC", label: "Dissolved inorganic carbon", unit: "µmol/kg", values: pts.map((p) => p.dic) },
      {
        key: "pK1_T",
        label: "pK1 (total scale)",
        unit: "",
        values: pts.map((p) => -Math.log10(p.r.constants.k1Total)),
      },
      {
        key: "pK2_T",
        label: "pK2 (total scale)",
        unit: "",
        values: pts.map((p) => -Math.log10(p.r.constants.k2Total)),
      },
    ],
    warnings,
    source:
      set === "millero2010"
        ? "Millero, F.J., 2010. Carbonate constants for estuarine waters. Mar. Freshwater Res. 61, 139–142 (SWS → total); Dickson, Sabine & Christian 2007, PICES Spec. Publ. 3"
        : "Lueker, T.J., Dickson, A.G., Keeling, C.D., 2000. Mar. Chem. 70, 105–119; Dickson, Sabine & Christian 2007, PICES Spec. Publ. 3",
    minimum,
  };
}

function goldenMin(f: (x: number) => number, a: number, b: number): { salinity: number; pHTotal: number } {
  const g = (Math.sqrt(5) - 1) / 2;
  let lo = a;
  let hi = b;
  for (let i = 0; i < 80 && hi - lo > 1e-9; i++) {
    const x1 = hi - g * (hi - lo);
    const x2 = lo + g * (hi - lo);
    if (f(x1) < f(x2)) hi = x2;
    else lo = x1;
  }
  const s = 0.5 * (lo + hi);
  return { salinity: s, pHTotal: f(s) };
}
