// Brackline analysis core: the single source of every number the dashboard and CLI show.
// Pure TypeScript (no DOM); explicit named re-exports only, grouped by area.

// --- survey data model ---
export type { CellStatus, ValueCell, Station, Constituent, Survey, ImportIssue } from "./survey/survey.ts";
// --- end survey ---

// --- geometry ---
// --- end geometry ---

// --- mixing ---
export type {
  Estimate,
  Endmember,
  DilutionLine,
  StationDeviation,
  MixingWarning,
  BehaviourClass,
  ReactionZone,
  MidEstuarineMaximum,
} from "./mixing/result.ts";
// --- end mixing ---

// --- seawater ---
export { T68_PER_T90, t68FromT90, t90FromT68 } from "./seawater/temperatureScale.ts";
export { PSS78, C3515_MS_CM } from "./seawater/pss78Coefficients.ts";
export { hillRatioAtSp2 } from "./seawater/hillExtension.ts";
export { practicalSalinityFromConductivity, practicalSalinityFromRt, pss78ValidityNote } from "./seawater/practicalSalinity.ts";
export { conductivityFromPracticalSalinity } from "./seawater/conductivityFromSalinity.ts";
export {
  SALINITY_PER_CHLORINITY,
  REFERENCE_SALINITY_35_G_KG,
  U_PS_G_KG,
  salinityFromChlorinity,
  chlorinityFromSalinity,
  referenceSalinityFromPractical,
  practicalSalinityFromKnudsen,
} from "./seawater/salinityScales.ts";
export { densityEos80, eos80SecantBulkModulusBar } from "./seawater/densityEos80.ts";
export { ATOMIC_WEIGHTS, atomicWeight } from "./seawater/atomicWeights.ts";
export type { AtomicWeight } from "./seawater/atomicWeights.ts";
export { UNITS, parseUnit, parseUnitOrThrow } from "./seawater/units.ts";
export type { CanonicalUnit } from "./seawater/units.ts";
export { convertConcentration } from "./seawater/convertConcentration.ts";
export type { ConversionContext } from "./seawater/convertConcentration.ts";
export { REFERENCE_COMPOSITION, referenceCompositionSummary } from "./seawater/referenceComposition.ts";
export type { ReferenceSpecies, ReferenceCompositionSummary } from "./seawater/referenceComposition.ts";
export { SEA_SALT_MOLAR_MASS_G_MOL, SEA_SALT_VALENCE_FACTOR, ionicStrengthFromSalinity, ionicStrengthDoe } from "./seawater/ionicStrength.ts";
export { WORLD_AVERAGE_RIVER, riverCompositionFromMgL } from "./seawater/riverComposition.ts";
export type { RiverComposition } from "./seawater/riverComposition.ts";
export { majorIonsAtSalinity } from "./seawater/majorIons.ts";
export type { MajorIonOptions, MajorIonState } from "./seawater/majorIons.ts";
export { majorIonsVsSalinity } from "./seawater/majorIonSeries.ts";
export {
  DAVIES_MAX_IONIC_STRENGTH,
  debyeHuckelA,
  daviesActivityCoefficient,
  daviesLogGamma,
  daviesValidityWarning,
  conditionalLogK,
} from "./seawater/davies.ts";
export type { DaviesOptions } from "./seawater/davies.ts";
export { vantHoffLogK } from "./seawater/vantHoff.ts";
export type { WaterConditions } from "./seawater/waterConditions.ts";
export { resolveIonicStrength } from "./seawater/waterConditions.ts";
export { FE_CONSTANT_SETS, feConstantSet } from "./seawater/feConstantSets.ts";
export type { FeConstantSet, FeConstantSetId } from "./seawater/feConstantSets.ts";
export { FE_SPECIES, FE_SPECIES_LABELS, feConditionalConstants, feSpeciation } from "./seawater/feHydrolysis.ts";
export type { FeSpeciation, FeSpeciationOptions, FeConditionalConstants } from "./seawater/feHydrolysis.ts";
export { predominanceBoundaries, stepwiseCrossovers } from "./seawater/predominance.ts";
export type { PredominanceBoundary } from "./seawater/predominance.ts";
export { feSpeciationVsPh } from "./seawater/feSeries.ts";
export type { FeSpeciationSeries } from "./seawater/feSeries.ts";
export { CD_CHLORIDE_SETS } from "./seawater/cdChlorideSets.ts";
export type { CdChlorideSet } from "./seawater/cdChlorideSets.ts";
export { cdChlorideSpeciation } from "./seawater/cdChloride.ts";
export type { CdSpeciation, CdSpeciationOptions, CdExtraLigand } from "./seawater/cdChloride.ts";
export { cdSpeciationVsSalinity } from "./seawater/cdSeries.ts";
export { carbonateConstantsAt } from "./seawater/carbonateConstantsAt.ts";
export type { CarbonateConstants, CarbonateK1K2Set } from "./seawater/carbonateConstants.ts";
export { carbonatePhFromTaDic } from "./seawater/carbonatePh.ts";
export type { CarbonateState } from "./seawater/carbonatePh.ts";
export { carbonatePhAlongMixingLine } from "./seawater/carbonateMixing.ts";
export type { CarbonateEndmember, CarbonateMixingInput, CarbonateMixingSeries } from "./seawater/carbonateMixing.ts";
export { SPECIATION_CAUTION, stationSpeciation } from "./seawater/stationSpeciation.ts";
export type { StationWater, StationSpeciationOptions, StationSpeciationResult } from "./seawater/stationSpeciation.ts";
export { linearGrid } from "./seawater/grid.ts";
export type { PlotSeries, SeriesSet } from "./seawater/plotSeries.ts";
// --- end seawater ---

// --- io ---
// --- end io ---

// --- pipeline ---
export type { StationPlacement, IsohalineAtKm, SurveyFacts, SurveyAnalysis } from "./pipeline/surveyAnalysis.ts";
export { analyzeSurvey } from "./pipeline/analyzeSurvey.ts";
export type { AnalyzeSurveyOptions, ConstituentSettings } from "./pipeline/analyzeSurvey.ts";
export { constituentSamples } from "./pipeline/mixingSamples.ts";
export type { ConstituentSamples } from "./pipeline/mixingSamples.ts";
export { placeStations } from "./pipeline/placeStations.ts";
export { SCREENING_CAUTION } from "./pipeline/caution.ts";
// --- end pipeline ---

// --- compare ---
// --- end compare ---

// --- report ---
// --- end report ---
