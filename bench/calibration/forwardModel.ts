// Seeded synthetic estuary surveys for the mixing calibration suite. Its own forward model:
// it shares no code with the analysis (analysis/) nor with the demo-data generator (data-demo/).
import { randomLcg, randomNormal } from "d3-random";

/** Salinity of the sea end (x = 0, the mouth) of the synthetic channel. */
export const SEA_SALINITY = 33;
/** e-folding length L of S(x) = 33·exp(−x/L) [km]. */
export const LENGTH_KM = 10;

/**
 * Curvature taper: C''(S) ∝ (1 − S/S_b)^p landward of S_b, 0 beyond (the reaction fades out at S_b).
 * p = 1.5 is deliberately not an integer, so no polynomial hinge model in the analysis contains the
 * forward model exactly.
 */
export const TAPER_POWER = 1.5;

/**
 * A reaction shape: the seaward line C*₀ + b₁·S plus A·(1 − S/S_b)^(p+2) landward of S_b, so
 * C'' ∝ (1 − S/S_b)^p, and the tangent-method C*₀ = C₀ − A exactly (A from the wanted % change).
 */
export interface Shape {
  name: string;
  /** Salinity where the reaction ends (beyond 33: reaction continues to the mouth). */
  breakSalinity: number;
  /** True % change 100·(C*₀ − C₀)/C₀ of the tangent at S_b (negative = removal). */
  percent: number;
  /** True river concentration at S = 0 and sea concentration at S = 33. */
  riverConc: number;
  seaConc: number;
  /** Class the analysis should give. */
  expectedClass: string;
}

export const SHAPES: Shape[] = [
  {
    name: "removal→S5",
    breakSalinity: 5,
    percent: -40,
    riverConc: 100,
    seaConc: 10,
    expectedClass: "removal-then-conservative",
  },
  {
    name: "removal→S12",
    breakSalinity: 12,
    percent: -40,
    riverConc: 100,
    seaConc: 10,
    expectedClass: "removal-then-conservative",
  },
  {
    name: "removal→S20",
    breakSalinity: 20,
    percent: -40,
    riverConc: 100,
    seaConc: 10,
    expectedClass: "removal-then-conservative",
  },
  {
    name: "desorption→S5",
    breakSalinity: 5,
    percent: 60,
    riverConc: 100,
    seaConc: 40,
    expectedClass: "maximum-then-conservative",
  },
  {
    name: "desorption→S10",
    breakSalinity: 10,
    percent: 60,
    riverConc: 100,
    seaConc: 40,
    expectedClass: "maximum-then-conservative",
  },
  {
    name: "desorption→S15",
    breakSalinity: 15,
    percent: 60,
    riverConc: 100,
    seaConc: 40,
    expectedClass: "maximum-then-conservative",
  },
  { name: "conservative", breakSalinity: 1, percent: 0, riverConc: 50, seaConc: 10, expectedClass: "conservative" },
  { name: "removal→mouth", breakSalinity: 50, percent: -50, riverConc: 100, seaConc: 10, expectedClass: "removal" },
];

/**
 * Weak reactions (3–5 %) that the straight-line test often does not detect (`npm run calibrate -- --weak`
 * adds them): the line kept, C*₀ and % change still have a true value off the line's, so they show what
 * the intervals of a kept line cover when there is a reaction after all. Not in the issue 14 goal table.
 */
export const WEAK_SHAPES: Shape[] = [
  {
    name: "weak removal→S5",
    breakSalinity: 5,
    percent: -5,
    riverConc: 100,
    seaConc: 10,
    expectedClass: "removal-then-conservative",
  },
  {
    name: "weak removal→S20",
    breakSalinity: 20,
    percent: -3,
    riverConc: 100,
    seaConc: 10,
    expectedClass: "removal-then-conservative",
  },
  {
    name: "weak desorption→S10",
    breakSalinity: 10,
    percent: 5,
    riverConc: 100,
    seaConc: 10,
    expectedClass: "addition",
  },
];

