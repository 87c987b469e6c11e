import { PSS78, pss78Polynomial, pss78PolynomialDerivative, pss78TemperatureFactor } from "./pss78Coefficients.ts";

/**
 * Raw Hill et al. (1986) salinity below S = 2:
 * S_Hill = S_PSS78 − a0/(1 + 1.5x + x²) − b0·f(t)/(1 + y^½ + y + y^1.5), x = 400 Rt, y = 100 Rt.
 * @param sPss78 plain PSS-78 salinity at (Rt, t)
 * @param rt conductivity ratio Rt (dimensionless)
 * @param t68C temperature [°C, IPTS-68]
 * @see Hill, K.D., Dauphinee, T.M., Woods, D.J., 1986. IEEE J. Oceanic Eng. OE-11(1), 109–112; GSW-C `gsw_sp_from_c`.
 */
export function hillRaw(sPss78: number, rt: number, t68C: number): number {
  const x = 400 * rt;
  const sqrty = 10 * Math.sqrt(rt);
  const part1 = 1 + x * (1.5 + x);
  const part2 = 1 + sqrty * (1 + sqrty * (1 + sqrty));
  return sPss78 - PSS78.a[0] / part1 - (PSS78.b[0] * pss78TemperatureFactor(t68C)) / part2;
}

/**
 * √Rt at which the plain PSS-78 polynomial gives S = 2 (safeguarded Newton iteration).
 * @param t68C temperature [°C, IPTS-68]
 * @see IOC, SCOR, IAPSO, 2010. TEOS-10 Manual (GSW `gsw_hill_ratio_at_sp2`).
 */
export function rtxAtSp2(t68C: number): number {
  let lo = 0.05;
  let hi = 0.6;
  let x = 0.26;
  for (let i = 0; i < 100; i++) {
    const f = pss78Polynomial(x, t68C) - 2;
    if (f > 0) hi = x;
    else lo = x;
    let next = x - f / pss78PolynomialDerivative(x, t68C);
    if (!(next > lo && next < hi)) next = 0.5 * (lo + hi);
    if (Math.abs(next - x) <= 1e-16) return next;
    x = next;
  }
  return x;
}

/**
 * GSW continuity ratio 2/S_Hill_raw(Rt at S_PSS78 = 2) that makes the Hill extension meet PSS-78 at S = 2.
 * @param t68C temperature [°C, IPTS-68]
 * @see TEOS-10 GSW-C `gsw_hill_ratio_at_sp2` (IOC, SCOR, IAPSO, 2010, TEOS-10 Manual).
 */
export function hillRatioAtSp2(t68C: number): number {
  const rtx = rtxAtSp2(t68C);
  return 2 / hillRaw(2, rtx * rtx, t68C);
}

/**
 * Practical salinity from the temperature-corrected conductivity ratio Rt = C(S,t,0)/C(35,t,0):
 * PSS-78 polynomial, and below S = 2 the Hill et al. (1986) extension scaled by the GSW continuity ratio.
 * @param rt Rt (dimensionless, ≥ 0)
 * @param t68C temperature [°C, IPTS-68]
 * @returns practical salinity, or NaN for Rt < 0 (callers check)
 * @see Hill, K.D., Dauphinee, T.M., Woods, D.J., 1986. IEEE J. Oceanic Eng. OE-11(1), 109–112; GSW-C `gsw_sp_from_c`.
 */
export function salinityFromRtT68(rt: number, t68C: number): number {
  if (!(rt >= 0)) return Number.NaN;
  const rtx = Math.sqrt(rt);
  const s = pss78Polynomial(rtx, t68C);
  if (s >= 2) return s;
  return hillRatioAtSp2(t68C) * hillRaw(s, rt, t68C);
}
