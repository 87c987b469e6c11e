/**
 * Whether framing a map on new bounds would leave its camera where it is, so the re-frame can be
 * skipped: each camera move is a MapLibre frame (in software WebGL 100–200 ms of the main thread), and
 * at the cold start the data's bounds (the channel and the stations, known once the worker has read
 * the files) differ from the first framing (the centerline file's extent) by a few hundred metres.
 */
import type { LngLatBoundsLike, Map as MapLibreMap, PaddingOptions } from "maplibre-gl";

/** Zoom difference below which a framing counts as the same [zoom levels]. */
export const SAME_ZOOM = 0.05;
/** Centre shift below which a framing counts as the same [CSS px]. */
export const SAME_CENTRE_PX = 8;

/**
 * @param map the map
 * @param bounds the bounds to frame
 * @param options the framing's padding [CSS px] and largest zoom, as given to `fitBounds`
 * @returns true when `fitBounds(bounds, options)` would move the camera by less than {@link SAME_ZOOM}
 *   zoom levels and {@link SAME_CENTRE_PX} pixels
 */
export function framesAlready(
  map: Pick<MapLibreMap, "cameraForBounds" | "getZoom" | "getCenter" | "project">,
  bounds: LngLatBoundsLike,
  options: { padding: number | PaddingOptions; maxZoom: number },
): boolean {
  const camera = map.cameraForBounds(bounds, options);
  if (!camera?.center || camera.zoom === undefined) return false;
  if (Math.abs(camera.zoom - map.getZoom()) >= SAME_ZOOM) return false;
  const there = map.project(camera.center);
  const here = map.project(map.getCenter());
  return Math.hypot(there.x - here.x, there.y - here.y) < SAME_CENTRE_PX;
}
