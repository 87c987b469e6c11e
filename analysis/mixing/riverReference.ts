import type { Endmember, MixingWarning } from "./result.ts";
import type { PreparedSample } from "./prepareSamples.ts";
import { twoPhaseAt, type TwoPhaseFit } from "./twoPhase.ts";
import { riverByQuarticExtension } from "./riverExtension.ts";
import { MIN_REACTION_STATIONS } from "./reactionExtent.ts";

/** Farthest extrapolation (salinity units) from the freshest station down to S = 0. */
export const MAX_RIVER_EXTRAPOLATION_S = 2;

/**
 * Reference salinity of the river end-member: the river's stated salinity when given, else S = 0
 * when the freshest station is within {@link MAX_RIVER_EXTRAPOLATION_S} of it, else the freshest
 * station's salinity with a warning (the fresher estuary was not sampled). C₀ and C*₀ are always
 * reported at this salinity so surveys compare (Boyle et al. 1974 define C*₀ at the river end).
 */
export function referenceSalinity(sMin: number, stated?: number): { salinity: number; warning?: MixingWarning } {
  if (stated !== undefined) return { salinity: stated };
  if (sMin <= MAX_RIVER_EXTRAPOLATION_S) return { salinity: 0 };
  return {
    salinity: sMin,
    warning: {
      code: "river-reference",
      message: `The freshest station is at S = ${sMin.toFixed(2)}, too far from the river (S = 0) to extrapolate: C₀ and C*₀ are given at S = ${sMin.toFixed(2)}, not comparable with surveys referenced to S = 0. Enter the river's value and salinity if known.`,
    },
  };
}

/**
 * River end-member at the reference salinity from the fitted two-phase curve (extrapolated from
 * the freshest stations along the curve, not the mean of the freshest group, which would leave out
 * any reaction between the river and those stations; with the landward phase extended by a quartic
 * term when enough stations allow, {@link riverByQuarticExtension}). concSd is provisional here (the group's
 * standard error); the analysis replaces it by the bootstrap standard error.
 *
 * @see Boyle et al. (1974) GCA 38, 1719–1728; bibliography key boyle1974.
 */
export function riverAtReference(
  used: readonly PreparedSample[],
  group: Endmember,
  fit: TwoPhaseFit,
  salinity: number,
): Endmember {
  const conc =
    riverByQuarticExtension(
      used.map((s) => s.salinity),
      used.map((s) => s.conc),
      used.map((s) => 1 / (s.sigma * s.sigma)),
      fit,
      salinity,
    ) ?? twoPhaseAt(fit, salinity)[0];
  const se = group.n >= 2 ? group.concSd / Math.sqrt(group.n) : used[0]!.sigma;
  return {
    ...group,
    salinity,
    conc,
    concSd: se,
    method: `fitted curve at S = ${salinity} from the freshest stations (S ${used[0]!.salinity.toFixed(2)}–)`,
  };
}

/** The freshest group with concSd = the spread of its samples about the fitted curve. */
export function groupScatter(used: readonly PreparedSample[], group: Endmember, fit: TwoPhaseFit): Endmember {
  const ids = new Set(group.stationIds);
  const r = used.filter((s) => ids.has(s.stationId)).map((s) => s.conc - twoPhaseAt(fit, s.salinity)[0]);
  const sd = r.length >= 2 ? Math.sqrt(r.reduce((a, e) => a + e * e, 0) / (r.length - 1)) : group.concSd;
  return { ...group, concSd: sd };
}

/**
 * Warning when the freshest stations lie on a C–S slope: the river value at the reference
 * salinity then differs from their mean by more than twice its standard error.
 */
