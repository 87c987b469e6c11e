import type { ConstituentAnalysis, Estimate, MixingWarning } from "../mixing/result.ts";
import type { ConstituentShift, EstimateDifference } from "./types.ts";
import { differenceOfEstimates, differenceWithoutInterval } from "./differenceOfEstimates.ts";
import type { SalinityProfile } from "../geometry/salinityTypes.ts";
import { kmEstimateOfSalinity } from "./salinityKm.ts";
import { formatSignificant } from "../output/formatNumber.ts";
import { minOf, maxOf } from "../survey/arrayExtent.ts";

/** One side of a shift: the survey name, its station salinity profile and the constituent's analysis. */
export interface ShiftSide {
  survey: string;
  profile: SalinityProfile | undefined;
  analysis: ConstituentAnalysis;
}

const point = (value: number, unit: string): Estimate => ({ value, lower: value, upper: value, unit });

function diff(a: Estimate | undefined, b: Estimate | undefined, unit?: string): EstimateDifference | undefined {
  if (!a || !b) return undefined;
  if (a.lower === a.upper && b.lower === b.upper) return differenceWithoutInterval(a.value, b.value, unit ?? a.unit);
  return differenceOfEstimates(a, b, unit);
}

function zoneKm(side: ShiftSide): { seaward?: Estimate; landward?: Estimate } {
  const z = side.analysis.reactionZone;
  if (!z) return {};
  const ends = z.km.flat();
  const seaV = ends.length ? minOf(ends) : undefined;
  const landV = ends.length ? maxOf(ends) : undefined;
  const hi = z.salinityUpper ?? point(z.salinity[1], "salinity");
  const lo = z.salinityLower ?? point(z.salinity[0], "salinity");
  const seaward = kmEstimateOfSalinity(side.profile, hi, seaV);
  const landward = kmEstimateOfSalinity(side.profile, lo, landV);
  return { ...(seaward ? { seaward } : {}), ...(landward ? { landward } : {}) };
}

function sentence(
  label: string,
  d: EstimateDifference | undefined,
  unit: string,
  moveWords?: [string, string],
): string | undefined {
  if (!d) return undefined;
  const v = formatSignificant(Math.abs(d.value), 2);
  const dir = moveWords ? (d.value >= 0 ? moveWords[0] : moveWords[1]) : d.value >= 0 ? "up" : "down";
  const range =
    d.method === "no-interval"
      ? ""
      : ` (approx. 95 % interval ${formatSignificant(d.lower, 2, true)} to ${formatSignificant(d.upper, 2, true)} ${unit})`;
  return `${label} ${dir} by ${v} ${unit}${range}: ${d.statement}.`;
}

/**
 * Shift of one constituent's mixing behaviour between a reference survey and a later survey:
 * reaction-zone bounds and mid-estuarine maximum in salinity and in km from the mouth, the change
 * in effective river end-member C*₀, in % change (percentage points) and in fluxes, each as
 * later − reference with an approximate 95 % interval ({@link differenceOfEstimates}), and
 * whether the behaviour class changed. Positive km shifts are landward (km grows from the mouth).
 *
 * @param ref reference survey side (name, station profile, analysis)
 * @param later later survey side, same constituent
 * @returns the shift with plain statements; a warning instead of numbers when the units differ
 * @throws RangeError when the constituent names differ
 * @see bibliography key boyle1974 (C*₀ and fluxes).
 */
export function constituentShift(ref: ShiftSide, later: ShiftSide): ConstituentShift {
  const a = ref.analysis;
  const b = later.analysis;
  if (a.name !== b.name)
    throw new RangeError(`constituentShift: constituent names differ ("${a.name}" vs "${b.name}")`);
  const warnings: MixingWarning[] = [];
  const out: ConstituentShift = {
    name: a.name,
    unit: b.unit,
    referenceSurvey: ref.survey,
    survey: later.survey,
    classReference: a.class,
    classSurvey: b.class,
    classChanged: a.class !== b.class,
    statements: [],
    warnings,
  };
  if (a.class !== b.class)
    out.statements.push(`${a.name} changed class from ${a.class} (${ref.survey}) to ${b.class} (${later.survey}).`);
  if (a.unit !== b.unit) {
    warnings.push({
      code: "unit-mismatch",
      message: `${a.name} is in ${a.unit} in ${ref.survey} but ${b.unit} in ${later.survey}: concentrations not compared.`,
    });
    return out;
  }
  if (a.reactionZone && b.reactionZone) {
    const za = a.reactionZone;
    const zb = b.reactionZone;
    const ka = zoneKm(ref);
    const kb = zoneKm(later);
    const kmSeaward = diff(ka.seaward, kb.seaward);
    const kmLandward = diff(ka.landward, kb.landward);
    out.zone = {
      kind: za.kind === zb.kind ? za.kind : "changed",
      salinityFrom: diff(
        za.salinityLower ?? point(za.salinity[0], "salinity"),
        zb.salinityLower ?? point(zb.salinity[0], "salinity"),
      )!,
      salinityTo: diff(
        za.salinityUpper ?? point(za.salinity[1], "salinity"),
        zb.salinityUpper ?? point(zb.salinity[1], "salinity"),
      )!,
      ...(kmSeaward ? { kmSeaward } : {}),
      ...(kmLandward ? { kmLandward } : {}),
    };
    for (const s of [
      sentence(`${a.name} reaction zone, seaward end, moved`, kmSeaward, "km", ["landward", "seaward"]),
      sentence(`${a.name} reaction zone, landward end, moved`, kmLandward, "km", ["landward", "seaward"]),
      sentence(`${a.name} reaction zone, seaward end salinity, went`, out.zone.salinityTo, "(salinity)"),
    ])
      if (s) out.statements.push(s);
  }
  if (a.maximum && b.maximum) {
    const kmA = kmEstimateOfSalinity(
      ref.profile,
      a.maximum.salinity,
      a.maximum.km.length ? maxOf(a.maximum.km) : undefined,
    );
    const kmB = kmEstimateOfSalinity(
      later.profile,
      b.maximum.salinity,
      b.maximum.km.length ? maxOf(b.maximum.km) : undefined,
    );
    const km = diff(kmA, kmB);
    out.maximum = {
      salinity: diff(a.maximum.salinity, b.maximum.salinity)!,
      ...(km ? { km } : {}),
      excess: diff(a.maximum.excess, b.maximum.excess)!,
    };
    for (const s of [
      sentence(`${a.name} maximum moved`, km, "km", ["landward", "seaward"]),
      sentence(`${a.name} maximum salinity went`, out.maximum.salinity, "(salinity)"),
    ])
      if (s) out.statements.push(s);
  }
  const cStar = diff(a.effectiveEndmember, b.effectiveEndmember);
  const pct = diff(a.percentChange, b.percentChange, "percentage points");
  const net = diff(a.flux?.netChange, b.flux?.netChange);
  const exp = diff(a.flux?.effectiveExport, b.flux?.effectiveExport);
  if (cStar) out.effectiveEndmember = cStar;
  if (pct) out.percentChange = pct;
  if (net) out.netFlux = net;
  if (exp) out.effectiveExport = exp;
  for (const s of [
    sentence(`${a.name} C*₀ went`, cStar, a.unit),
    sentence(`${a.name} % change went`, pct, "percentage points"),
  ])
    if (s) out.statements.push(s);
  return out;
}
