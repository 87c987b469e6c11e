/**
 * Coefficients of the Practical Salinity Scale 1978 (PSS-78), as in UNESCO (1983) and TEOS-10 GSW-C
 * `GSW_SP_COEFFICIENTS`. Σa = 35 and Σb = 0 (a coefficient-entry self-test in the tests).
 *
 * @see Fofonoff, N.P., Millard, R.C., 1983. Algorithms for computation of fundamental properties of
 *   seawater. UNESCO Tech. Pap. Mar. Sci. 44 (routine SAL78).
 * @see Lewis, E.L., 1980. The Practical Salinity Scale 1978 and its antecedents. IEEE J. Oceanic Eng. OE-5.
 */
export const PSS78 = {
  a: [0.008, -0.1692, 25.3851, 14.0941, -7.0261, 2.7081] as const,
  b: [0.0005, -0.0056, -0.0066, -0.0375, 0.0636, -0.0144] as const,
  c: [0.6766097, 2.00564e-2, 1.104259e-4, -6.9698e-7, 1.0031e-9] as const,
  d: [3.426e-2, 4.464e-4, 4.215e-1, -3.107e-3] as const,
  e: [2.07e-5, -6.37e-10, 3.989e-15] as const,
  k: 0.0162,
} as const;

/** C(SP = 35, t68 = 15 °C, p = 0) = 42.914 mS/cm (Culkin & Smith 1980; GSW-C `gsw_c3515`). */
export const C3515_MS_CM = 42.914;

/**
 * Temperature part of PSS-78, f(t) = (t68 − 15)/(1 + k(t68 − 15)).
 * @param t68C temperature [°C, IPTS-68]
 * @see Fofonoff, N.P., Millard, R.C., 1983. UNESCO Tech. Pap. Mar. Sci. 44 (SAL78).
 */
export function pss78TemperatureFactor(t68C: number): number {
  return (t68C - 15) / (1 + PSS78.k * (t68C - 15));
}

/**
 * PSS-78 polynomial S(X, t68) without the Hill extension, X = √Rt.
 * @param rtx √Rt (dimensionless)
 * @param t68C temperature [°C, IPTS-68]
 * @returns practical salinity of the plain PSS-78 polynomial
 * @see Fofonoff, N.P., Millard, R.C., 1983. UNESCO Tech. Pap. Mar. Sci. 44 (SAL78).
 */
export function pss78Polynomial(rtx: number, t68C: number): number {
  const { a, b } = PSS78;
  const ft = pss78TemperatureFactor(t68C);
  const sa = a[0] + (a[1] + (a[2] + (a[3] + (a[4] + a[5] * rtx) * rtx) * rtx) * rtx) * rtx;
  const sb = b[0] + (b[1] + (b[2] + (b[3] + (b[4] + b[5] * rtx) * rtx) * rtx) * rtx) * rtx;
  return sa + ft * sb;
}

/** dS/dX of {@link pss78Polynomial}. * @see Fofonoff, N.P., Millard, R.C., 1983. UNESCO Tech. Pap. Mar. Sci. 44 (SAL78).
 */
export function pss78PolynomialDerivative(rtx: number, t68C: number): number {
  const { a, b } = PSS78;
  const ft = pss78TemperatureFactor(t68C);
  const da = a[1] + (2 * a[2] + (3 * a[3] + (4 * a[4] + 5 * a[5] * rtx) * rtx) * rtx) * rtx;
  const db = b[1] + (2 * b[2] + (3 * b[3] + (4 * b[4] + 5 * b[5] * rtx) * rtx) * rtx) * rtx;
  return da + ft * db;
}

/**
 * rt(t) = C(35, t68, 0)/C(35, 15, 0), the PSS-78 temperature ratio of standard seawater.
 * @param t68C temperature [°C, IPTS-68]
 * @see Fofonoff, N.P., Millard, R.C., 1983. UNESCO Tech. Pap. Mar. Sci. 44 (SAL78).
 */
export function pss78Rt35(t68C: number): number {
  const { c } = PSS78;
  return c[0] + (c[1] + (c[2] + (c[3] + c[4] * t68C) * t68C) * t68C) * t68C;
}

/**
 * PSS-78 pressure correction Rp = 1 + p(e1 + e2 p + e3 p²)/(1 + d1 t + d2 t² + (d3 + d4 t) R).
 * @param r conductivity ratio C/C(35, 15, 0)
 * @param t68C temperature [°C, IPTS-68]
 * @param pDbar sea pressure [dbar]
 * @see Fofonoff, N.P., Millard, R.C., 1983. UNESCO Tech. Pap. Mar. Sci. 44 (SAL78).
 */
export function pss78Rp(r: number, t68C: number, pDbar: number): number {
  const { d, e } = PSS78;
  const p = pDbar;
  return 1 + (p * (e[0] + e[1] * p + e[2] * p * p)) / (1 + d[0] * t68C + d[1] * t68C * t68C + (d[2] + d[3] * t68C) * r);
}
