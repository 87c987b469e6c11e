import { ionicStrengthFromSalinity } from "./ionicStrength.ts";
import { majorIonsAtSalinity, type MajorIonOptions } from "./majorIons.ts";

/** The water a speciation is computed for. */
export interface WaterConditions {
  /** Practical salinity. */
  salinity: number;
  /** Temperature [°C, ITS-90]. */
  temperatureC: number;
  /** Ionic strength [mol/kg-H2O]; when omitted it comes from the major-ion mixing model at `salinity`. */
  ionicStrength?: number;
}

/**
 * Ionic strength for a speciation: the given value, else the major-ion mixing model (river to
 * Reference-Composition sea) at the salinity (a salinity below the river end-member is taken as the
 * river's), else (salinity above the sea end-member) the TEOS-10 Reference-Composition ionic strength.
 * @param conditions salinity, temperature [°C] and optional ionic strength [mol/kg-H2O]
 * @param mixing options of the major-ion mixing model
 * @returns ionic strength [mol/kg-H2O]
 * @throws {RangeError|TypeError} for non-finite or negative inputs (naming the field)
 * @see Millero et al. (2008) Deep-Sea Res. I 55, 50–72; TEOS-10 Manual Table L.1.
 */
export function resolveIonicStrength(conditions: WaterConditions, mixing: MajorIonOptions = {}): number {
  checkConditions("resolveIonicStrength", conditions);
  if (conditions.ionicStrength !== undefined) {
    if (!Number.isFinite(conditions.ionicStrength) || conditions.ionicStrength < 0) {
      throw new RangeError(`resolveIonicStrength: ionicStrength must be ≥ 0, got ${conditions.ionicStrength}`);
    }
    return conditions.ionicStrength;
  }
  const sea = mixing.seaSalinity ?? 35;
  const river = mixing.riverSalinity ?? 0;
  if (conditions.salinity > sea) return ionicStrengthFromSalinity(conditions.salinity);
  return majorIonsAtSalinity(Math.max(river, conditions.salinity), mixing).ionicStrength;
}

/**
 * Checks a {@link WaterConditions} object.
 * @param fn name of the calling function (for the message)
 * @param c the conditions to check
 * @throws {TypeError} when salinity or temperatureC is not a finite number; {RangeError} when salinity < 0 or > 50
 * @see common practice (argument checking).
 */
export function checkConditions(fn: string, c: WaterConditions): void {
  if (!c || typeof c !== "object") throw new TypeError(`${fn}: conditions must be an object, got ${String(c)}`);
  if (typeof c.salinity !== "number" || !Number.isFinite(c.salinity))
    throw new TypeError(`${fn}: salinity must be a finite number, got ${String(c.salinity)}`);
  if (c.salinity < 0 || c.salinity > 50) throw new RangeError(`${fn}: salinity must be within 0…50, got ${c.salinity}`);
  if (typeof c.temperatureC !== "number" || !Number.isFinite(c.temperatureC))
    throw new TypeError(`${fn}: temperatureC must be a finite number, got ${String(c.temperatureC)}`);
}
