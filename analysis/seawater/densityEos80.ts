import { t68FromT90 } from "./temperatureScale.ts";

function poly(x: number, c: readonly number[]): number {
  let y = 0;
  for (let i = c.length - 1; i >= 0; i--) y = y * x + c[i];
  return y;
}

/** Density of seawater at p = 0, ρ(S, t68, 0) [kg/m³] (Millero & Poisson 1981). */
function rho0(s: number, t: number): number {
  const rhoW = poly(t, [999.842594, 6.793952e-2, -9.09529e-3, 1.001685e-4, -1.120083e-6, 6.536332e-9]);
  const b = poly(t, [0.824493, -4.0899e-3, 7.6438e-5, -8.2467e-7, 5.3875e-9]);
  const c = poly(t, [-5.72466e-3, 1.0227e-4, -1.6546e-6]);
  return rhoW + b * s + c * s * Math.sqrt(s) + 4.8314e-4 * s * s;
}

/**
 * EOS-80 secant bulk modulus K(S, t, p) [bar] (Millero, Chen, Bradshaw & Schleicher 1980), t in IPTS-68.
 * @param salinity practical salinity
 * @param temperatureC in situ temperature [°C, ITS-90]; converted to IPTS-68 inside
 * @param pressureDbar sea pressure [dbar]
 * @returns secant bulk modulus [bar]
 * @throws {TypeError} when an argument is not finite; {RangeError} when salinity or pressure < 0
 * @see Millero, F.J., Chen, C.-T., Bradshaw, A., Schleicher, K., 1980. Deep-Sea Res. 27A, 255–264.
 */
export function eos80SecantBulkModulusBar(salinity: number, temperatureC: number, pressureDbar: number): number {
  validate("eos80SecantBulkModulusBar", salinity, temperatureC, pressureDbar);
  const s = salinity;
  const t = t68FromT90(temperatureC);
  const p = pressureDbar / 10;
  const s15 = s * Math.sqrt(s);
  const kw = poly(t, [19652.21, 148.4206, -2.327105, 1.360477e-2, -5.155288e-5]);
  const k0 =
    kw + poly(t, [54.6746, -0.603459, 1.09987e-2, -6.167e-5]) * s + poly(t, [7.944e-2, 1.6483e-2, -5.3009e-4]) * s15;
  const a =
    poly(t, [3.239908, 1.43713e-3, 1.16092e-4, -5.77905e-7]) +
    poly(t, [2.2838e-3, -1.0981e-5, -1.6078e-6]) * s +
    1.91075e-4 * s15;
  const b = poly(t, [8.50935e-5, -6.12293e-6, 5.2787e-8]) + poly(t, [-9.9348e-7, 2.0816e-8, 9.1697e-10]) * s;
  return k0 + a * p + b * p * p;
}

function validate(fn: string, s: number, t: number, p: number): void {
  for (const [name, v] of [
    ["salinity", s],
    ["temperatureC", t],
    ["pressureDbar", p],
  ] as const) {
    if (typeof v !== "number" || !Number.isFinite(v))
      throw new TypeError(`${fn}: ${name} must be a finite number, got ${String(v)}`);
  }
  if (s < 0) throw new RangeError(`${fn}: salinity must be ≥ 0, got ${s}`);
  if (p < 0) throw new RangeError(`${fn}: pressureDbar must be ≥ 0, got ${p}`);
}

/**
 * In situ density of seawater by the International Equation of State of Seawater 1980 (EOS-80):
 * ρ = ρ(S, t, 0)/(1 − P/K(S, t, P)), P = p/10 bar, t = t68 = 1.00024·t90 (the ITS-90 input is converted).
 * Valid 0 ≤ S ≤ 42, −2…40 °C, 0…10000 dbar. Differs from TEOS-10 (at SR, no composition anomaly) by
 * ≤ 0.005 kg/m³ in estuarine water, i.e. < 5e-6 relative, ample for L ↔ kg conversion.
 *
 * @param salinity practical salinity (PSS-78)
 * @param temperatureC in situ temperature [°C, ITS-90]
 * @param pressureDbar sea pressure [dbar]; 0 for a sample's volume measured at the surface
 * @returns density [kg/m³]
 * @throws {TypeError} when an argument is not finite; {RangeError} when salinity or pressure < 0
 * @see Millero, F.J., Poisson, A., 1981. Deep-Sea Res. 28A, 625–629 (one-atmosphere equation).
 * @see Millero, F.J., Chen, C.-T., Bradshaw, A., Schleicher, K., 1980. Deep-Sea Res. 27A, 255–264.
 * @see Fofonoff, N.P., Millard, R.C., 1983. UNESCO Tech. Pap. Mar. Sci. 44 (check values p. 19).
 * @example densityEos80(35, 25 / 1.00024, 0) // 1023.34306
 */
export function densityEos80(salinity: number, temperatureC: number, pressureDbar: number): number {
  validate("densityEos80", salinity, temperatureC, pressureDbar);
  const r0 = rho0(salinity, t68FromT90(temperatureC));
  if (pressureDbar === 0) return r0;
  const k = eos80SecantBulkModulusBar(salinity, temperatureC, pressureDbar);
  return r0 / (1 - pressureDbar / 10 / k);
}
