/**
 * The map's data credits (Natural Earth land, public domain) in MapLibre's attribution control, kept
 * folded behind its ⓘ button: MapLibre unfolds a compact control the first time it gets text, which on
 * a narrow map covers stations; it is folded again once, and the user opens it with the button.
 */
import { AttributionControl, type Map as MapLibreMap } from "maplibre-gl";

export function addFoldedAttribution(map: MapLibreMap): void {
  map.addControl(new AttributionControl({ compact: true }), "bottom-right");
  const control = map.getContainer().querySelector(".maplibregl-ctrl-attrib");
  if (!control) return;
  const fold = new MutationObserver(() => {
    if (!control.classList.contains("maplibregl-compact-show")) return;
    control.classList.remove("maplibregl-compact-show");
    fold.disconnect();
  });
  fold.observe(control, { attributeFilter: ["class"] });
  map.once("remove", () => fold.disconnect());
}
