import { cdChlorideSpeciation, type CdSpeciation } from "./cdChloride.ts";
import { CD_CHLORIDE_SETS, DEFAULT_CD_CHLORIDE_SET_ID, type CdChlorideSet } from "./cdChlorideSets.ts";
import type { DaviesOptions } from "./davies.ts";
import { feConstantSet, type FeConstantSet } from "./feConstantSets.ts";
import { feSpeciation, type FeSpeciation } from "./feHydrolysis.ts";
import { majorIonsAtSalinity, type MajorIonOptions, type MajorIonState } from "./majorIons.ts";
import { resolveIonicStrength } from "./waterConditions.ts";

/** Caution shown with every speciation result. */
export const SPECIATION_CAUTION =
  "Screening calculation of inorganic speciation (no organic complexation), not a compliance or toxicity assessment; defer to local regulations and licensed practice.";

/** Measured state of one station. */
export interface StationWater {
  pH: number;
  salinity: number;
  temperatureC: number;
}

/** Options of {@link stationSpeciation}. */
export interface StationSpeciationOptions {
  /** Fe(III) constant set or id (default "baesMesmer1976"). */
  feConstantSet?: FeConstantSet | string;
  /** Cd chloride set or id (default "cdCl3WithEnthalpy"). */
  cdConstantSet?: CdChlorideSet | string;
  /** Scale the station pH was measured on; used for a caution only (no conversion is made). */
  pHScale?: "nbs" | "total" | "free" | "seawater" | "unknown";
  davies?: DaviesOptions;
  mixing?: MajorIonOptions;
}

/** Speciation context of one station. */
export interface StationSpeciationResult {
  input: StationWater;
  /** Major ions (undefined when the salinity is above the sea end-member). */
  majorIons?: MajorIonState;
  /** Ionic strength used [mol/kg-H2O]. */
  ionicStrength: number;
  fe: FeSpeciation;
  cd: CdSpeciation;
  /** Free Cd²⁺ fraction (0…1). */
  freeCdFraction: number;
  warnings: string[];
  caution: string;
}

/**
 * Inorganic speciation context at a station from its pH, salinity and temperature: ionic strength and
 * major ions from the mixing model, Fe(III) hydrolysis fractions and solubility, and Cd chloro-complex
 * fractions with the free-Cd²⁺ fraction.
 * @param water pH, practical salinity and temperature [°C]
 * @param options constant sets, pH scale, Davies and mixing options
 * @returns speciation with warnings and the screening caution
 * @throws {RangeError|TypeError} for invalid inputs (naming the field) or unknown set ids
 * @see feSpeciation, cdChlorideSpeciation, majorIonsAtSalinity for formulas and citations.
 */
export function stationSpeciation(
  water: StationWater,
  options: StationSpeciationOptions = {},
): StationSpeciationResult {
  if (!water || !Number.isFinite(water.pH))
    throw new TypeError(`stationSpeciation: pH must be a finite number, got ${String(water?.pH)}`);
  const conditions = { salinity: water.salinity, temperatureC: water.temperatureC };
  const ionicStrength = resolveIonicStrength(conditions, options.mixing);
  const sea = options.mixing?.seaSalinity ?? 35;
  const majorIons =
    water.salinity <= sea && water.salinity >= (options.mixing?.riverSalinity ?? 0)
      ? majorIonsAtSalinity(water.salinity, options.mixing)
      : undefined;
  const feSet =
    typeof options.feConstantSet === "object"
      ? options.feConstantSet
      : feConstantSet(options.feConstantSet ?? "baesMesmer1976");
  let cdSet: CdChlorideSet | undefined;
  if (typeof options.cdConstantSet === "object") cdSet = options.cdConstantSet;
  else cdSet = CD_CHLORIDE_SETS[(options.cdConstantSet ?? DEFAULT_CD_CHLORIDE_SET_ID) as keyof typeof CD_CHLORIDE_SETS];
  if (!cdSet) throw new RangeError(`stationSpeciation: unknown cdConstantSet "${String(options.cdConstantSet)}"`);
  const fe = feSpeciation(
    water.pH,
    feSet,
    { ...conditions, ionicStrength },
    { davies: options.davies, mixing: options.mixing },
  );
  const cd = cdChlorideSpeciation(
    cdSet,
    { ...conditions, ionicStrength },
    { davies: options.davies, mixing: options.mixing },
  );
  const warnings = [...new Set([...fe.constants.warnings, ...cd.warnings])];
  const scale = options.pHScale ?? "unknown";
  if (feSet.medium === "infiniteDilution" && scale !== "nbs") {
    warnings.push(
      `pH (${scale} scale) used as −log a_H⁺ with I = 0 constants; scale differences of ≈ 0.1 pH are possible in seawater`,
    );
  }
  if (!majorIons) {
    warnings.push(
      water.salinity > sea
        ? `Salinity ${water.salinity} above the sea end-member (${sea}); Reference-Composition seawater assumed`
        : `Salinity ${water.salinity} below the river end-member; the river composition is used`,
    );
  }
  return {
    input: { ...water },
    majorIons,
    ionicStrength,
    fe,
    cd,
    freeCdFraction: cd.freeFraction,
    warnings,
    caution: SPECIATION_CAUTION,
  };
}
