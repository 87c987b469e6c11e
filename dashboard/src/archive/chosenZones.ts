/**
 * The main map following the surveys chosen in the archive view: the reaction zones of the chosen
 * surveys (one constituent) drawn along the channel, semi-transparent so a stretch that is a zone
 * in many chosen surveys reads darker. Positions come from the worker's overlays (analysis/workspace);
 * nothing is recomputed here. Plain data: the deck.gl layer (chosenZonesLayer.ts) is loaded with
 * deck.gl only when there is something to draw.
 */
import type { LonLat, SurveyOverlay } from "../worker/overlay.ts";

/** One chosen survey's zone stretch on the channel. */
export interface ChosenZonePath {
  survey: string;
  kind: "removal" | "addition";
  path: LonLat[];
}

/** The zone stretches of the chosen surveys (in workspace order) for one constituent. */
export function chosenZonePaths(
  chosen: readonly string[],
  surveyNames: readonly string[],
  overlays: ReadonlyArray<SurveyOverlay | undefined>,
  constituent: string,
): ChosenZonePath[] {
  const want = new Set(chosen);
  const out: ChosenZonePath[] = [];
  surveyNames.forEach((name, i) => {
    if (!want.has(name)) return;
    const c = overlays[i]?.constituents[constituent];
    if (!c || c.zonePaths.length === 0) return;
    const kind = c.zoneKind === "addition" ? "addition" : "removal";
    for (const path of c.zonePaths) out.push({ survey: name, kind, path });
  });
  return out;
}

/** Least opacity of one survey's zone (a byte), so one zone among many stays visible. */
export const MIN_ZONE_ALPHA = 64;

/**
 * Opacity of one survey's zone so that k overlapping zones approach full colour: alpha per
 * survey = 1 − (1 − 0.9)^(1/k) (k = chosen surveys with a zone), i.e. all k together reach 90 %
 * opacity; never below {@link MIN_ZONE_ALPHA}.
 */
export function zoneAlpha(nZoned: number): number {
  const k = Math.max(1, nZoned);
  return Math.max(MIN_ZONE_ALPHA, Math.round(255 * (1 - Math.pow(0.1, 1 / k))));
}
