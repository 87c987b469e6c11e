/**
 * deck.gl layer of an underway log (underwayPoints.ts builds its attributes). Imported only by the
 * lazily loaded deck.gl overlay (deckOverlay.ts), so deck.gl is not in the first load.
 */
import { ScatterplotLayer } from "@deck.gl/layers";
import type { UnderwayPoints } from "../worker/underwayProtocol.ts";
import { MAX_UNDERWAY_POINTS, underwayAttributes } from "./underwayPoints.ts";

export { MAX_UNDERWAY_POINTS, underwayAttributes } from "./underwayPoints.ts";

/** Options of {@link underwayLayer}. */
export interface UnderwayLayerOptions {
  id?: string;
  /** Dot radius [px] (default 3). */
  radiusPx?: number;
  visible?: boolean;
}

/**
 * The layer: one dot per aggregated point, coloured by its mean salinity.
 *
 * @throws RangeError when more than MAX_UNDERWAY_POINTS points are given (aggregate first)
 */
export function underwayLayer(points: UnderwayPoints, options: UnderwayLayerOptions = {}): ScatterplotLayer {
  const n = points.lonDeg.length;
  if (n > MAX_UNDERWAY_POINTS)
    throw new RangeError(
      `underwayLayer(): ${n} points is more than ${MAX_UNDERWAY_POINTS}; aggregate with decimatePoints first`,
    );
  const { positions, colours } = underwayAttributes(points);
  return new ScatterplotLayer({
    id: options.id ?? "underway",
    visible: options.visible ?? true,
    data: {
      length: n,
      attributes: { getPosition: { value: positions, size: 2 }, getFillColor: { value: colours, size: 4 } },
    },
    radiusUnits: "pixels",
    getRadius: options.radiusPx ?? 3,
    stroked: false,
    pickable: false,
  });
}
