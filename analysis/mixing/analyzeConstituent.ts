import type { ConstituentAnalysis, MixingWarning } from "./result.ts";
import type { AnalyzeOptions, MixingSample } from "./options.ts";
import { validateOptions } from "./validateOptions.ts";
import { defaultPrecision, sigmaOf } from "./precision.ts";
import { prepareSamples } from "./prepareSamples.ts";
import { applyOverride, endmemberFromData } from "./endmembers.ts";
import { groupScatter, referenceSalinity, riverAtReference, riverSlopeWarning } from "./riverReference.ts";
import { deviations, dilutionLine } from "./dilutionLine.ts";
import { isNonConservative, mixingEvidence } from "./evidence.ts";
import { fitCurve } from "./curveFit.ts";
import { seawardTangent } from "./tangent.ts";
import { riverVariability, surveyPitfalls, LOW_CONFIDENCE_CODES } from "./pitfalls.ts";
import { analyzeShape } from "./analyzeShape.ts";

/** Fewest usable stations for a curve, tangent and class. */
export const MIN_STATIONS = 5;
/** Smallest salinity span (max − min) that the analysis accepts. */
export const MIN_SALINITY_SPAN = 1;

/**
 * Full mixing analysis of one constituent along an estuary's salinity gradient:
 * end-members (data groups or overrides), theoretical dilution line and station
 * deviations, a smoothing-spline C–S curve with a 95 % bootstrap band, the seaward
 * tangent and effective river end-member C*₀ (Boyle et al. 1974), % change (NEGATIVE =
 * removal), fluxes, reaction zone, mid-estuarine maximum, reaction-rate profile and the
 * behaviour class with its statistical evidence and pitfall warnings.
 *
 * Too little data never gives NaN: the class is "insufficient-data" with a warning.
 *
 * @param samples observations (salinity, concentration in `options.unit`, censoring, QC)
 * @param options see {@link AnalyzeOptions}
 * @returns the analysis
 * @throws TypeError/RangeError for caller mistakes in the options or samples argument
 * @see bibliography keys boyle1974, liss1976, loderReichard1981.
 */
export function analyzeConstituent(samples: readonly MixingSample[], options: AnalyzeOptions): ConstituentAnalysis {
  validateOptions(options);
  if (!Array.isArray(samples))
    throw new TypeError(`analyzeConstituent: samples must be an array, got ${typeof samples}`);
  try {
    return analyzeChecked(samples, options);
  } catch (error) {
    if ((error as Error).message?.startsWith("analyzeConstituent:")) throw error;
    // Caller mistakes were thrown above; anything else is a numerical failure on this constituent's
    // data, returned as "insufficient-data" with a warning so one constituent never aborts a survey.
    return {
      name: options.name,
      unit: options.unit,
      class: "insufficient-data",
      confidence: "low",
      deviations: [],
      warnings: [
        {
          code: "analysis-failed",
          message: `The mixing analysis of ${options.name} failed on these data (${(error as Error).message}); no estimates are given. Check for many zeros, ties or extreme values.`,
        },
      ],
    };
  }
}

