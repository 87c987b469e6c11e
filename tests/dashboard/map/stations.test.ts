import { describe, expect, it } from "vitest";
import { expression, type StylePropertySpecification } from "@maplibre/maplibre-gl-style-spec";
import {
  STATION_HOVER_STATE,
  STATION_ID_PROPERTY,
  STATION_LAYERS,
  stationFeatures,
  stationLayers,
  stationRingPx,
} from "../../../dashboard/src/map/stations.ts";
import { stationRadiusPx } from "../../../dashboard/src/map/labels.ts";
import { salinityScale } from "../../../dashboard/src/map/colour.ts";
import { buildStyle } from "../../../dashboard/src/map/style.ts";
import type { MapData, MapStation } from "../../../dashboard/src/map/mapData.ts";

const stations: MapStation[] = [
  { id: "A", lonLat: [0, 0], salinity: 30, nearestLonLat: [0.001, 0] },
  { id: "B", lonLat: [0, 0.01], salinity: 5, offChannel: true, nearestLonLat: [0.01, 0.01] },
  { id: "C", lonLat: [0, 0.02] },
];
const data: MapData = {
  basemap: undefined,
  channel: undefined,
  overlay: undefined,
  zone: undefined,
  stations,
  constituent: "Fe",
  unit: "nmol/L",
  colouring: "salinity",
};
const scale = salinityScale(35);

type Props = Record<string, unknown>;
/** Evaluates a paint property of the station layer for a feature and its feature state (MapLibre's evaluator). */
function paint(name: string, props: Props, state: Props = {}): unknown {
  const layer = stationLayers().find((l) => l.id === STATION_LAYERS.stations)!;
  const value = (layer as { paint: Record<string, unknown> }).paint[name];
  const spec = {
    type: name.endsWith("color") ? "color" : "number",
    expression: { interpolated: false, parameters: ["zoom", "feature", "feature-state"] },
    "property-type": "data-driven",
  } as unknown as StylePropertySpecification;
  const parsed = expression.createExpression(value, name, spec);
  if (parsed.result !== "success") throw new Error(JSON.stringify(parsed.value));
  return parsed.value.evaluate({ zoom: 10 }, { type: "Point", properties: props } as never, state);
}

describe("stations.ts: stations as MapLibre circles (common practice: the look the stations had as deck.gl points)", () => {
  it("stationFeatures() gives one point per station with its id, fill and flags, and projection lines only for selected stations", () => {
    const features = stationFeatures(data, stations, scale, new Set(["A", "C"]));
    const points = features.flatMap((f) =>
      f.properties.kind === "station-mark" ? [f.properties as unknown as Props] : [],
    );
    expect(points.map((p) => p[STATION_ID_PROPERTY])).toEqual(["A", "B", "C"]);
    const lines = features.filter((f) => f.properties.kind === "projection");
    // C is selected but has no nearest channel point: no line
    expect(lines).toHaveLength(1);
    expect(lines[0]!.geometry.coordinates).toEqual([
      [0, 0],
      [0.001, 0],
    ]);
    const b = points[1]!;
    expect(b.off).toBe(true);
    expect(b.selected).toBe(false);
    // off-channel stations are faded: alpha 70/255
    expect(String(b.fill)).toMatch(/, 0\.275\)$/);
    // no value: the scale's grey
    expect(points[2]!.fill).toBe("rgba(150, 150, 150, 0.784)");
  });

  it("the circle layer draws the outer edge at stationRadiusPx + ring/2 with rings 3 (selected), 2 (hovered, off channel), 1", () => {
    const cases: Array<{
      props: Props;
      state?: Props;
      station: MapStation;
      selected: string[];
      hovered: string | null;
    }> = [
      { props: { selected: false, off: false }, station: { id: "x", lonLat: [0, 0] }, selected: [], hovered: null },
      { props: { selected: true, off: false }, station: { id: "x", lonLat: [0, 0] }, selected: ["x"], hovered: null },
      {
        props: { selected: false, off: false },
        state: { [STATION_HOVER_STATE]: true },
        station: { id: "x", lonLat: [0, 0] },
        selected: [],
        hovered: "x",
      },
      {
        props: { selected: false, off: true },
        station: { id: "x", lonLat: [0, 0], offChannel: true },
        selected: [],
        hovered: null,
      },
    ];
    for (const c of cases) {
      const sel = new Set(c.selected);
      const ring = stationRingPx(c.station, sel, c.hovered);
      const radius = paint("circle-radius", c.props, c.state) as number;
      const width = paint("circle-stroke-width", c.props, c.state) as number;
      expect(width).toBe(ring);
      expect(radius + width).toBe(stationRadiusPx(c.station, sel, c.hovered) + ring / 2);
    }
  });

  it("buildStyle() puts the stations above the labels in the overlay source, which promotes the station id for feature state", () => {
    const style = buildStyle({ basemap: undefined, stations: stationFeatures(data, stations, scale, new Set()) });
    const ids = style.layers.map((l) => l.id);
    expect(ids.slice(-2)).toEqual([STATION_LAYERS.projection, STATION_LAYERS.stations]);
    const source = Object.values(style.sources).find((s) => "promoteId" in s) as { promoteId?: string } | undefined;
    expect(source?.promoteId).toBe(STATION_ID_PROPERTY);
  });
});
