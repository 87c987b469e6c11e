import type {
  BehaviourClass,
  ConstituentAnalysis,
  DilutionLine,
  Endmember,
  FitCurve,
  MixingWarning,
  TangentLine,
} from "./result.ts";
import type { AnalyzeOptions, Precision } from "./options.ts";
import type { PreparedSample } from "./prepareSamples.ts";
import type { CurveFitResult } from "./curveFit.ts";
import { salinityGrid, TIE_FRACTION } from "./curveFit.ts";
import { evaluateSplineGrid } from "../stats/naturalSpline.ts";
import { runBootstrap } from "./bootstrapRun.ts";
import { interiorMaximum, zoneFromCurve } from "./zoneAndMaximum.ts";
import { classify } from "./classify.ts";
import { dilutionAt } from "./dilutionLine.ts";
import { fluxSummary } from "./flux.ts";
import { rateProfile } from "./rateProfile.ts";
import { estimateOf } from "./estimate.ts";

/** Inputs of {@link analyzeShape}: the full-data pieces computed by analyzeConstituent. */
export interface ShapeInput {
  used: PreparedSample[];
  options: AnalyzeOptions;
  precision: Precision;
  river: Endmember;
  sea: Endmember;
  line: DilutionLine;
  curve: CurveFitResult;
  tangent: TangentLine;
  nonConservative: boolean;
  quadCoef: number;
  warnings: MixingWarning[];
}

/** Grid points of the bootstrap replicate curves (band, zone and maximum intervals). */
export const BOOTSTRAP_GRID_POINTS = 41;

/** Linear interpolation of ys given on ascending xs at x. */
function interpolate(xs: Float64Array, ys: number[], x: number): number {
  let i = 0;
  while (i < xs.length - 2 && x > xs[i + 1]!) i++;
  const t = (x - xs[i]!) / (xs[i + 1]! - xs[i]!);
  return ys[i]! + t * (ys[i + 1]! - ys[i]!);
}

/** Fewest stations inside a reaction zone before a warning. */
export const MIN_ZONE_STATIONS = 3;

/**
 * Second half of analyzeConstituent: curve on a grid, C*₀ and % change, bootstrap
 * intervals, class, reaction zone, maximum, fluxes and rate profile.
 *
 * @param p full-data pieces
 * @returns the shape-dependent parts of {@link ConstituentAnalysis}
 */
