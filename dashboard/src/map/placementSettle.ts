/**
 * Spares the map the second, identical frame MapLibre draws after every frame that takes in new label
 * tiles.
 *
 * Why: when a frame adds new symbol tiles to MapLibre's cross-tile index, MapLibre places every label
 * again and draws the frame with that placement; then it marks the placement stale ("it may have been
 * made over several frames, before the tiles changed") and asks for one more frame. With no label
 * fade (this map's fadeDuration is 0, and MapLibre uses 0 until the map's first idle anyway) every
 * placement is a full one, made in that same frame after the tiles were added, so the frame asked for
 * places the same labels again and draws the same picture. In software WebGL that frame costs the main
 * thread 50–180 ms (the canvas read back): at the cold start, after each new constituent and each
 * brushed stretch the map went idle one frame late.
 *
 * How: on the map's `render` event (fired inside MapLibre's render, before it decides whether to ask for
 * another frame) the placement's stale mark is cleared when it is the only reason left for a frame:
 * the placement has finished and changes nothing over time (no fade), no source or style change is
 * pending, the camera is still. MapLibre then goes idle in that frame. Any later change (tiles, camera,
 * style) asks for frames as before and is placed afresh.
 *
 * It reads MapLibre fields that are not part of its public API (checked for MapLibre GL JS 6.x): when
 * they are missing or of another shape, it does nothing and MapLibre behaves as it always did.
 */
import type { Map as MapLibreMap } from "maplibre-gl";

/** The non-public MapLibre state read here (every field optional: checked before use). */
interface RenderState {
  _placementDirty?: unknown;
  _sourcesDirty?: unknown;
  _styleDirty?: unknown;
  _repaint?: unknown;
  painter?: { renderToTexture?: { needsFollowUpFrame?: unknown } };
  style?: {
    pauseablePlacement?: { isDone?: () => boolean };
    placement?: { stale?: unknown; fadeDuration?: unknown };
  };
}

/** The parts of a MapLibre map used here (a stand-in in tests). */
export type SettlingMap = Pick<MapLibreMap, "on" | "off" | "isMoving">;

/**
 * Whether the frame just drawn asks for another only because its finished, fade-free label placement
 * is marked stale; if so, clears that mark (and MapLibre's placement-dirty flag) so the map idles now.
 *
 * @param map the map, inside its `render` event
 * @returns true when the follow-up frame was spared
 */
export function settleStalePlacement(map: SettlingMap): boolean {
  const m = map as SettlingMap & RenderState;
  const placement = m.style?.placement;
  const pauseable = m.style?.pauseablePlacement;
  // The placement's own fade (MapLibre makes it with the map's fadeDuration, 0 before the first idle).
  if (
    placement?.fadeDuration !== 0 ||
    placement.stale !== true ||
    m._placementDirty !== true ||
    m._sourcesDirty !== false ||
    m._styleDirty !== false ||
    m._repaint === true ||
    m.painter?.renderToTexture?.needsFollowUpFrame === true ||
    typeof pauseable?.isDone !== "function" ||
    !pauseable.isDone() ||
    m.isMoving()
  )
    return false;
  placement.stale = false;
  m._placementDirty = false;
  return true;
}

/**
 * Spares `map` the follow-up frame of every fade-free label placement ({@link settleStalePlacement}).
 *
 * @returns a function that stops it
 */
export function settlePlacements(map: SettlingMap): () => void {
  const onRender = () => {
    settleStalePlacement(map);
  };
  map.on("render", onRender);
  return () => map.off("render", onRender);
}
