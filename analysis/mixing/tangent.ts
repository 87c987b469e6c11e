import type { TangentLine } from "./result.ts";
import type { PreparedSample } from "./prepareSamples.ts";
import { fitTwoPhase, seawardLine, type TwoPhaseFit } from "./twoPhase.ts";

/**
 * Seaward tangent line and effective river end-member model: a continuous two-phase
 * regression (straight seaward phase joined smoothly to a curved landward phase) with the break
 * chosen by profile likelihood ({@link fitTwoPhase}); the straight line through all stations when
 * the two-phase model is not significantly better (F-test, α = 0.05).
 *
 * method "segment": the seaward line through the stations with S ≥ S_b ([fromSalinity,
 * toSalinity] = [S_b, S_max], S_b = S_min for a straight line); "curve-tangent": the break sits at
 * the seaward-most station (the reaction reaches the mouth) and the line is the tangent of the
 * fitted curve there — always at the design's seaward end, never at a replicate's.
 *
 * @param used prepared samples sorted by salinity
 * @returns the tangent line and the fit (undefined when no line can be fitted)
 * @see Boyle et al. (1974) GCA 38, 1719–1728; Hudson (1966) JASA 61, 1097–1129; bibliography key boyle1974.
 */
export function seawardTangent(
  used: readonly PreparedSample[],
): { tangent: TangentLine; fit: TwoPhaseFit } | undefined {
  const n = used.length;
  // Typed arrays, as in the bootstrap (one array kind keeps V8's compiled fitting code).
  const x = Float64Array.from(used, (s) => s.salinity);
  const fit = fitTwoPhase(
    x,
    Float64Array.from(used, (s) => s.conc),
    Float64Array.from(used, (s) => 1 / (s.sigma * s.sigma)),
  );
  if (!fit) return undefined;
  const [intercept, slope] = seawardLine(fit);
  const sMax = x[n - 1]!;
  const seaward = x.filter((s) => s >= fit.breakSalinity).length;
  const toMouth = !fit.linear && seaward < 2;
  // The segment is the stations at or seaward of the (continuous) break.
  const from = toMouth ? sMax : (x.find((s) => s >= fit.breakSalinity) ?? sMax);
  return {
    tangent: {
      slope,
      intercept,
      fromSalinity: from,
      toSalinity: sMax,
      salinityRange: [from, sMax],
      method: toMouth ? "curve-tangent" : "segment",
      nStations: toMouth ? 1 : seaward,
    },
    fit,
  };
}
