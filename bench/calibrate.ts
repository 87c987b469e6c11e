// `npm run calibrate`: seeded calibration study of the mixing engine against synthetic surveys
// (bench/calibration/forwardModel.ts). Prints one table; goals from issue 14 beside it.
// Options: --surveys N (default 100), --draws D (default 200), --full (every design × 1, 2, 5 % noise),
// --shape TEXT (only shapes whose name contains TEXT), --stations N[,N…], --spacing km|salinity, --noise PCT
// (only designs with those numbers of stations, spacing or % noise; the seeds of a cell do not change, and
// the first N surveys of a cell are the same whatever --surveys is), --weak (also the weak reactions of
// WEAK_SHAPES, which the straight-line test often misses; their rows are not goals of issue 14).
// Coverage carries its Monte Carlo error (Wilson 95 % interval over the surveys scored; Morris et al. 2019).
import { SHAPES, WEAK_SHAPES, type SurveyDesign } from "./calibration/forwardModel.ts";
import { scoreCell, type CellScore } from "./calibration/cell.ts";
import { bandVerdict, wilson95 } from "./calibration/coverageError.ts";

const args = process.argv.slice(2);
/** The value after `--name`, or undefined when the option is absent. */
const strOpt = (name: string): string | undefined => {
  const i = args.indexOf(`--${name}`);
  return i >= 0 ? args[i + 1] : undefined;
};
const opt = (name: string, dflt: number): number => {
  const v = strOpt(name);
  return v === undefined ? dflt : Number(v);
};
const surveys = opt("surveys", 100);
const draws = opt("draws", 200);
const full = args.includes("--full");
const shapes = args.includes("--weak") ? [...SHAPES, ...WEAK_SHAPES] : SHAPES;
const only = strOpt("shape") ?? "";
const onlyStations = strOpt("stations");
const onlySpacing = strOpt("spacing");
const onlyNoise = strOpt("noise");
const wanted = (d: SurveyDesign): boolean =>
  (onlyStations === undefined || onlyStations.split(",").map(Number).includes(d.stations)) &&
  (onlySpacing === undefined || d.spacing === onlySpacing) &&
  (onlyNoise === undefined || Math.abs(d.noise * 100 - Number(onlyNoise)) < 1e-9);

const designs: SurveyDesign[] = [];
for (const noise of full ? [0.01, 0.02, 0.05] : [0.02])
  for (const stations of [12, 20, 35])
    for (const spacing of ["km", "salinity"] as const) designs.push({ stations, spacing, noise });
if (!full) designs.push({ stations: 20, spacing: "km", noise: 0.01 }, { stations: 20, spacing: "km", noise: 0.05 });

const f = (x: number | undefined, d = 1): string => (x === undefined ? "–" : Number.isFinite(x) ? x.toFixed(d) : "∞");
const pc = (x: number | undefined): string => (x === undefined ? "–" : `${Math.round(100 * x)}`);
/** Wilson 95 % interval of a coverage over n surveys, in %. */
const ci = (p: number, n: number): string => {
  const [a, b] = wilson95(p, n);
  return n > 0 ? `${Math.round(100 * a)}–${Math.round(100 * b)}` : "–";
};
const rows: string[][] = [];
/** Goals of issue 14 this row misses (empty: all met; "–": none applies). */
function missed(s: CellScore, d: SurveyDesign, reaction: boolean): string {
  const out: string[] = [];
  // A coverage outside 90–98 % is a miss; "(MC)" when its Wilson 95 % interval still reaches the band
  // (not a miss beyond the Monte Carlo error of this many surveys), "(sig)" when it does not.
  const cov = (p: number, label: string): void => {
    const v = bandVerdict(p, s.scored, 0.9, 0.98);
    if (v !== "in") out.push(`${label} (${v === "sig" ? "sig" : "MC"})`);
  };
  let applies = false;
  if (d.stations >= 20) {
    applies = true;
    cov(s.effectiveCoverage, "cov C*0");
    // Conservative: the kept line gives % change 0 = the truth by construction, so its coverage is 100 %.
    if (reaction) cov(s.percentCoverage, "cov %chg");
  }
  if (reaction) {
    applies = true;
    // "bias (warned)": ≥ 95 % of the surveys carry a warning that C₀ or C*₀ may be biased, or those
    // without one are within 2 pp (as "class (warned)": right or warned in ≥ 95 %).
    if (Math.abs(s.percentBiasPp) > 2)
      out.push(s.biasWarned >= 0.95 || Math.abs(s.percentBiasUnwarnedPp ?? 0) <= 2 ? "bias (warned)" : "bias");
    if (s.classAccuracy < 0.95) out.push(s.classOrWarned >= 0.95 ? "class (warned)" : "class");
    if (s.breakWithin2 !== undefined && s.breakWithin2 < 0.8)
      out.push((s.breakWithin2OrWarned ?? 0) >= 0.8 ? "break (warned)" : "break");
  }
  if (s.outsideOwnInterval > 0) out.push("own interval");
  return !applies && out.length === 0 ? "–" : out.length === 0 ? "ok" : out.join(", ");
}
const t0 = performance.now();
for (const shape of shapes) {
  if (only && !shape.name.includes(only)) continue;
  for (const d of designs) {
    if (!wanted(d)) continue;
    const s: CellScore = scoreCell(shape, d, surveys, draws);
    rows.push([
      s.shape,
      String(d.stations),
      d.spacing,
      `${d.noise * 100}`,
      f(s.referenceSalinity, 2),
      f(s.effectiveBiasPct),
      f(s.effectiveRmsePct),
      f(s.effectiveHalfWidthPct),
      f(s.percentBiasPp),
      f(s.percentBiasUnwarnedPp),
      pc(s.biasWarned),
      f(s.percentRmsePp),
      f(s.percentHalfWidthPp),
      pc(s.effectiveCoverage),
      ci(s.effectiveCoverage, s.scored),
      pc(s.percentCoverage),
      ci(s.percentCoverage, s.scored),
      String(s.outsideOwnInterval),
      pc(s.classAccuracy),
      pc(s.directionAccuracy),
      pc(s.breakWithin2),
      pc(s.breakWithin2OrWarned),
      f(s.breakMedianError),
      pc(s.breakCoverage),
      f(s.maximumMedianError),
      pc(s.maximumCoverage),
      String(s.failures),
      WEAK_SHAPES.includes(shape) ? `not a goal (${missed(s, d, true)})` : missed(s, d, shape.percent !== 0),
    ]);
  }
  process.stderr.write(`calibrate: ${shape.name} done (${((performance.now() - t0) / 1000).toFixed(0)} s)\n`);
}
// Exact data: rate integral and C*₀ error with no noise (35 stations, km-even).
const exact: string[][] = [];
for (const shape of SHAPES) {
  if (only && !shape.name.includes(only)) continue;
  if (shape.percent === 0) continue;
  const s = scoreCell(shape, { stations: 35, spacing: "km", noise: 0 }, 1, 0, 1, true);
  exact.push([
    shape.name,
    f(s.effectiveBiasPct, 2),
    f(s.percentBiasPp, 2),
    f(100 * (s.rateIntegralError ?? Number.NaN), 1),
    f(s.breakMedianError, 2),
    f(s.maximumMedianError, 2),
  ]);
}

