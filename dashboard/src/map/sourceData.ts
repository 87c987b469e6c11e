/**
 * Sets a MapLibre GeoJSON source's data only when it differs from what that same source was last
 * given. Each setData makes MapLibre's worker re-tile the source and place its symbols again, and
 * keeps the map from going idle; the cold start used to repeat identical label and draw-tool data
 * on every analysis event. A source re-created by a style change is a new object, so it is filled anew.
 */
import type { GeoJSONSource, Map as MapLibreMap } from "maplibre-gl";
import type { FeatureCollection } from "geojson";

const sent = new WeakMap<GeoJSONSource, string>();

/**
 * @param map the map
 * @param id the GeoJSON source's id (nothing happens while the style has no such source)
 * @param data the feature collection to show
 * @param beforeSend called just before the data are sent (not when they are skipped)
 * @returns true when the data were sent to the source
 */
export function setSourceData(map: MapLibreMap, id: string, data: FeatureCollection, beforeSend?: () => void): boolean {
  const source = map.getSource(id) as GeoJSONSource | undefined;
  if (!source) return false;
  const text = JSON.stringify(data);
  if (sent.get(source) === text) return false;
  sent.set(source, text);
  beforeSend?.();
  source.setData(data);
  return true;
}