export function riverSlopeWarning(
  used: readonly PreparedSample[],
  group: Endmember,
  river: Endmember,
  unit: string,
): MixingWarning[] {
  const sigma = used[0]!.sigma / Math.sqrt(Math.max(1, group.n));
  const diff = river.conc - group.conc;
  if (!(Math.abs(diff) > 2 * sigma)) return [];
  const g = (v: number): string => v.toPrecision(3);
  return [
    {
      code: "river-extrapolated",
      message: `The freshest stations (mean S = ${group.salinity.toFixed(2)}) lie on a C–S slope: the river end-member at S = ${river.salinity} was extrapolated along the fitted curve, C₀ = ${g(river.conc)} ${unit} (their mean: ${g(group.conc)} ${unit}). A river sample at S ≈ 0 would remove this extrapolation.`,
    },
  ];
}

/**
 * Warning when C₀ at the reference salinity depends on an assumed curve shape beyond the freshest
 * station by more than its standard error: with the cubic landward phase (too few stations for the
 * quartic extension, or that extension too uncertain), when the extrapolation moves C₀ by more than one
 * standard error from the curve at the freshest station; with the quartic extension, when the cubic
 * landward phase at the same break gives a C₀ more than one standard error away (two landward
 * models disagree); and, whatever the models say, when fewer than {@link MIN_REACTION_STATIONS} distinct
 * stations depart from the seaward line (`reactionStations`, reactionExtent.ts): the reaction
 * is then seen at one or two stations and its shape between them and the river (which sets C₀) is
 * the model's, not the data's. A model error that the bootstrap does not see can then bias C₀ and the
 * % change (calibration with synthetic surveys: desorption ending at S 5 with salinity-even stations,
 * −3 to −7 pp).
 *
 * @param used prepared samples sorted by salinity
 * @param fit the two-phase fit
 * @param river the river end-member at the reference salinity (concSd = its standard error)
 * @param model which landward model gave C₀
 * @param unit concentration unit for the message
 * @param reactionStations distinct stations that show the reaction (off the seaward line), when known
 * @returns the warning, or none
 * @see Hastie, T., Tibshirani, R. & Friedman, J. (2009) The Elements of Statistical Learning, 2nd ed.,
 *   §7.3 (extrapolation error is model error; from memory).
 */
export function coarseExtrapolationWarning(
  used: readonly PreparedSample[],
  fit: TwoPhaseFit,
  river: Endmember,
  model: "quartic" | "cubic" | "local",
  unit: string,
  reactionStations?: number,
): MixingWarning[] {
  const sMin = used[0]!.salinity;
  if (fit.linear || !(river.salinity < sMin)) return [];
  const atFreshest = twoPhaseAt(fit, sMin)[0];
  const other = model !== "cubic" ? twoPhaseAt(fit, river.salinity)[0] : atFreshest;
  const fewSeen = reactionStations !== undefined && reactionStations < MIN_REACTION_STATIONS;
  if (!(Math.abs(river.conc - other) > river.concSd) && !fewSeen) return [];
  const landward = used.filter((s) => s.salinity < fit.breakSalinity).length;
  const g = (v: number): string => v.toPrecision(3);
  const why = fewSeen
    ? `along a reaction curve seen at only ${reactionStations} station(s) off the seaward line`
    : model === "quartic"
      ? `a cubic instead of a quartic reaction curve through the same ${landward} stations below S ${fit.breakSalinity.toFixed(1)} gives ${g(other)} ${unit}`
      : model === "local"
        ? `along a local cubic through the freshest stations; the two-phase curve, whose reaction ends at S ${fit.breakSalinity.toFixed(1)}, gives ${g(other)} ${unit}`
        : `along a reaction curve resting on ${landward} station(s) below S ${fit.breakSalinity.toFixed(1)}`;
  return [
    {
      code: "river-extrapolation-coarse",
      message: `C₀ = ${g(river.conc)} ${unit} at S = ${river.salinity} is extrapolated from the freshest station (S = ${sMin.toFixed(2)}, curve value ${g(atFreshest)} ${unit}) ${model !== "cubic" && !fewSeen ? `(${why})` : why}: the shape of the reaction between the river and those stations is assumed, so C₀ and the % change may be biased by more than their intervals show (a few percentage points in calibration with synthetic surveys). A river sample at S ≈ 0, or more stations at low salinity, would remove this.`,
    },
  ];
}
