import type { Rnd } from "./random.ts";
import { HOSTILE_TEXT, int, pick } from "./random.ts";

type Doc = Record<string, unknown>;
// eslint-disable-next-line @typescript-eslint/no-explicit-any -- tampering reaches into arbitrary JSON
type Any = any;

/** One way to tamper with a saved workspace; `path` is the field the reader must name. */
export interface Tampering {
  name: string;
  path: string;
  /** Text that must not survive into an accepted workspace. */
  marker: string;
  apply: (doc: Doc) => void;
}

const station = (d: Doc): Any => (d as Any).surveys[0].stations[0];

/** The tamperings the campaign found accepted (item 8), each one a value of the right type but wrong. */
export const TAMPERINGS: readonly Tampering[] = [
  {
    name: "lonLat [500, 95]",
    path: "surveys.0.stations.0.lonLat",
    marker: "[500,95]",
    apply: (d) => void (station(d).lonLat = [500, 95]),
  },
  {
    name: "a negative detection limit",
    path: "surveys.0.stations.0.values",
    marker: "-0.75",
    apply: (d) =>
      void Object.assign(Object.values(station(d).values)[0] as Any, {
        status: "belowDetection",
        value: undefined,
        detectionLimit: -0.75,
      }),
  },
  {
    name: 'unit "furlongs"',
    path: "surveys.0.constituents.0.unit",
    marker: "furlongs",
    apply: (d) => void ((d as Any).surveys[0].constituents[0].unit = "furlongs"),
  },
  {
    name: "a missing cell carrying a value",
    path: "surveys.0.stations.0.salinity.value",
    marker: "12345.5",
    apply: (d) => void Object.assign(station(d).salinity, { status: "missing", value: 12345.5 }),
  },
  {
    name: "discharge -5",
    path: "surveys.0.riverDischargeM3s",
    marker: "-5",
    apply: (d) => void ((d as Any).surveys[0].riverDischargeM3s = -5),
  },
  {
    name: "an external plain-http tile URL",
    path: "settings.tileUrl",
    marker: "tracker.invalid",
    apply: (d) => void ((d as Any).settings = { tileUrl: "http://tracker.invalid/{z}/{x}/{y}.png", useTiles: true }),
  },
  {
    name: "an https tile URL switched on",
    path: "settings.tileUrl",
    marker: '"useTiles":true',
    apply: (d) => void ((d as Any).settings = { tileUrl: "https://tiles.invalid/{z}/{x}/{y}.png", useTiles: true }),
  },
  {
    name: "salinity 500",
    path: "surveys.0.stations.0.salinity.value",
    marker: "500.25",
    apply: (d) => void Object.assign(station(d).salinity, { status: "measured", value: 500.25 }),
  },
  {
    name: "a 20,000-character station id",
    path: "surveys.0.stations.0.id",
    marker: "Q".repeat(20_000),
    apply: (d) => void (station(d).id = "Q".repeat(20_000)),
  },
];

const BAD_VALUES: readonly unknown[] = [-1, 1e308, -1e308, 0, 999, "", "x", null, [], {}, true, ...HOSTILE_TEXT];

/** A seeded random tampering: one value somewhere in the document replaced by a hostile one. */
export function tamperedWorkspace(r: Rnd, text: string): string {
  const doc = JSON.parse(text) as Any;
  const visit = (o: Any, depth: number): void => {
    if (o === null || typeof o !== "object" || depth > 8) return;
    const keys = Object.keys(o);
    if (keys.length === 0) return;
    const k = pick(r, keys);
    if (r() < 0.3 || typeof o[k] !== "object" || o[k] === null) o[k] = pick(r, BAD_VALUES);
    else visit(o[k], depth + 1);
  };
  for (let i = 1 + int(r, 3); i > 0; i -= 1) visit(doc, 0);
  return r() < 0.05 ? JSON.stringify(doc).slice(0, int(r, 5000)) : JSON.stringify(doc);
}
