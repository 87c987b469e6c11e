import type { Endmember, MixingWarning } from "./result.ts";
import type { PreparedSample } from "./prepareSamples.ts";
import { twoPhaseAt, type TwoPhaseFit } from "./twoPhase.ts";
import { riverByQuarticExtension } from "./riverExtension.ts";

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
