import { atomicWeight } from "./atomicWeights.ts";
import { densityEos80 } from "./densityEos80.ts";
import { parseUnitOrThrow, type CanonicalUnit } from "./units.ts";

/** What a conversion may need besides the two units. */
export interface ConversionContext {
  /** Element the value counts (e.g. "Cd"); needed for mass ↔ amount unless a unit carries an atom label. */
  element?: string;
  /** Practical salinity of the sample; needed for per-litre ↔ per-kilogram. */
  salinity?: number;
  /** Temperature at which the sample volume was measured [°C, ITS-90] (usually the lab's); needed for L ↔ kg. */
  temperatureC?: number;
}

const FN = "convertConcentration";

function resolve(unit: string | CanonicalUnit, arg: string): CanonicalUnit {
  if (typeof unit === "string") return parseUnitOrThrow(unit);
  if (unit && typeof unit === "object" && typeof unit.symbol === "string") return parseUnitOrThrow(unit.symbol);
  throw new TypeError(`${FN}: ${arg} must be a unit text or CanonicalUnit, got ${String(unit)}`);
}

/**
 * Converts a concentration between any two units of the units table.
 *
 * c_to = c_from · toBase_from / toBase_to, times 1/M (g → mol) or M (mol → g) with M the atomic weight
 * of the element (CIAAW 2021), times 1000/ρ (per L → per kg) or ρ/1000 (per kg → per L) with ρ the
 * EOS-80 density at (salinity, temperatureC, p = 0) — the sample's density where its volume was measured.
 *
 * @param value concentration in `fromUnit` (finite; negative blank-corrected values are converted as is)
 * @param fromUnit unit text (parsed with parseUnitOrThrow) or canonical unit
 * @param toUnit unit text or canonical unit
 * @param context element, salinity and temperatureC [°C], required only where the conversion needs them
 * @returns concentration in `toUnit`
 * @throws {RangeError} for an unknown/ambiguous unit (naming its text), a missing or unknown element,
 *   atom labels that disagree (e.g. "µmol N/L" to "µmol P/L"), or missing salinity/temperature for L ↔ kg
 * @throws {TypeError} when value is not a finite number
 * @see CIAAW, 2021. Standard atomic weights; Millero & Poisson (1981) EOS-80 density.
 * @example convertConcentration(1, "µg/L", "nmol/kg", { element: "Cd", salinity: 35, temperatureC: 20 }) // ≈ 8.681
 */
export function convertConcentration(
  value: number,
  fromUnit: string | CanonicalUnit,
  toUnit: string | CanonicalUnit,
  context: ConversionContext = {},
): number {
  if (typeof value !== "number" || !Number.isFinite(value))
    throw new TypeError(`${FN}: value must be a finite number, got ${String(value)}`);
  const from = resolve(fromUnit, "fromUnit");
  const to = resolve(toUnit, "toUnit");
  if (from.atom && to.atom && from.atom !== to.atom) {
    throw new RangeError(`${FN}: cannot convert "${from.symbol}" to "${to.symbol}" (different atoms)`);
  }
  const unitAtom = from.atom ?? to.atom;
  if (context.element !== undefined && unitAtom !== undefined && context.element !== unitAtom) {
    throw new RangeError(`${FN}: element "${context.element}" disagrees with the unit's atom label "${unitAtom}"`);
  }
  let x = value * from.toBase;
  if (from.quantity !== to.quantity) {
    const element = unitAtom ?? context.element;
    if (element === undefined) {
      throw new RangeError(
        `${FN}: converting "${from.symbol}" to "${to.symbol}" needs context.element (which element the value counts)`,
      );
    }
    const m = atomicWeight(element);
    x = from.quantity === "mass" ? x / m : x * m;
  } else if (from.quantity === "mass" && from.atom !== to.atom && context.element === undefined) {
    throw new RangeError(
      `${FN}: "${from.symbol}" to "${to.symbol}" changes the atom label of a mass; give context.element to confirm the mass is of ${unitAtom}`,
    );
  }
  if (from.basis !== to.basis) {
    const { salinity, temperatureC } = context;
    if (salinity === undefined || temperatureC === undefined) {
      throw new RangeError(
        `${FN}: converting "${from.symbol}" to "${to.symbol}" needs context.salinity and context.temperatureC (density), got salinity=${String(salinity)}, temperatureC=${String(temperatureC)}`,
      );
    }
    const litresPerKg = 1000 / densityEos80(salinity, temperatureC, 0);
    x = from.basis === "perLitre" ? x * litresPerKg : x / litresPerKg;
  }
  return x / to.toBase;
}
