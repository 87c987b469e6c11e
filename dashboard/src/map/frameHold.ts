/**
 * Holds a map's frames while its tiles are being made, so the map draws them in one frame instead of
 * a frame for every batch of tiles that comes back from MapLibre's worker.
 *
 * Why: in software WebGL (SwiftShader: the bench machine, VMs without a GPU) every frame MapLibre
 * draws blocks the page's main thread until the GPU process has drawn it and the canvas has been read
 * back (100–150 ms a frame for the estuary's basemap on the bench machine), and every tile's glyphs
 * and images must be answered by the main thread between those frames. When a source gets new data,
 * MapLibre draws a frame at once (the old tiles again), then one per batch of re-tiled tiles; at the
 * cold start it draws one per batch of basemap tiles before the marks are in. Each of those frames
 * shows a map that is not yet the one asked for, takes the processor from the analysis and from
 * MapLibre's worker, and delays the tiles still to come.
 *
 * How: the map's own `triggerRepaint` (through which MapLibre asks for every frame) is replaced on this
 * map instance by one that only notes the request, until `done()` holds (checked after each source
 * data event, once that event's own handlers have run: a source's `content` event is what starts its
 * tiles' reload), or the user moves the map, or the map is resized, or `maxMs` has passed. Then the
 * original method is seen again and, if a frame was asked for, called once. Only a map that has asked
 * for its tiles may be held: MapLibre asks for a view's tiles in a frame. With `drawOnceWhen`, one frame
 * is let through the first time it holds (e.g. the basemap's tiles are all in while the marks are still
 * being made): the shader programs are then built, in MapLibre and in the software GPU, while the rest
 * is still on its way, instead of all in the frame that ends the hold.
 */
import type { Map as MapLibreMap } from "maplibre-gl";

/** Longest hold of a re-tiling [ms]: one that takes longer (a large source, a slow machine) is drawn as it comes. */
export const RETILE_HOLD_MAX_MS = 600;

/** The parts of a MapLibre map a hold uses (a fake one in tests). */
export type HoldableMap = Pick<MapLibreMap, "on" | "off" | "isSourceLoaded" | "areTilesLoaded" | "triggerRepaint">;

/** A hold in force: `release()` ends it early (nothing happens when it has ended). */
export interface FrameHold {
  release(): void;
  /** Whether the hold still holds the map's frames. */
  readonly holding: boolean;
}

/** Maps whose frames are held now. */
const held = new WeakSet<object>();

/**
 * Holds `map`'s frames until `done()`; undefined when its frames are already held.
 *
 * @param map the map
 * @param done true once the map has what it should draw (checked after each source data event)
 * @param maxMs longest hold [ms]
 * @param drawOnceWhen one frame is drawn the first time this holds (checked as `done`) before `done()`
 */
export function holdFrames(
  map: HoldableMap,
  done: () => boolean,
  maxMs: number,
  drawOnceWhen?: () => boolean,
): FrameHold | undefined {
  if (held.has(map)) return undefined;
  held.add(map);
  const own = map as { triggerRepaint(): void };
  /** The map's own method (MapLibre's, on its prototype). */
  const draw = () => (Object.getPrototypeOf(own) as { triggerRepaint(): void }).triggerRepaint.call(own);
  let asked = false;
  let drawnOnce = drawOnceWhen === undefined;
  own.triggerRepaint = () => {
    asked = true;
  };
  const release = () => {
    if (!held.has(map)) return;
    held.delete(map);
    clearTimeout(timer);
    map.off("sourcedata", onSourceData);
    map.off("movestart", onMove);
    map.off("resize", release);
    // The instance's own property goes: MapLibre's method (on the prototype) is seen again.
    delete (own as { triggerRepaint?: unknown }).triggerRepaint;
    if (asked) map.triggerRepaint();
  };
  const onSourceData = () =>
    queueMicrotask(() => {
      if (!held.has(map)) return;
      if (done()) release();
      else if (!drawnOnce && drawOnceWhen!()) {
        drawnOnce = true;
        asked = false;
        draw();
      }
    });
  // Moves of the map's own (fitBounds at the start) wait with the rest; the user's do not.
  const onMove = (e: { originalEvent?: unknown }) => {
    if (e.originalEvent) release();
  };
  map.on("sourcedata", onSourceData);
  map.on("movestart", onMove);
  map.on("resize", release);
  const timer = setTimeout(release, maxMs);
  return {
    release,
    get holding() {
      return held.has(map);
    },
  };
}

/**
 * Whether `sourceId` has taken in the data given to it since `since()` was called and tiled them:
 * its `content` event came after, and every tile of the map is loaded.
 *
 * @returns `since` (call just before giving the source new data) and `done` (for {@link holdFrames})
 */
export function retiled(
  map: Pick<HoldableMap, "on" | "isSourceLoaded" | "areTilesLoaded">,
  sourceId: string,
): { since(): void; done(): boolean } {
  let waiting = false;
  let content = false;
  map.on("sourcedata", (e) => {
    if (waiting && e.sourceId === sourceId && e.sourceDataType === "content") content = true;
  });
  return {
    since() {
      waiting = true;
      content = false;
    },
    done: () => waiting && content && map.isSourceLoaded(sourceId) && map.areTilesLoaded(),
  };
}
