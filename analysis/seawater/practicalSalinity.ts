import { C3515_MS_CM, pss78Rp, pss78Rt35 } from "./pss78Coefficients.ts";
import { salinityFromRtT68 } from "./hillExtension.ts";
import { t68FromT90 } from "./temperatureScale.ts";

function finite(fn: string, name: string, value: number): void {
  if (typeof value !== "number" || !Number.isFinite(value)) {
    throw new TypeError(`${fn}: ${name} must be a finite number, got ${String(value)}`);
  }
}

/**
 * Practical salinity SP (PSS-78) from in situ conductivity, temperature and pressure.
 *
 * t68 = 1.00024·t90; R = C/42.914; Rt = R/(Rp·rt(t68)); S = Σ a_i Rt^(i/2) + f(t68)·Σ b_i Rt^(i/2);
 * below S = 2 the Hill et al. (1986) extension, multiplied by the GSW continuity ratio so that it equals
 * PSS-78 at S = 2. Valid 2 ≤ S ≤ 42 (PSS-78) and 0 ≤ S < 2 (Hill); see {@link pss78ValidityNote}.
 * For near-pure water (C ≲ 0.001–0.002 mS/cm, i.e. 1–2 µS/cm, at 0–30 °C) the Hill formula dips to −0.0003…0; Brackline returns 0
 * there (GSW returns an invalid value), since that is zero salinity within the formula's accuracy.
 *
 * @param conductivityMsCm in situ conductivity [mS/cm] (1 S/m = 10 mS/cm)
 * @param temperatureC in situ temperature [°C, ITS-90]
 * @param pressureDbar sea pressure [dbar] (absolute minus 10.1325 dbar)
 * @returns practical salinity [dimensionless, PSS-78]
 * @throws {TypeError} when an argument is not a finite number
 * @throws {RangeError} when conductivityMsCm < 0 or pressureDbar < 0
 * @see Fofonoff, N.P., Millard, R.C., 1983. UNESCO Tech. Pap. Mar. Sci. 44 (SAL78).
 * @see Hill, K.D., Dauphinee, T.M., Woods, D.J., 1986. IEEE J. Oceanic Eng. OE-11(1), 109–112.
 * @see IOC, SCOR, IAPSO, 2010. TEOS-10 Manual (GSW `gsw_SP_from_C`, Hill continuity ratio).
 * @example practicalSalinityFromConductivity(42.914, 15 / 1.00024, 0) // ≈ 35
 */
export function practicalSalinityFromConductivity(
  conductivityMsCm: number,
  temperatureC: number,
  pressureDbar: number,
): number {
  const fn = "practicalSalinityFromConductivity";
  finite(fn, "conductivityMsCm", conductivityMsCm);
  finite(fn, "temperatureC", temperatureC);
  finite(fn, "pressureDbar", pressureDbar);
  if (conductivityMsCm < 0) throw new RangeError(`${fn}: conductivityMsCm must be ≥ 0, got ${conductivityMsCm}`);
  if (pressureDbar < 0) throw new RangeError(`${fn}: pressureDbar must be ≥ 0 (sea pressure), got ${pressureDbar}`);
  const t68 = t68FromT90(temperatureC);
  const r = conductivityMsCm / C3515_MS_CM;
  const rt = r / (pss78Rp(r, t68, pressureDbar) * pss78Rt35(t68));
  return Math.max(0, salinityFromRtT68(rt, t68));
}

/**
 * Practical salinity from a salinometer's conductivity ratio Rt = C(S, t, 0)/C(35, t, 0) at the bath
 * temperature (no pressure term); Hill et al. (1986) extension with the GSW ratio below S = 2.
 * @param rt conductivity ratio Rt (dimensionless, ≥ 0)
 * @param temperatureC bath temperature [°C, ITS-90]
 * @returns practical salinity [PSS-78]
 * @throws {TypeError} when an argument is not a finite number
 * @throws {RangeError} when rt < 0
 * @see IOC, SCOR, IAPSO, 2010. TEOS-10 Manual (GSW `gsw_SP_salinometer`).
 */
export function practicalSalinityFromRt(rt: number, temperatureC: number): number {
  const fn = "practicalSalinityFromRt";
  finite(fn, "rt", rt);
  finite(fn, "temperatureC", temperatureC);
  if (rt < 0) throw new RangeError(`${fn}: rt must be ≥ 0, got ${rt}`);
  return Math.max(0, salinityFromRtT68(rt, t68FromT90(temperatureC)));
}

/**
 * A caution when (S, t, p) lies outside the ranges PSS-78 was fitted for, else undefined.
 * Ranges: 2 ≤ S ≤ 42 (below 2: Hill et al. 1986 extension), −2…35 °C, 0…10000 dbar.
 * @param salinity practical salinity
 * @param temperatureC [°C, ITS-90]
 * @param pressureDbar [dbar]
 * @returns text of the caution, or undefined when inside the range
 * @see Fofonoff, N.P., Millard, R.C., 1983. UNESCO Tech. Pap. Mar. Sci. 44 (ranges from memory).
 */
export function pss78ValidityNote(salinity: number, temperatureC: number, pressureDbar: number): string | undefined {
  const notes: string[] = [];
  if (salinity > 42) notes.push(`S = ${salinity} above the PSS-78 range (≤ 42)`);
  if (temperatureC < -2 || temperatureC > 35) notes.push(`t = ${temperatureC} °C outside −2…35 °C`);
  if (pressureDbar > 10000) notes.push(`p = ${pressureDbar} dbar above 10000 dbar`);
  return notes.length > 0 ? `PSS-78 extrapolated: ${notes.join("; ")}` : undefined;
}
