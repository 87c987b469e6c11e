/**
 * A quantity of the archive against river discharge: straight line on log₁₀ Q with 95 % intervals,
 * plus Spearman and Kendall rank correlations, and a plain statement when the slope's interval
 * excludes zero.
 */
import { formatSignificant } from "../output/formatNumber.ts";
import { fitLine, lineBandAt } from "./linearFit.ts";
import { kendallTauB, spearmanRank } from "./rankCorrelation.ts";
import type { DischargeRelation } from "./types.ts";

/** Words for p-values: "p = 0.003", "p < 0.001". */
export function pWords(p: number): string {
  return p < 0.001 ? "p < 0.001" : `p = ${formatSignificant(p, 2)}`;
}

/**
 * Relates a quantity y to river discharge Q over surveys: least-squares line y = a + b·log₁₀ Q
 * (b = change per tenfold discharge, with its 95 % t interval and the fitted band at 20 points
 * across the discharge range), Spearman's ρ and Kendall's τ-b with p-values. Discharge enters on
 * a log scale because it spans orders of magnitude and its effects scale as powers of Q
 * (bibliography keys hansenRattray1965, monismith2002). A finding is stated only when the slope's interval excludes zero.
 *
 * @param points per survey: discharge (> 0 m³/s) and the quantity
 * @param quantity plain name for the statement, e.g. "silicate (Si) % change"
 * @param unit unit of the quantity, e.g. "%" or "km"
 * @returns the relation (n < 3 or a single discharge: no fit, statement says so)
 * @throws RangeError for a non-positive discharge or a non-finite value
 * @see Draper & Smith (1998) §1.4; Spearman (1904); Kendall (1938).
 */
export function dischargeRelation(
  points: ReadonlyArray<{ dischargeM3s: number; value: number }>,
  quantity: string,
  unit: string,
): DischargeRelation {
  points.forEach((p, i) => {
    if (!(p.dischargeM3s > 0) || !Number.isFinite(p.dischargeM3s))
      throw new RangeError(`dischargeRelation: points[${i}].dischargeM3s must be > 0, got ${p.dischargeM3s}`);
    if (!Number.isFinite(p.value))
      throw new RangeError(`dischargeRelation: points[${i}].value must be finite, got ${p.value}`);
  });
  const qs = points.map((p) => p.dischargeM3s);
  const x = qs.map(Math.log10);
  const y = points.map((p) => p.value);
  const range: [number, number] = qs.length ? [Math.min(...qs), Math.max(...qs)] : [0, 0];
  const fit = fitLine(x, y);
  const spearman = spearmanRank(x, y);
  const kendall = kendallTauB(x, y);
  const band = fit
    ? Array.from({ length: 20 }, (_, i) => {
        const lx = Math.log10(range[0]) + (i / 19) * (Math.log10(range[1]) - Math.log10(range[0]));
        return { dischargeM3s: 10 ** lx, ...lineBandAt(fit, lx) };
      })
    : [];
  const exceeds = fit !== undefined && (fit.slopeLower > 0 || fit.slopeUpper < 0);
  const u = unit === "%" ? "percentage points" : unit;
  let statement: string;
  if (!fit)
    statement = `${quantity}: fewer than 3 surveys with distinct river discharges (${points.length} given), no relation to discharge estimated.`;
  else {
    const dir = fit.slope >= 0 ? "rises" : "falls";
    const rank = spearman
      ? `; Spearman ρ = ${formatSignificant(spearman.statistic, 2)} (${pWords(spearman.pValue)})`
      : "";
    statement =
      `${quantity} ${exceeds ? dir : "shows no clear trend"} with river discharge: ` +
      `${formatSignificant(fit.slope, 2, true)} ${u} per tenfold discharge (95 % interval ` +
      `${formatSignificant(fit.slopeLower, 2, true)} to ${formatSignificant(fit.slopeUpper, 2, true)} ${u}), ` +
      `${exceeds ? "larger than the uncertainty" : "within the uncertainty (cannot be distinguished from no change)"}` +
      `${rank}; ${fit.n} surveys, ${formatSignificant(range[0], 3)}–${formatSignificant(range[1], 3)} m³/s.`;
  }
  return {
    quantity,
    unit,
    predictor: "log10 discharge",
    n: points.length,
    dischargeRangeM3s: range,
    ...(fit ? { fit } : {}),
    band,
    ...(spearman ? { spearman } : {}),
    ...(kendall ? { kendall } : {}),
    exceedsUncertainty: exceeds,
    statement,
  };
}
