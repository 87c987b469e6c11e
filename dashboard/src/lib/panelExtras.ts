/**
 * Extra props some panels take beyond `{ analysis, selection }`.
 */
import type { CarbonateEndmember } from "../../../analysis/index.ts";
import type { CarbonateSetting } from "../state/settings.svelte.ts";
import type { SpeciationModel, SpeciationRequest } from "../worker/speciation.ts";

/**
 * Carbonate end-members for the expected-pH curve of the speciation panel while the invented demo
 * runs. These are assumed values for the invented demo estuary (a soft-water river and coastal
 * seawater, in µmol/kg), not measurements, and are labelled so in the panel; imported data start
 * without end-members (Settings → Carbonate end-members).
 */
export const DEMO_CARBONATE: { river: CarbonateEndmember; sea: CarbonateEndmember } = {
  river: { salinity: 0, taUmolKg: 1000, dicUmolKg: 1050 },
  sea: { salinity: 35, taUmolKg: 2300, dicUmolKg: 2050 },
};

/** The canvases of the map (MapLibre's, and deck.gl's while a dense layer is shown), for the map PNG export. */
export function mapCanvases(): HTMLCanvasElement[] {
  return [...document.querySelectorAll<HTMLCanvasElement>(".map-area canvas")];
}

/**
 * Extra props by panel id; the speciation panel gets the worker call that computes it and the
 * carbonate end-members the user set (or the demo's).
 */
export function panelExtras(
  id: string,
  carbonate?: CarbonateSetting,
  speciate?: (request: SpeciationRequest) => Promise<SpeciationModel>,
): Record<string, unknown> {
  if (id === "SpeciationPanel")
    return carbonate
      ? { speciate, carbonate: { river: carbonate.river, sea: carbonate.sea }, carbonateInvented: carbonate.invented }
      : { speciate };
  if (id === "ExportMenu") return { mapCanvases };
  return {};
}
