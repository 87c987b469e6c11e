import { cdChlorideSpeciation, type CdSpeciationOptions } from "./cdChloride.ts";
import { CD_CHLORIDE_SETS, type CdChlorideSet } from "./cdChlorideSets.ts";

/** A station for the per-station Cd speciation: id, practical salinity and temperature [°C]. */
export interface CdStationInput {
  id: string;
  salinity: number;
  temperatureC: number;
}

/** Free-Cd²⁺ share at one station. */
export interface CdStationResult {
  id: string;
  salinity: number;
  /** Fraction (0…1) of inorganic dissolved Cd present as free Cd²⁺. */
  freeFraction: number;
  /** Fractions of every species (see cdChlorideSpeciation). */
  fractions: Record<string, number>;
  warnings: string[];
}

/**
 * Free-Cd²⁺ fraction at each station from its salinity and temperature (chloride and ionic strength from the
 * major-ion mixing model; Davies activity coefficients), with the warnings of each station.
 * @param stations stations with id, salinity and temperature [°C]
 * @param set constant set or id ("cdCl3WithEnthalpy", "cdCl4At25C")
 * @param options Davies, mixing and extra-ligand options (a fixed chlorideMolKgH2O is ignored)
 * @returns one result per station, in input order
 * @throws {RangeError} for an unknown set id; TypeError/RangeError naming the station for invalid values
 * @see Turner, Whitfield & Dickson (1981) GCA 45, 855–881 (from memory); Powell et al. (2011) Pure Appl. Chem. 83, 1163–1214.
 */
export function cdFreeFractionByStation(
  stations: readonly CdStationInput[],
  set: CdChlorideSet | string,
  options: CdSpeciationOptions = {},
): CdStationResult[] {
  const s = typeof set === "string" ? CD_CHLORIDE_SETS[set as keyof typeof CD_CHLORIDE_SETS] : set;
  if (!s) throw new RangeError(`cdFreeFractionByStation: unknown set "${String(set)}"`);
  const perStation = { ...options, chlorideMolKgH2O: undefined };
  return stations.map((st) => {
    try {
      const r = cdChlorideSpeciation(s, { salinity: st.salinity, temperatureC: st.temperatureC }, perStation);
      return {
        id: st.id,
        salinity: st.salinity,
        freeFraction: r.freeFraction,
        fractions: r.fractions,
        warnings: r.warnings,
      };
    } catch (error) {
      const message = error instanceof Error ? error.message : String(error);
      const Ctor = error instanceof TypeError ? TypeError : RangeError;
      throw new Ctor(`cdFreeFractionByStation: station "${st.id}": ${message}`);
    }
  });
}
