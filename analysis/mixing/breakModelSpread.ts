import { seawardLine, twoPhaseValue, type TwoPhaseFit } from "./twoPhase.ts";
import { riverByQuarticExtension } from "./riverExtension.ts";
import { breakProfile, type BreakProfile } from "./breakGrid.ts";

/**
 * Between-break spread of the effective river end-member C*₀ and of the % change: the two-phase model
 * is refitted at each candidate break b of a grid from the 3rd distinct station to S_max (as the break
 * search's grid); C*₀(b) is its seaward line at the reference salinity and % change(b) =
 * 100·(C*₀(b) − C₀(b))/C₀(b), with C₀(b) from the same landward model as the reported C₀ (quartic
 * extension or cubic phase at break b; a fixed value for a river override or the freshest stations'
 * mean). Each break is weighted by its profile-likelihood (Akaike) weight
 * w_b = exp(−(RSS_b − RSS_min)/(2s²)), s² = max(1, χ²_ν) of the fit, and the spread is the weighted
 * standard deviation √(Σ w_b·(θ_b − θ̄)²/Σ w_b) about the model average θ̄. Added in quadrature to the
 * bootstrap spread it is the between-model part of Buckland et al.'s (1997) unconditional variance:
 * where the curvature fades gradually the data's profile is flat over many breaks, while replicates
 * drawn around the fitted curve (whose curvature stops at its break) place the break more surely than
 * the data do. C₀(b) and C*₀(b) move together with b, so the % change gets its own spread rather than
 * one propagated from C*₀ alone. It also returns the model-averaged C₀, Σ w_b·C₀(b)/Σ w_b (Buckland et
 * al. 1997), which the analysis reports as C₀ when it comes from the quartic extension: C₀ is an
 * extrapolation whose landward model ends at the break, so a break the data do not locate moves it
 * (calibration, desorption ending at S 5, 20 km-even stations, 5 % noise, 400 surveys: C₀ at the best
 * break +2.7 % biased with an RMSE of 13.8 % of C₀, model-averaged +1.3 % and 8.1 %).
 *
 * @param x ascending salinities; y concentrations; w weights 1/σ²
 * @param fit the two-phase fit (not the straight line)
 * @param sRef reference salinity of C*₀ and C₀
 * @param river how C₀ was obtained ("quartic", "cubic", or its fixed value); omitted: no % change spread
 * @param profile the refits at the candidate breaks ({@link breakProfile}), when already computed
 * @returns spreads of C*₀ (concentration units) and % change (percentage points), and the model-averaged
 *   C₀ (`river`, when `river` is "quartic" or "cubic"), or undefined for the straight line or when no
 *   break can be refitted
 * @see Buckland, S.T., Burnham, K.P. & Augustin, N.H. (1997) Model selection: an integral part of
 *   inference. Biometrics 53, 603–618 (model averaging, unconditional variance; from memory); Hudson, D.J.
 *   (1966) JASA 61, 1097–1129 (segmented regression at a given join point).
 */
export function breakModelSpread(
  x: ArrayLike<number>,
  y: ArrayLike<number>,
  w: ArrayLike<number>,
  fit: TwoPhaseFit,
  sRef: number,
  river?: "quartic" | "cubic" | number,
  profile: BreakProfile | undefined = breakProfile(x, y, w),
): { effective: number; percent?: number; river?: number } | undefined {
  if (fit.linear) return undefined;
  if (!profile) return undefined;
  const dof = Math.max(1, x.length - fit.params);
  const s2 = Math.max(1, fit.rss / dof);
  // Weighted first and second moments of C*₀(b) and % change(b) (spread about the model average θ̄).
  let sw = 0,
    se1 = 0,
    se2 = 0,
    sp1 = 0,
    sp2 = 0,
    sc = 0;
  for (const f of profile.fits) {
    if (!f) continue;
    const e = Math.max(0, f.rss - fit.rss) / (2 * s2);
    if (!(e < 36)) continue;
    const [ic, sl] = seawardLine(f);
    const c = ic + sl * sRef;
    let p = 0;
    if (river !== undefined) {
      const r = river;
      const c0 =
        typeof r === "number"
          ? r
          : ((r === "quartic" ? riverByQuarticExtension(x, y, w, f, sRef) : undefined) ?? twoPhaseValue(f, sRef));
      p = (100 * (c - c0)) / c0;
      if (!Number.isFinite(p)) continue;
      if (typeof r !== "number") sc += Math.exp(-e) * c0;
    }
    const wb = Math.exp(-e);
    sw += wb;
    se1 += wb * c;
    se2 += wb * c * c;
    sp1 += wb * p;
    sp2 += wb * p * p;
  }
  if (!(sw > 0)) return undefined;
  const sd = (m1: number, m2: number): number => Math.sqrt(Math.max(0, m2 / sw - (m1 / sw) ** 2));
  return {
    effective: sd(se1, se2),
    ...(river !== undefined ? { percent: sd(sp1, sp2) } : {}),
    ...(river === "quartic" || river === "cubic" ? { river: sc / sw } : {}),
  };
}
