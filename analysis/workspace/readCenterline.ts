/**
 * The one centerline reader: GeoJSON text or bytes → channel network, with the one mouth rule
 * (explicit option > mouth Point > the main line's `properties.mouth` > suggestion from station
 * salinity > first vertex assumed), the decision always stated, and problems as issues with positions.
 */
import { buildChannelNetwork } from "../geometry/buildNetwork.ts";
import type { CenterlineGeoJson } from "../geometry/geojsonInput.ts";
import { centerlineMouthHint } from "../geometry/mouthHint.ts";
import { centerlinePlausibility, centerlineVertices } from "../geometry/centerlinePlausibility.ts";
import { suggestMouth, type MouthEvidence } from "../geometry/suggestMouth.ts";
import type { ChannelNetwork, MouthOption } from "../geometry/types.ts";
import type { ImportIssue } from "../survey/survey.ts";
import { decodeText } from "./fileKind.ts";

/** Where the mouth decision came from, strongest first. */
export type MouthSource = "option" | "point" | "property" | "suggested" | "assumed";

/** The mouth as decided, with a sentence saying how (shown in the CLI, dashboard and briefing). */
export interface MouthDecision {
  source: MouthSource;
  /** "start"/"end" of the main stem as given in the file, or a [lon, lat] point. */
  mouth: MouthOption;
  statement: string;
}

/** A centerline read into a channel network. */
export interface ChannelInput {
  fileName: string;
  /** The parsed GeoJSON as given (lines and markers). */
  geojson: CenterlineGeoJson;
  network: ChannelNetwork;
  mouth: MouthDecision;
}

/** Options of {@link readCenterline}. */
export interface ReadCenterlineOptions {
  fileName: string;
  /** Mouth given by the user (command line, dashboard setting); overrides the file. */
  mouth?: MouthOption;
  /** Stations with position and salinity, used to suggest the mouth when neither user nor file states it. */
  stations?: readonly MouthEvidence[];
}

const issue = (file: string, column: string, value: string, expected: string): ImportIssue => ({
  file,
  row: 0,
  column,
  value,
  expected,
  severity: "error",
});

/** A centerline written as [lat, lon] (error) or far from the stations (warning); see centerlinePlausibility. */
function placementIssues(file: string, geojson: unknown, stations: readonly MouthEvidence[] = []): ImportIssue[] {
  const lonLats = stations.flatMap((s) => (s.lonLat ? [s.lonLat as [number, number]] : []));
  const p = centerlinePlausibility(centerlineVertices(geojson), lonLats);
  if (p === undefined) return [];
  return [{ ...issue(file, "", "", `a centerline where the stations are: ${p.message}`), severity: p.severity }];
}

interface FeatureLike {
  geometry?: { type?: unknown; coordinates?: unknown } | null;
  properties?: Record<string, unknown> | null;
}

/** Every position that is not two finite numbers, named by feature and index. */
function badPositions(file: string, doc: unknown): ImportIssue[] {
  const d = doc as { type?: unknown; features?: unknown; geometry?: unknown };
  const features: FeatureLike[] =
    d.type === "FeatureCollection" && Array.isArray(d.features)
      ? (d.features as FeatureLike[])
      : d.type === "Feature"
        ? [d as FeatureLike]
        : [{ geometry: d as FeatureLike["geometry"] }];
  const out: ImportIssue[] = [];
  features.forEach((f, i) => {
    const g = f?.geometry;
    if (!g || (g.type !== "LineString" && g.type !== "MultiLineString")) return;
    const name = f.properties?.["name"] ?? f.properties?.["id"];
    const label = `feature ${i}${name !== undefined ? ` ('${String(name)}')` : ""}`;
    const parts = (g.type === "LineString" ? [g.coordinates] : g.coordinates) as unknown;
    if (!Array.isArray(parts)) return void out.push(issue(file, label, String(parts), "an array of positions"));
    parts.forEach((part: unknown, k) => {
      if (!Array.isArray(part)) return void out.push(issue(file, label, String(part), "an array of positions"));
      part.forEach((p: unknown, j) => {
        const ok = Array.isArray(p) && p.length >= 2 && typeof p[0] === "number" && typeof p[1] === "number";
        if (!ok || !Number.isFinite(p[0]) || !Number.isFinite(p[1]))
          out.push(
            issue(
              file,
              `${label}${parts.length > 1 ? ` part ${k}` : ""} position ${j}`,
              JSON.stringify(p) ?? "undefined",
              "[longitude, latitude] in degrees",
            ),
          );
      });
    });
  });
  return out;
}

