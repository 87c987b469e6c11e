/** Legend entries and accessible description of the mixing plot, from what it draws. */
import type { LegendItem } from "./legend.ts";
import type { MixingModel } from "./mixingModel.ts";
import { roles } from "./palette.ts";
import { axisTitle, behaviourLabel, formatEstimate, formatRange } from "./format.ts";
import type { ConstituentAnalysisView } from "./types.ts";

/** Legend entries for the layers present in `model`. */
export function mixingLegendItems(model: MixingModel): LegendItem[] {
  const kinds = new Set(model.points.map((p) => p.kind));
  const items: LegendItem[] = [];
  if (kinds.has("measured")) items.push({ label: "Station", colour: roles.point, symbol: "dot" });
  if (kinds.has("belowDetection"))
    items.push({ label: "Below detection (at limit)", colour: roles.censored, symbol: "triangle" });
  if (kinds.has("rejected")) items.push({ label: "Rejected by QC", colour: roles.rejected, symbol: "cross" });
  items.push({ label: "Selected", colour: roles.selected, symbol: "ring" });
  if (model.dilution) items.push({ label: "Theoretical dilution line", colour: roles.dilutionLine, symbol: "dashed" });
  if (model.fitPath) items.push({ label: "Fitted curve", colour: roles.fit, symbol: "line" });
  if (model.bandPath) items.push({ label: "95 % band", colour: roles.fitBand, symbol: "band" });
  if (model.tangent) items.push({ label: "Seaward tangent", colour: roles.tangent, symbol: "line" });
  if (model.effective)
    items.push({ label: "C*₀ (effective river end-member)", colour: roles.tangent, symbol: "diamond" });
  if (model.zone) items.push({ label: "Reaction zone", colour: roles.zone, symbol: "zone" });
  if (model.maximum) items.push({ label: "Maximum (95 % range)", colour: roles.maximum, symbol: "dashed" });
  return items;
}

/** One-paragraph description of the plot for screen readers and the SVG <desc>. */
export function describeMixingPlot(
  c: ConstituentAnalysisView | undefined,
  model: MixingModel,
  surveyName: string,
): string {
  if (!c) return `No results for this constituent in survey ${surveyName}.`;
  const parts = [
    `${axisTitle(c.name, c.unit)} against salinity (PSS-78), survey ${surveyName}, ${model.points.length} observations.`,
    `${behaviourLabel[c.class]}.`,
  ];
  if (c.effectiveEndmember) parts.push(`Effective river end-member C*₀ ${formatEstimate(c.effectiveEndmember)}.`);
  if (c.percentChange) parts.push(`Change ${formatEstimate(c.percentChange)}.`);
  if (c.reactionZone)
    parts.push(`Reaction zone (${c.reactionZone.kind}) at salinity ${formatRange(c.reactionZone.salinity)}.`);
  if (c.warnings.length) parts.push(`${c.warnings.length} warning${c.warnings.length > 1 ? "s" : ""}.`);
  return parts.join(" ");
}