/** The analytic curve of a shape: value and derivatives at S, and the true answers. */
export interface Curve {
  conc(s: number): number;
  d1(s: number): number;
  d2(s: number): number;
  /** True C*₀ of the tangent at the seaward end of the reaction (or at S = 33 when it reaches the mouth). */
  effective: number;
  /** True % change against the river value at S = 0. */
  percent: number;
  /** True break salinity (undefined when the reaction reaches the mouth or there is none). */
  breakSalinity?: number;
  /** Salinity of the interior maximum (C′ = 0), when there is one. */
  maximumSalinity?: number;
}

export function curveOf(shape: Shape): Curve {
  const sb = shape.breakSalinity;
  const c0 = shape.riverConc;
  const m = TAPER_POWER + 2;
  // Amplitude A of the hinge term A·h^m: C*₀ at S_b = C₀ − A, so A = −(% change/100)·C₀.
  const amp = shape.percent === 0 ? 0 : -(shape.percent / 100) * c0;
  const hinge = (s: number): number => (s < sb ? 1 - s / sb : 0);
  const cStarB = c0 - amp;
  // Seaward line through the sea value at S = 33 (with the residual hinge term when S_b > 33).
  const b1 = (shape.seaConc - cStarB - amp * hinge(SEA_SALINITY) ** m) / SEA_SALINITY;
  const conc = (s: number): number => cStarB + b1 * s + amp * hinge(s) ** m;
  const d1 = (s: number): number => b1 - ((amp * m) / sb) * hinge(s) ** (m - 1);
  const d2 = (s: number): number => ((amp * m * (m - 1)) / (sb * sb)) * hinge(s) ** (m - 2);
  const se = Math.min(sb, SEA_SALINITY);
  const effective = conc(se) - se * d1(se);
  // Interior maximum: d1 = 0 ⇔ h^(m−1) = b1·S_b/(A·m), for an addition (A < 0) with a falling seaward line.
  let maximumSalinity: number | undefined;
  const ratio = amp !== 0 ? (b1 * sb) / (amp * m) : Number.NaN;
  if (amp < 0 && ratio > 0 && ratio < 1) maximumSalinity = sb * (1 - ratio ** (1 / (m - 1)));
  return {
    conc,
    d1,
    d2,
    effective,
    percent: (100 * (effective - c0)) / c0,
    breakSalinity: amp !== 0 && sb < SEA_SALINITY ? sb : undefined,
    maximumSalinity,
  };
}

export interface SurveyDesign {
  stations: number;
  spacing: "km" | "salinity";
  /** Relative noise (0.02 = 2 %). */
  noise: number;
}

export interface SyntheticStation {
  stationId: string;
  salinity: number;
  km: number;
  conc: number;
}

/**
 * One seeded survey: stations from the mouth (x = 0, S = 33) to the freshest station
 * (S 0.1–0.5, drawn), evenly spaced in km or in salinity, salinity exact, concentration with
 * Gaussian relative noise. Salinity S(x) = 33·exp(−x/L).
 */
export function survey(shape: Shape, design: SurveyDesign, seed: number): SyntheticStation[] {
  const rand = randomLcg(seed);
  const z = randomNormal.source(rand)(0, 1);
  const sFresh = 0.1 + 0.4 * rand();
  const xFresh = LENGTH_KM * Math.log(SEA_SALINITY / sFresh);
  const curve = curveOf(shape);
  const out: SyntheticStation[] = [];
  const n = design.stations;
  for (let i = 0; i < n; i++) {
    const t = i / (n - 1);
    const salinity =
      design.spacing === "km"
        ? SEA_SALINITY * Math.exp(-(t * xFresh) / LENGTH_KM)
        : SEA_SALINITY - t * (SEA_SALINITY - sFresh);
    const km = LENGTH_KM * Math.log(SEA_SALINITY / salinity);
    const c = curve.conc(salinity);
    out.push({ stationId: `st${i}`, salinity, km, conc: c * (1 + design.noise * z()) });
  }
  return out.reverse();
}

/** |dS/dx| [per m] of the synthetic channel at salinity S. */
export function gradientPerM(s: number): number {
  return s / (LENGTH_KM * 1000);
}