function describe(source: MouthSource, mouth: MouthOption, network: ChannelNetwork, extra = ""): string {
  const at = `[${network.mouthLonLat[0].toFixed(5)}, ${network.mouthLonLat[1].toFixed(5)}]`;
  const how: Record<MouthSource, string> = {
    option: `as given (${Array.isArray(mouth) ? "nearest end to the given point" : `${mouth} of the line`})`,
    point: "from the mouth Point in the centerline file",
    property: `from the main line's properties.mouth "${String(mouth)}"`,
    suggested: `suggested from station salinity (higher towards the sea)${extra}`,
    assumed: "assumed at the first vertex: neither the file nor the user states it and no salinity suggests it",
  };
  const change =
    source === "suggested" || source === "assumed"
      ? " Change it with --mouth start|end|lon,lat on the command line or the Mouth control in the dashboard."
      : "";
  return `Mouth at ${at} of main stem '${network.mainBranchId}', ${how[source]}.${change}`;
}

/**
 * Reads a centerline (GeoJSON LineString, MultiLineString, Feature or FeatureCollection; UTF-8 with or
 * without byte-order mark) and builds the channel network with the one mouth rule: the user's option,
 * else a Point with `properties.role` "mouth", else the main line's `properties.mouth` ("start"/"end"),
 * else the end towards which station salinity rises (Spearman rank correlation, see suggestMouth),
 * else the first vertex. Never throws on bad content: problems come back as issues naming the feature
 * and position.
 *
 * @param content the file as text or bytes
 * @param options file name, user's mouth, stations for the suggestion
 * @returns the channel (undefined when unusable) and the issues
 * @see Butler, H. et al. (2016) The GeoJSON Format, IETF RFC 7946.
 */
export function readCenterline(
  content: string | Uint8Array,
  options: ReadCenterlineOptions,
): { channel: ChannelInput | undefined; issues: ImportIssue[] } {
  const file = options.fileName;
  let geojson: CenterlineGeoJson;
  try {
    geojson = JSON.parse(decodeText(content)) as CenterlineGeoJson;
  } catch (error) {
    return { channel: undefined, issues: [issue(file, "", "", `GeoJSON text (${(error as Error).message})`)] };
  }
  if (geojson === null || typeof geojson !== "object")
    return { channel: undefined, issues: [issue(file, "", String(geojson), "a GeoJSON object")] };
  const bad = badPositions(file, geojson);
  if (bad.length > 0) return { channel: undefined, issues: bad };
  const placed = placementIssues(file, geojson, options.stations);
  if (placed.some((i) => i.severity === "error")) return { channel: undefined, issues: placed };
  const hint = centerlineMouthHint(geojson);
  let source: MouthSource =
    options.mouth !== undefined
      ? "option"
      : hint === undefined
        ? "assumed"
        : Array.isArray(hint)
          ? "point"
          : "property";
  let mouth: MouthOption = options.mouth ?? hint ?? "start";
  try {
    let network = buildChannelNetwork(geojson, { mouth });
    let extra = "";
    if (source === "assumed" && options.stations) {
      const s = suggestMouth(network, options.stations);
      if (s) {
        source = "suggested";
        mouth = s.mouth;
        extra = ` (ρ = ${s.spearmanRho.toFixed(2)}, ${s.nStations} stations)`;
        if (s.mouth !== "start") network = buildChannelNetwork(geojson, { mouth });
      }
    }
    const statement = describe(source, mouth, network, extra);
    network = {
      ...network,
      warnings: [
        ...network.warnings.filter((w) => w.code !== "mouthAssumed"),
        { code: source === "assumed" ? "mouthAssumed" : "mouthStated", message: statement },
      ],
    };
    return { channel: { fileName: file, geojson, network, mouth: { source, mouth, statement } }, issues: placed };
  } catch (error) {
    const message = (error as Error).message.replace(/^buildChannelNetwork: /, "");
    return { channel: undefined, issues: [issue(file, "", "", `a usable channel centerline (${message})`)] };
  }
}
