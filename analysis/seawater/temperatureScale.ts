/**
 * Temperature scales: ITS-90 (what instruments report today) and IPTS-68 (what PSS-78 and EOS-80 were
 * defined in). Brackline takes ITS-90 everywhere at its surface and converts inside the formulas.
 */

/** Factor t68 = 1.00024·t90 (Saunders 1990, WOCE Newsletter 10; as in TEOS-10 GSW-C `gsw_sp_from_c`). */
export const T68_PER_T90 = 1.00024;

/**
 * IPTS-68 temperature from ITS-90 temperature, t68 = 1.00024·t90.
 * @param t90C temperature [°C, ITS-90]
 * @returns temperature [°C, IPTS-68]
 * @throws {TypeError} when t90C is not a finite number
 * @see Saunders, P.M., 1990. The International Temperature Scale of 1990, ITS-90. WOCE Newsletter 10.
 */
export function t68FromT90(t90C: number): number {
  if (!Number.isFinite(t90C)) throw new TypeError(`t68FromT90: t90C must be a finite number, got ${String(t90C)}`);
  return T68_PER_T90 * t90C;
}

/**
 * ITS-90 temperature from IPTS-68 temperature, t90 = t68/1.00024.
 * @param t68C temperature [°C, IPTS-68]
 * @returns temperature [°C, ITS-90]
 * @throws {TypeError} when t68C is not a finite number
 * @see Saunders, P.M., 1990. The International Temperature Scale of 1990, ITS-90. WOCE Newsletter 10.
 */
export function t90FromT68(t68C: number): number {
  if (!Number.isFinite(t68C)) throw new TypeError(`t90FromT68: t68C must be a finite number, got ${String(t68C)}`);
  return t68C / T68_PER_T90;
}
