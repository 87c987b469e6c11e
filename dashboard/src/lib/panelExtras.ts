/**
 * Extra props some panels take beyond `{ analysis, selection }`.
 */
import type { CarbonateEndmember } from "../../../analysis/index.ts";

/**
 * Carbonate end-members for the expected-pH curve of the speciation panel. These are assumed
 * values for the invented demo estuary (a soft-water river and coastal seawater, in µmol/kg), not
 * measurements; users replace them with their own alkalinity and inorganic-carbon data.
 */
export const DEMO_CARBONATE: { river: CarbonateEndmember; sea: CarbonateEndmember } = {
  river: { salinity: 0, taUmolKg: 1000, dicUmolKg: 1050 },
  sea: { salinity: 35, taUmolKg: 2300, dicUmolKg: 2050 },
};

/** The canvases of the map (MapLibre base map and the deck.gl overlay), for the map PNG export. */
export function mapCanvases(): HTMLCanvasElement[] {
  return [...document.querySelectorAll<HTMLCanvasElement>(".map-area canvas")];
}

/** Extra props by panel id. */
export function panelExtras(id: string): Record<string, unknown> {
  if (id === "SpeciationPanel") return { carbonate: DEMO_CARBONATE };
  if (id === "ExportMenu") return { mapCanvases };
  return {};
}
