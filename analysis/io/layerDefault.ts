import type { ImportIssue, Survey } from "../survey/survey.ts";
import type { ImportedStation } from "./importSummary.ts";
import { makeIssue } from "./importSummary.ts";
import type { LayerChoice } from "./layerSelection.ts";
import { detectDepthProfiles } from "./layerSelection.ts";
import { normaliseStationId } from "./stationIds.ts";

/**
 * The layer an import uses: the stated one; otherwise "shallowest" when stations were sampled at
 * several depths (with a notice naming the choice and how to change it), else "all" (one row = one station).
 *
 * @param rows stations as read
 * @param stated the user's choice, if any
 * @param depthHeader header of the depth column (for the notice)
 * @param file file name for the notice
 * @param issues where the notice is added
 * @returns the layer to use
 */
export function chooseLayer(
  rows: readonly ImportedStation[],
  stated: LayerChoice | undefined,
  depthHeader: string,
  file: string,
  issues: ImportIssue[],
): LayerChoice {
  if (stated !== undefined) return stated;
  const info = detectDepthProfiles(rows);
  if (info.stationsWithSeveralDepths === 0 && info.maxSamplesPerStation <= 1) return { kind: "all" };
  issues.push(
    makeIssue(
      file,
      0,
      depthHeader,
      `${info.stationsWithSeveralDepths} station visits with several depths (up to ${info.maxSamplesPerStation} samples)`,
      "one value per station and survey: each constituent from the shallowest sample that has it, paired with that sample's salinity (layer \"shallowest\"; change it with --layer surface|bottom|average|<min>-<max>|all or the dashboard's layer control)",
      "warning",
    ),
  );
  return { kind: "shallowest" };
}

/**
 * One warning per station id that occurs more than once in a survey (with the count), e.g. with
 * layer "all" on a depth-resolved file.
 *
 * @param surveys the surveys after layering
 * @param file file name
 * @param column station column header
 * @returns the warnings
 */
export function duplicateStationIssues(surveys: readonly Survey[], file: string, column: string): ImportIssue[] {
  const issues: ImportIssue[] = [];
  for (const s of surveys) {
    const counts = new Map<string, { n: number; row: number; id: string }>();
    for (const st of s.stations) {
      const k = normaliseStationId(st.id).id;
      const c = counts.get(k) ?? { n: 0, row: st.sourceRow, id: st.id };
      c.n += 1;
      counts.set(k, c);
    }
    for (const c of counts.values())
      if (c.n > 1)
        issues.push(
          makeIssue(
            file,
            c.row,
            column,
            c.id,
            `one row per station in survey "${s.name}" (${c.n} rows; choose a layer to combine them)`,
            "warning",
          ),
        );
  }
  return issues;
}