const table = (header: string[], body: string[][]): void => {
  const w = header.map((h, i) => Math.max(h.length, ...body.map((r) => r[i]!.length)));
  const line = (c: string[]): string => `| ${c.map((x, i) => x.padEnd(w[i]!)).join(" | ")} |`;
  console.log(line(header));
  console.log(`|${w.map((x) => "-".repeat(x + 2)).join("|")}|`);
  for (const r of body) console.log(line(r));
};
console.log(`Mixing calibration: ${surveys} surveys per cell, ${draws} bootstrap draws, seeded.\n`);
table(
  [
    "shape",
    "n",
    "spacing",
    "noise %",
    "S_ref",
    "C*0 bias %",
    "C*0 RMSE %",
    "C*0 ½width %",
    "%chg bias pp",
    "bias unwarned pp",
    "bias warned %",
    "%chg RMSE pp",
    "%chg ½width pp",
    "cov C*0 %",
    "C*0 cov CI",
    "cov %chg %",
    "%chg cov CI",
    "outside own",
    "class %",
    "direction %",
    "break ±2 %",
    "±2 or warned %",
    "break med err",
    "break cov %",
    "max med err",
    "max cov %",
    "failed",
    "goals missed",
  ],
  rows,
);
console.log("\nExact data (35 stations, km-even, no noise; Q = 100 m³/s, A = 5000 m²):\n");
table(["shape", "C*0 err %", "%chg err pp", "∫A·R dx err %", "break err", "max err"], exact);
console.log(
  `\nGoals (issue 14): 95 % coverage 90–98 % for n ≥ 20; |bias of % change| ≤ 2 pp and class accuracy ≥ 95 % for reactions ending at S ≥ 5; break within ±2 in ≥ 80 % of surveys; rate integral within 5 % on exact data. "½width": mean half-width of the 95 % interval (≈ 1.96 × RMSE when the interval is calibrated and the bias small). "cov … CI": Wilson 95 % interval of the coverage over the surveys scored (its Monte Carlo error; Morris et al. 2019). "goals missed" names this row's misses; a coverage miss says "(sig)" when its whole Wilson interval lies outside 90–98 %, "(MC)" when the interval reaches the band (the miss is within the Monte Carlo error of this many surveys); "bias (warned)": |bias| > 2 pp over all surveys, but ≥ 95 % of the surveys carry a warning that C₀ or C*₀ may be biased (river-extrapolation-coarse, reaction-reaches-mouth, short-seaward-line, seaward-line-untested; "bias warned %") or the surveys without one are within 2 pp ("bias unwarned pp"); "class (warned)": the class is wrong in over 5 % of surveys, but in ≥ 95 % it is right or a warning says the stations cannot establish it (short-seaward-line, seaward-line-untested, reaction-reaches-mouth, few-stations-in-zone); "break (warned)": the break is off by more than 2 in over 20 % of surveys, but in ≥ 80 % it is within ±2 or the tool warns (break-uncertain) that it is not located that well. "failed": surveys without C*0 or % change (the tool says "not determined").\nTruth: % change against the river value at S = 0. ${((performance.now() - t0) / 1000).toFixed(0)} s on Node ${process.version}.`,
);