function analyzeChecked(samples: readonly MixingSample[], options: AnalyzeOptions): ConstituentAnalysis {
  const fn = "analyzeConstituent";
  const { name, unit } = options;
  const k = options.k ?? 2;
  const warnings: MixingWarning[] = [];
  const dp = defaultPrecision(name, unit);
  const precision = options.precision ?? dp.precision;
  if (!options.precision && !dp.fromTable)
    warnings.push({
      code: "default-precision",
      message: `No precision given and none tabulated for ${name}: assumed 5 % relative. Enter your laboratory's precision.`,
    });
  const prep = prepareSamples(fn, samples, precision, options.censoredFraction ?? 0.5);
  warnings.push(...prep.warnings);
  const used = prep.used;
  const base = { name, unit, confidence: "low" as const, deviations: [], warnings };
  const insufficient = (message: string, extra: Partial<ConstituentAnalysis> = {}): ConstituentAnalysis => ({
    ...base,
    ...extra,
    class: "insufficient-data",
    warnings: [...warnings, { code: "insufficient-data", message }],
  });
  if (used.length > 0 && used.every((s) => s.censored))
    return insufficient(
      `All ${used.length} values of ${name} are below detection: no mixing behaviour can be inferred.`,
    );
  if (used.length < 2)
    return insufficient(`${used.length} usable station(s) for ${name}; the analysis needs at least ${MIN_STATIONS}.`);
  const sMin = used[0]!.salinity;
  const sMax = used[used.length - 1]!.salinity;
  if (sMax - sMin < MIN_SALINITY_SPAN)
    return insufficient(`Salinity spans only ${sMin}–${sMax} (< ${MIN_SALINITY_SPAN}): no mixing gradient to analyse.`);
  const sig = (c: number): number => sigmaOf(precision, c);
  const group = endmemberFromData(used, "river");
  let river = group;
  let sea = endmemberFromData(used, "sea");
  const tp = used.length >= MIN_STATIONS ? seawardTangent(used) : undefined;
  const ref = referenceSalinity(sMin, options.river?.salinity);
  if (options.river) river = applyOverride(fn, "river", river, { ...options.river, salinity: ref.salinity }, sig);
  else if (tp) river = riverAtReference(used, group, tp.fit, ref.salinity);
  if (ref.warning) warnings.push(ref.warning);
  if (options.sea) sea = applyOverride(fn, "sea", sea, options.sea, sig);
  if (!(sea.salinity > river.salinity))
    return insufficient(`Sea end-member salinity ${sea.salinity} is not above river salinity ${river.salinity}.`);
  // Disagreement of the freshest samples beyond the fitted curve (not the slope the curve explains).
  const rv = riverVariability(
    tp && !options.river ? groupScatter(used, group, tp.fit) : river,
    sig(river.conc),
    options,
  );
  warnings.push(...rv.warnings);
  if (tp && !options.river) warnings.push(...riverSlopeWarning(used, group, river, options.unit));
  const line = dilutionLine(river, sea, unit);
  const devs = deviations(line, used, k);
  const endmembers = { river, sea };
  warnings.push(...surveyPitfalls(sMin, sMax, used.length, options));
  if (used.length < MIN_STATIONS)
    return insufficient(
      `${used.length} usable stations for ${name}; curve, tangent and class need at least ${MIN_STATIONS}.`,
      { endmembers, dilutionLine: line, deviations: devs },
    );
  const evidence = mixingEvidence(used, devs, prep.nCensored, k);
  const curve = fitCurve(used);
  if (!evidence || !curve)
    return insufficient(`Fewer than 4 distinct salinities for ${name}: no curve can be fitted.`, {
      endmembers,
      dilutionLine: line,
      deviations: devs,
    });
  if (!tp)
    return insufficient(`No seaward tangent could be fitted for ${name}.`, {
      endmembers,
      dilutionLine: line,
      deviations: devs,
      evidence,
    });
  const result = analyzeShape({
    used,
    options,
    precision,
    river,
    sea,
    line,
    curve,
    twoPhase: tp.fit,
    tangent: tp.tangent,
    riverExtraSd: rv.widenedSd,
    riverGroup: group,
    evidence,
    nonConservative: isNonConservative(evidence) || !tp.fit.linear,
    quadCoef: evidence.quadraticCoefficient,
    warnings,
  });
  // The river was replaced by the freshest stations' mean: the dilution line and deviations follow it,
  // and the slope warning about an extrapolation that was not used is dropped.
  const finalLine = result.riverReplaced ? dilutionLine(result.river, sea, unit) : line;
  const finalDevs = result.riverReplaced ? deviations(finalLine, used, k) : devs;
  const all = [...warnings, ...result.warnings].filter(
    (w) => !(result.riverReplaced && w.code === "river-extrapolated"),
  );
  return {
    name,
    unit,
    class: result.cls,
    confidence: all.some((w) => LOW_CONFIDENCE_CODES.has(w.code)) ? "low" : "normal",
    endmembers: { river: result.river, sea },
    dilutionLine: finalLine,
    deviations: finalDevs,
    fit: result.fit,
    tangent: tp.tangent,
    evidence,
    effectiveEndmember: result.effective,
    percentChange: result.percent,
    flux: result.flux,
    reactionZone: result.zone,
    maximum: result.maximum,
    rateProfile: result.rate,
    bootstrap: result.bootstrap,
    breakSalinity: result.breakSalinity,
    verdict: result.verdict,
    warnings: all,
  };
}
