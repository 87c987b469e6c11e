import { C3515_MS_CM, PSS78, pss78Rt35 } from "./pss78Coefficients.ts";
import { salinityFromRtT68 } from "./hillExtension.ts";
import { t68FromT90 } from "./temperatureScale.ts";

/**
 * √Rt with salinityFromRtT68(Rt, t68) = S, by bisection on a bracket that grows until it holds S
 * (the function rises monotonically in √Rt over 0 ≤ S ≤ 50), to machine precision.
 */
function rtxForSalinity(salinity: number, t68C: number): number {
  let lo = 0;
  let hi = 1;
  while (salinityFromRtT68(hi * hi, t68C) < salinity) {
    lo = hi;
    hi *= 2;
    if (hi > 64) throw new RangeError(`conductivityFromPracticalSalinity: no conductivity gives S = ${salinity}`);
  }
  for (let i = 0; i < 200; i++) {
    const mid = 0.5 * (lo + hi);
    if (mid <= lo || mid >= hi) break;
    if (salinityFromRtT68(mid * mid, t68C) < salinity) lo = mid;
    else hi = mid;
  }
  const sLo = salinityFromRtT68(lo * lo, t68C);
  const sHi = salinityFromRtT68(hi * hi, t68C);
  return Math.abs(sLo - salinity) <= Math.abs(sHi - salinity) ? lo : hi;
}

/**
 * In situ conductivity from practical salinity, temperature and pressure (inverse of PSS-78 with the
 * Hill extension). Rt is found by bisection on √Rt (robust; no first-guess polynomial), then
 * R = Rt·rt(t)·Rp(R) is solved exactly: it is a quadratic in R,
 * (d3 + d4 t)R² + (B − Rt·rt·(d3 + d4 t))R − Rt·rt·(B + A) = 0, B = 1 + d1 t + d2 t², A = p(e1 + e2 p + e3 p²).
 *
 * @param salinity practical salinity (0…50)
 * @param temperatureC in situ temperature [°C, ITS-90]
 * @param pressureDbar sea pressure [dbar]
 * @returns conductivity [mS/cm]
 * @throws {TypeError} when an argument is not a finite number
 * @throws {RangeError} when salinity is outside 0…50 or pressureDbar < 0
 * @see Fofonoff, N.P., Millard, R.C., 1983. UNESCO Tech. Pap. Mar. Sci. 44 (CNDR).
 * @see IOC, SCOR, IAPSO, 2010. TEOS-10 Manual (GSW `gsw_C_from_SP`).
 */
export function conductivityFromPracticalSalinity(
  salinity: number,
  temperatureC: number,
  pressureDbar: number,
): number {
  const fn = "conductivityFromPracticalSalinity";
  for (const [name, v] of [
    ["salinity", salinity],
    ["temperatureC", temperatureC],
    ["pressureDbar", pressureDbar],
  ] as const) {
    if (typeof v !== "number" || !Number.isFinite(v))
      throw new TypeError(`${fn}: ${name} must be a finite number, got ${String(v)}`);
  }
  if (salinity < 0 || salinity > 50) throw new RangeError(`${fn}: salinity must be within 0…50, got ${salinity}`);
  if (pressureDbar < 0) throw new RangeError(`${fn}: pressureDbar must be ≥ 0 (sea pressure), got ${pressureDbar}`);
  if (salinity === 0) return 0;
  const t = t68FromT90(temperatureC);
  const rtx = rtxForSalinity(salinity, t);
  const q = rtx * rtx * pss78Rt35(t);
  const { d, e } = PSS78;
  const p = pressureDbar;
  const a = p * (e[0] + e[1] * p + e[2] * p * p);
  const b = 1 + d[0] * t + d[1] * t * t;
  const c = d[2] + d[3] * t;
  const bq = b - q * c;
  const disc = bq * bq + 4 * c * q * (b + a);
  // Positive root, written to avoid cancellation: R = 2·q(B + A)/(bq + √disc).
  const r = (2 * q * (b + a)) / (bq + Math.sqrt(disc));
  return r * C3515_MS_CM;
}
