/**
 * What the comparison view shows, laid out from the worker's comparison (the
 * workspace API's `analyzeInputs` → `comparison`): the rows of its tables as text, and the
 * series of the overlaid mixing plot. No science here, only layout.
 */
import {
  formatSignificant,
  type ConstituentShift,
  type EstimateDifference,
  type SurveyAnalysis,
  type SurveyComparison,
} from "../../../analysis/index.ts";
import { categorical } from "../panels/lib/palette.ts";

/** Colour of each survey (Okabe–Ito, colour-blind safe), the reference first. */
export function surveyColour(index: number): string {
  return categorical[index % categorical.length];
}

/** Dash pattern of each survey's stretches and lines (solid for the reference). */
export function surveyDash(index: number): string {
  return ["", "7 4", "2 3", "10 3 2 3"][index % 4];
}

/** The comparison the worker made (the workspace API's), or a reason it is not shown. */
export function comparisonOf(
  analyses: ReadonlyArray<SurveyAnalysis | undefined>,
  comparison: SurveyComparison | undefined,
  reason: string | undefined,
): { comparison?: SurveyComparison; reason?: string } {
  if (analyses.length < 2) return { reason: "Load two or more surveys to compare them." };
  if (comparison) return { comparison };
  return { reason: reason ?? "Waiting for the analysis of every survey…" };
}

/** One row of the shift table: a quantity of one constituent in both surveys and its change. */
export interface ShiftRow {
  quantity: string;
  reference: string;
  later: string;
  change: string;
  interval: string;
  exceeds: boolean | undefined;
  statement: string;
}

function num(v: number, digits = 3, signed = false): string {
  return formatSignificant(v, digits, signed);
}

function unitOf(d: EstimateDifference): string {
  return d.unit === "salinity" || d.unit === "" ? "" : ` ${d.unit}`;
}

function row(quantity: string, d: EstimateDifference | undefined): ShiftRow | undefined {
  if (!d) return undefined;
  const u = unitOf(d);
  // A change in % change is in percentage points; the two values themselves are percentages.
  const uValue = d.unit === "percentage points" ? " %" : u;
  return {
    quantity,
    reference: `${num(d.reference)}${uValue}`,
    later: `${num(d.later)}${uValue}`,
    change: `${num(d.value, 2, true)}${u}`,
    interval: d.method === "no-interval" ? "no interval" : `${num(d.lower, 2, true)} to ${num(d.upper, 2, true)}${u}`,
    exceeds: d.method === "no-interval" ? undefined : d.exceedsUncertainty,
    statement: d.statement + (d.note ? ` ${d.note}` : ""),
  };
}

/** Every quantity of a constituent shift that the comparison could estimate, as table rows. */
export function shiftRows(shift: ConstituentShift): ShiftRow[] {
  const z = shift.zone;
  const m = shift.maximum;
  const kind = z?.kind === "addition" ? "Addition zone" : z?.kind === "removal" ? "Removal zone" : "Reaction zone";
  return [
    row(`${kind}, seaward end (km from mouth)`, z?.kmSeaward),
    row(`${kind}, landward end (km from mouth)`, z?.kmLandward),
    row(`${kind}, from salinity`, z?.salinityFrom),
    row(`${kind}, to salinity`, z?.salinityTo),
    row("Maximum (km from mouth)", m?.km),
    row("Maximum (salinity)", m?.salinity),
    row("Maximum excess over the dilution line", m?.excess),
    row("Effective river end-member C*₀", shift.effectiveEndmember),
    row("Change river → sea (percentage points)", shift.percentChange),
    row("Net estuarine source (+) / sink (−)", shift.netFlux),
    row("Effective export Q·C*₀", shift.effectiveExport),
  ].filter((r): r is ShiftRow => r !== undefined);
}

/** Text of an optional number with unit, "—" when absent. */
export function maybe(v: number | undefined, unit: string, digits = 3): string {
  return v === undefined ? "—" : `${num(v, digits)}${unit ? ` ${unit}` : ""}`;
}

/** A difference with its interval and the plain statement: "+6.1 nmol/L (−1.6 to +31 nmol/L): within the uncertainty …". */
export function changeText(d: EstimateDifference | undefined): string {
  const r = row("", d);
  return r ? `${r.change} (${r.interval}): ${r.statement}` : "—";
}
