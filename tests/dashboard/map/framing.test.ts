// framesAlready (dashboard/src/map/framing.ts): a re-frame that would move the camera by less than
// 0.05 zoom levels and 8 px is skipped (common practice: no redraw for a change nobody can see).
// Checked on a stand-in map whose camera for the bounds is given and which projects 100 px per degree.
import { describe, expect, it } from "vitest";
import type { LngLat, LngLatLike, Map as MapLibreMap } from "maplibre-gl";
import { SAME_CENTRE_PX, SAME_ZOOM, framesAlready } from "../../../dashboard/src/map/framing.ts";

function fakeMap(
  zoom: number,
  center: [number, number],
  camera: { center?: [number, number]; zoom?: number } | undefined,
) {
  const lngLat = (c: [number, number]) => ({ lng: c[0], lat: c[1] }) as LngLat;
  return {
    cameraForBounds: () => (camera ? { ...camera, center: camera.center && lngLat(camera.center) } : undefined),
    getZoom: () => zoom,
    getCenter: () => lngLat(center),
    project: (p: LngLatLike) => {
      const { lng, lat } = p as LngLat;
      return { x: 100 * lng, y: -100 * lat };
    },
  } as unknown as Pick<MapLibreMap, "cameraForBounds" | "getZoom" | "getCenter" | "project">;
}

const BOUNDS: [[number, number], [number, number]] = [
  [-1, -1],
  [1, 1],
];
const OPTIONS = { padding: 48, maxZoom: 14 };

describe("framesAlready()", () => {
  it("the same camera within the tolerances: nothing to re-frame", () => {
    expect(framesAlready(fakeMap(9.6, [0, 0], { center: [0.05, 0], zoom: 9.62 }), BOUNDS, OPTIONS)).toBe(true);
  });
  it("a zoom change of SAME_ZOOM or more re-frames", () => {
    expect(framesAlready(fakeMap(9.6, [0, 0], { center: [0, 0], zoom: 9.6 + SAME_ZOOM }), BOUNDS, OPTIONS)).toBe(false);
  });
  it("a centre shift of SAME_CENTRE_PX or more re-frames", () => {
    const shift = SAME_CENTRE_PX / 100;
    expect(framesAlready(fakeMap(9.6, [0, 0], { center: [shift, 0], zoom: 9.6 }), BOUNDS, OPTIONS)).toBe(false);
  });
  it("bounds the map cannot frame re-frame (no camera)", () => {
    expect(framesAlready(fakeMap(9.6, [0, 0], undefined), BOUNDS, OPTIONS)).toBe(false);
  });
});
