import { densityEos80 } from "./densityEos80.ts";

/** Upper ionic strength [mol/kg] to which the Davies equation is usually trusted (@see bibliography key stumm1996; from memory). */
export const DAVIES_MAX_IONIC_STRENGTH = 0.5;

/** Options of the Davies equation. */
export interface DaviesOptions {
  /** Debye–Hückel A [(kg/mol)^½]; pin it (e.g. the classical 0.5085) to reproduce published numbers. Default: {@link debyeHuckelA}(temperatureC). */
  A?: number;
  /** Temperature [°C], used for A when A is not pinned (default 25). */
  temperatureC?: number;
  /** Linear-term coefficient (default 0.3, Davies 1962 as commonly used in geochemical modelling; some texts use 0.2). */
  linearCoefficient?: number;
}

/**
 * Debye–Hückel limiting-law constant A (log10, molal): A = 1.82483·10⁶·√ρ_w/(ε_r·T)^{3/2}, ρ_w [g/cm³]
 * from EOS-80 at S = 0, ε_r = 87.740 − 0.40008 t + 9.398·10⁻⁴ t² − 1.410·10⁻⁶ t³ (Malmberg & Maryott 1956).
 * Gives 0.5108 at 25 °C; the classical value 0.5085 (from memory) corresponds to ε_r ≈ 78.54.
 * @param temperatureC temperature [°C], 0…100
 * @returns A [(kg/mol)^½]
 * @throws {RangeError} when temperatureC is outside 0…100 or not finite
 * @see bibliography key malmberg1956 (ε_r fit; from memory).
 */
export function debyeHuckelA(temperatureC: number): number {
  if (!Number.isFinite(temperatureC) || temperatureC < 0 || temperatureC > 100) {
    throw new RangeError(`debyeHuckelA: temperatureC must be within 0…100, got ${temperatureC}`);
  }
  const t = temperatureC;
  const eps = 87.74 - 0.40008 * t + 9.398e-4 * t * t - 1.41e-6 * t * t * t;
  const rhoGcm3 = densityEos80(0, t, 0) / 1000;
  return (1.82483e6 * Math.sqrt(rhoGcm3)) / Math.pow(eps * (t + 273.15), 1.5);
}

/**
 * Davies activity coefficient, log10 γ = −A z² (√I/(1 + √I) − 0.3 I).
 * Valid for I ≲ 0.5 mol/kg (a few % accuracy only below ≈ 0.1); check {@link daviesValidityWarning}.
 * @param charge ion charge z (integer; 0 gives γ = 1)
 * @param ionicStrength I [mol/kg-H2O], ≥ 0
 * @param options A (pinned) or temperatureC, and the linear coefficient
 * @returns activity coefficient γ (dimensionless)
 * @throws {RangeError} for a negative or non-finite ionic strength or a non-integer charge
 * @see bibliography key davies1962 (from memory).
 */
export function daviesActivityCoefficient(charge: number, ionicStrength: number, options: DaviesOptions = {}): number {
  return Math.pow(10, daviesLogGamma(charge, ionicStrength, options));
}

/**
 * log10 of the Davies activity coefficient (see {@link daviesActivityCoefficient}).
 * @param charge ion charge z
 * @param ionicStrength I [mol/kg-H2O]
 * @param options A or temperatureC, linear coefficient
 * @returns log10 γ
 * @throws {RangeError} for a negative or non-finite ionic strength or a non-integer charge
 * @see bibliography key davies1962 (from memory).
 */
export function daviesLogGamma(charge: number, ionicStrength: number, options: DaviesOptions = {}): number {
  if (!Number.isInteger(charge)) throw new RangeError(`daviesLogGamma: charge must be an integer, got ${charge}`);
  if (!Number.isFinite(ionicStrength) || ionicStrength < 0) {
    throw new RangeError(`daviesLogGamma: ionicStrength must be a finite value ≥ 0, got ${ionicStrength}`);
  }
  const a = options.A ?? debyeHuckelA(options.temperatureC ?? 25);
  if (!Number.isFinite(a) || a <= 0) throw new RangeError(`daviesLogGamma: A must be > 0, got ${a}`);
  const b = options.linearCoefficient ?? 0.3;
  const s = Math.sqrt(ionicStrength);
  return -a * charge * charge * (s / (1 + s) - b * ionicStrength);
}

/**
 * The caution to show when Davies is used beyond its range, else undefined.
 * @param ionicStrength I [mol/kg-H2O]
 * @returns warning text or undefined
 * @see bibliography key stumm1996 (Davies validity I < 0.5; from memory).
 */
export function daviesValidityWarning(ionicStrength: number): string | undefined {
  return ionicStrength > DAVIES_MAX_IONIC_STRENGTH
    ? `Davies activity coefficients used at I = ${ionicStrength.toFixed(3)} mol/kg, above their validity limit (≈ ${DAVIES_MAX_IONIC_STRENGTH}); treat the speciation as indicative only`
    : undefined;
}

/**
 * Conditional (stoichiometric) constant from a thermodynamic one, for a reaction with the given
 * charges: log K_c = log K° + Σ_reactants ν log γ − Σ_products ν log γ (Davies γ).
 * @param logK0 log10 of the thermodynamic constant (I = 0)
 * @param reactantCharges charges of reactants, one entry per stoichiometric unit (e.g. [2, -1] for Cd²⁺ + Cl⁻)
 * @param productCharges charges of products, one entry per unit (e.g. [1] for CdCl⁺)
 * @param ionicStrength I [mol/kg-H2O]
 * @param options Davies options
 * @returns log10 of the conditional constant
 * @throws {RangeError} as daviesLogGamma
 * @see bibliography key stumm1996, ch. 3 (from memory).
 */
export function conditionalLogK(
  logK0: number,
  reactantCharges: readonly number[],
  productCharges: readonly number[],
  ionicStrength: number,
  options: DaviesOptions = {},
): number {
  let out = logK0;
  for (const z of reactantCharges) out += daviesLogGamma(z, ionicStrength, options);
  for (const z of productCharges) out -= daviesLogGamma(z, ionicStrength, options);
  return out;
}