export function analyzeShape(p: ShapeInput): {
  cls: BehaviourClass;
  fit: FitCurve;
  effective: ConstituentAnalysis["effectiveEndmember"];
  percent?: ConstituentAnalysis["percentChange"];
  flux?: ConstituentAnalysis["flux"];
  zone?: ConstituentAnalysis["reactionZone"];
  maximum?: ConstituentAnalysis["maximum"];
  rate?: ConstituentAnalysis["rateProfile"];
  bootstrap: NonNullable<ConstituentAnalysis["bootstrap"]>;
  warnings: MixingWarning[];
} {
  const { used, options: o, river, sea, line, curve, tangent } = p;
  const warnings: MixingWarning[] = [];
  const unit = o.unit;
  const n = used.length;
  const sMin = used[0]!.salinity;
  const sMax = used[n - 1]!.salinity;
  const G = o.gridPoints ?? 81;
  const grid = salinityGrid(sMin, sMax, G);
  const f = new Float64Array(G);
  const d1 = new Float64Array(G);
  const d2 = new Float64Array(G);
  evaluateSplineGrid(curve.spline, grid, f, d1, d2);
  const sr = river.salinity;
  const cStar = tangent.intercept + tangent.slope * sr;
  const draws = o.bootstrapDraws ?? 2000;
  const bGrid = salinityGrid(sMin, sMax, Math.min(G, BOOTSTRAP_GRID_POINTS));
  const seed = o.seed ?? 1;
  const x = Float64Array.from(used, (s) => s.salinity);
  const bs = runBootstrap({
    x,
    y: Float64Array.from(used, (s) => s.conc),
    w: Float64Array.from(used, (s) => 1 / s.sigma ** 2),
    wTangent: Float64Array.from(used, (s) => 1 / (s.sigma * curve.scatterFactor) ** 2),
    lambda: curve.lambda,
    tieTol: TIE_FRACTION * (sMax - sMin),
    grid: bGrid,
    tangent,
    river: { salinity: sr, conc: river.conc, sd: river.concSd },
    sea: { salinity: sea.salinity, conc: sea.conc, sd: sea.concSd },
    draws,
    seed,
  });
  if (draws > 0 && bs.usable < 0.9 * draws)
    warnings.push({
      code: "bootstrap-degenerate",
      message: `Only ${bs.usable} of ${draws} bootstrap draws were usable; intervals are rough.`,
    });
  const effective = estimateOf(cStar, bs.effective, unit);
  let percent: ConstituentAnalysis["percentChange"];
  if (river.conc > 0) percent = estimateOf((100 * (cStar - river.conc)) / river.conc, bs.percent, "%");
  else
    warnings.push({
      code: "river-nonpositive",
      message: `River end-member ${river.conc} ${unit} is not positive: no % change.`,
    });
  const im = interiorMaximum(grid, f);
  const cls = classify(p.nonConservative, cStar - river.conc, p.quadCoef, tangent, sMin, sMax, im >= 0, n);
  const toKm = (a: number, b: number): Array<[number, number]> => o.salinityToKm?.(a, b) ?? [];
  let zone: ConstituentAnalysis["reactionZone"];
  const z =
    cls === "conservative"
      ? undefined
      : zoneFromCurve(grid, d2, sr, undefined, tangent.method === "segment" ? tangent.fromSalinity : undefined);
  if (z) {
    zone = {
      salinity: [z.from, z.to],
      km: toKm(z.from, z.to),
      kind: z.kind,
      salinityLower: estimateOf(z.from, bs.zoneLower, "salinity"),
      salinityUpper: estimateOf(z.to, bs.zoneUpper, "salinity"),
    };
    const inZone = used.filter((s) => s.salinity >= z.from && s.salinity <= z.to).length;
    if (inZone < MIN_ZONE_STATIONS)
      warnings.push({
        code: "few-stations-in-zone",
        message: `Only ${inZone} station(s) lie inside the reaction zone S = ${z.from.toFixed(1)}–${z.to.toFixed(1)}; its position and the rate are poorly resolved. Sample the low-salinity region more densely.`,
      });
  }
  let maximum: ConstituentAnalysis["maximum"];
  const q = o.riverDischargeM3s;
  const fl =
    q !== undefined && percent !== undefined
      ? fluxSummary(q, unit, estimateOf(river.conc, bs.riverConc, unit), effective, bs.netDelta, sr, o.densityKgM3)
      : undefined;
  if (fl) warnings.push(...fl.warnings);
  if (im >= 0 && (cls === "addition" || cls === "maximum-then-conservative")) {
    const s = grid[im]!;
    maximum = {
      salinity: estimateOf(s, bs.maxSalinity, "salinity"),
      km: o.salinityToKmPoint?.(s) ?? [],
      excess: estimateOf(f[im]! - dilutionAt(line, s), bs.maxExcess, unit),
      conservativeBeyondSalinity: tangent.method === "segment" ? tangent.fromSalinity : undefined,
      addedFlux: fl?.flux?.netChange,
    };
  }
  const cStarLocal = new Float64Array(G);
  for (let i = 0; i < G; i++) cStarLocal[i] = f[i]! - (grid[i]! - sr) * d1[i]!;
  const rp = rateProfile(grid, d2, cStarLocal, sr, o, cStar);
  warnings.push(...rp.warnings);
  const band = (arr: number[]): number[] =>
    Array.from(grid, (s, i) => {
      const v = interpolate(bGrid, arr, s);
      return Number.isFinite(v) ? v : f[i]!;
    });
  return {
    cls,
    fit: {
      method: curve.method,
      salinity: Array.from(grid),
      conc: Array.from(f),
      lower: band(bs.bandLower),
      upper: band(bs.bandUpper),
      derivative: Array.from(d1),
      secondDerivative: Array.from(d2),
      lambda: curve.lambda,
      edf: curve.edf,
    },
    effective,
    percent,
    flux: fl?.flux,
    zone,
    maximum,
    rate: rp.profile,
    bootstrap: { draws, usable: bs.usable, seed },
    warnings,
  };
}
