/**
 * Test and automation hook: the screen boxes of every label MapLibre has placed, read from its
 * collision index, each with the layer it belongs to. Reads MapLibre internals (style.placement,
 * tile buckets), so it is used only by browser tests; it returns [] when they are not there.
 */
import type { Map as MapLibreMap } from "maplibre-gl";

/** One placed label or marker reservation, in page pixels. */
export interface LabelBox {
  layer: string;
  x1: number;
  y1: number;
  x2: number;
  y2: number;
}

interface GridLike {
  boxKeys: Array<{ bucketInstanceId: number }>;
  bboxes: number[];
}
interface TileLike {
  buckets?: Record<string, { bucketInstanceId?: number }>;
}
interface StyleLike {
  placement?: { collisionIndex?: { grid?: GridLike } };
  tileManagers?: Record<string, { _inViewTiles?: { getAllTiles(): TileLike[] } }>;
}

/** The collision index keeps a 100 px margin around the viewport (MapLibre's viewportPadding). */
const VIEWPORT_PADDING_PX = 100;

export function placedLabelBoxes(map: MapLibreMap, container: HTMLElement): LabelBox[] {
  const style = (map as unknown as { style?: StyleLike }).style;
  const grid = style?.placement?.collisionIndex?.grid;
  if (!style || !grid) return [];
  const layerOf = new Map<number, string>();
  for (const manager of Object.values(style.tileManagers ?? {})) {
    for (const tile of manager._inViewTiles?.getAllTiles() ?? []) {
      for (const [layer, bucket] of Object.entries(tile.buckets ?? {})) {
        if (bucket.bucketInstanceId !== undefined) layerOf.set(bucket.bucketInstanceId, layer);
      }
    }
  }
  const r = container.getBoundingClientRect();
  const dx = r.left - VIEWPORT_PADDING_PX;
  const dy = r.top - VIEWPORT_PADDING_PX;
  return grid.boxKeys.map((key, i) => ({
    layer: layerOf.get(key.bucketInstanceId) ?? "unknown",
    x1: grid.bboxes[4 * i]! + dx,
    y1: grid.bboxes[4 * i + 1]! + dy,
    x2: grid.bboxes[4 * i + 2]! + dx,
    y2: grid.bboxes[4 * i + 3]! + dy,
  }));
}
