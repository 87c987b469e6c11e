// Brackline analysis core: the single source of every number the dashboard and CLI show.
// Pure TypeScript (no DOM); explicit named re-exports only, grouped by area.

// --- survey data model ---
export type { CellStatus, ValueCell, Station, Constituent, Survey, ImportIssue } from "./survey/survey.ts";
export { minOf, maxOf, appendAll } from "./survey/arrayExtent.ts";
// --- end survey ---

// --- geometry ---
export { centerlinePlausibility, centerlineVertices, CENTERLINE_FAR_KM } from "./geometry/centerlinePlausibility.ts";
export type { CenterlinePlausibility } from "./geometry/centerlinePlausibility.ts";
export type {
  GeometryWarning,
  MouthOption,
  ChannelBranch,
  ChannelSegments,
  ChannelNetwork,
  StationProjection,
} from "./geometry/types.ts";
export type { SalinityPoint, SalinityProfile, IsohalinePosition } from "./geometry/salinityTypes.ts";
export type {
  CenterlineGeoJson,
  LineStringGeometry,
  MultiLineStringGeometry,
  LineFeature,
  LineFeatureCollection,
} from "./geometry/geojsonInput.ts";
export { buildChannelNetwork, type ChannelNetworkOptions } from "./geometry/buildNetwork.ts";
export { projectLonLatArrays, type BulkProjection } from "./geometry/projectBulk.ts";
export {
  projectStations,
  type StationPosition,
  type ProjectStationsOptions,
  type StationProjectionResult,
} from "./geometry/projectStations.ts";
export { suggestMouth, spearmanRho, type MouthEvidence, type MouthSuggestion } from "./geometry/suggestMouth.ts";
export { fitSalinityProfile, type SalinityProfileOptions } from "./geometry/salinityProfile.ts";
export {
  isohalinePositions,
  saltIntrusionLengthKm,
  crossingsKm,
  DEFAULT_ISOHALINES,
  type SaltIntrusion,
} from "./geometry/isohalines.ts";
export { salinityIntervalToKm, type KmIntervals } from "./geometry/salinityToKm.ts";
export { pointAtKm, pathPieces, type PathPiece } from "./geometry/alongChannel.ts";
export { channelStretch } from "./geometry/channelStretch.ts";
export { kmTicks, type KmTickProperties, type KmTickCollection } from "./geometry/kmTicks.ts";
export { channelLengthKm } from "./geometry/channelLength.ts";
export {
  WGS84_A_M,
  WGS84_F,
  meridionalRadiusM,
  primeVerticalRadiusM,
  localSegmentLengthM,
  localBearingDeg,
} from "./geometry/ellipsoid.ts";
export { centerlineMouthHint } from "./geometry/mouthHint.ts";
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
  ConstituentAnalysis,
  FitCurve,
  TangentLine,
  MixingEvidence,
  FluxSummary,
  RateProfile,
} from "./mixing/result.ts";
export type { MixingSample, AnalyzeOptions, EndmemberOverride, Precision } from "./mixing/options.ts";
export { analyzeConstituent, MIN_STATIONS, MIN_SALINITY_SPAN } from "./mixing/analyzeConstituent.ts";
export { dilutionLine, dilutionAt, deviations } from "./mixing/dilutionLine.ts";
export { endmemberFromData, RIVER_GROUP_DS, SEA_GROUP_DS } from "./mixing/endmembers.ts";
export { effectiveEndmemberAt, percentChange } from "./mixing/effectiveEndmember.ts";
export { reactionRate } from "./mixing/reactionRate.ts";
export { DEFAULT_PRECISION, FALLBACK_PRECISION, defaultPrecision, sigmaOf } from "./mixing/precision.ts";
export { molarFactor, toMolPerM3 } from "./mixing/units.ts";
export type { MolarUnit } from "./mixing/units.ts";
export { polyFit } from "./stats/polyFit.ts";
export type { PolyFit } from "./stats/polyFit.ts";
export { runsTest } from "./stats/runsTest.ts";
export type { RunsTestResult } from "./stats/runsTest.ts";
export { fitSmoothingSpline } from "./stats/smoothingSpline.ts";
export { mergeKnots } from "./stats/knotData.ts";
export type { KnotData } from "./stats/knotData.ts";
export { evaluateSpline, evaluateSplineGrid } from "./stats/naturalSpline.ts";
export type { NaturalSpline, SplinePoint } from "./stats/naturalSpline.ts";
export { interval95, percentileSorted } from "./stats/percentile.ts";
export { intervalBc95 } from "./stats/biasCorrectedInterval.ts";
export { bootstrapBiasCorrected } from "./stats/bootstrapBias.ts";
export { NormalDeviates, seededNormal } from "./stats/seededNormal.ts";
// --- end mixing ---

// --- seawater ---
export { T68_PER_T90, t68FromT90, t90FromT68 } from "./seawater/temperatureScale.ts";
export { PSS78, C3515_MS_CM } from "./seawater/pss78Coefficients.ts";
export { hillRatioAtSp2 } from "./seawater/hillExtension.ts";
export {
  practicalSalinityFromConductivity,
  practicalSalinityFromRt,
  pss78ValidityNote,
} from "./seawater/practicalSalinity.ts";
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
export {
  SEA_SALT_MOLAR_MASS_G_MOL,
  SEA_SALT_VALENCE_FACTOR,
  ionicStrengthFromSalinity,
  ionicStrengthDoe,
} from "./seawater/ionicStrength.ts";
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
export { feSolubilityLiuMillero2002NmolKg, ionicStrengthLiuMillero2002 } from "./seawater/feSolubilityLiuMillero.ts";
export type { FeSpeciationSeries } from "./seawater/feSeries.ts";
export { CD_CHLORIDE_SETS, CD_ACTIVITY_MODEL_NOTE, DEFAULT_CD_CHLORIDE_SET_ID } from "./seawater/cdChlorideSets.ts";
export type { CdChlorideSet } from "./seawater/cdChlorideSets.ts";
export { cdChlorideSpeciation } from "./seawater/cdChloride.ts";
export type { CdSpeciation, CdSpeciationOptions, CdExtraLigand } from "./seawater/cdChloride.ts";
export { cdSpeciationVsSalinity } from "./seawater/cdSeries.ts";
export { cdFreeFractionByStation } from "./seawater/cdStations.ts";
export type { CdStationInput, CdStationResult } from "./seawater/cdStations.ts";
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
export {
  quantityUnit,
  quantityKindsOf,
  toWorkingUnit,
  normaliseUnitText,
  WORKING_UNIT,
  type QuantityKind,
  type QuantityUnit,
} from "./seawater/quantityUnits.ts";
// --- end seawater ---

// --- io ---
export { readSurveyText, readSurveyStream } from "./io/readSurvey.ts";
export type { TextChunkSource } from "./io/readSurvey.ts";
export type { ImportResult, ReadSurveyOptions } from "./io/importPipeline.ts";
export { pss78Salinity } from "./io/importPipeline.ts";
export { applyMapping } from "./io/applyMapping.ts";
export { readStationTable, joinStationTable } from "./io/stationTable.ts";
export type { StationTable, StationRecord } from "./io/stationTable.ts";
export { readGeoJsonPoints } from "./io/geojsonPoints.ts";
export { readNetcdfStations } from "./io/netcdfStations.ts";
export { parseCfTimeUnits, cfTimeToIso } from "./io/cfTime.ts";
export type { CfTimeUnit } from "./io/cfTime.ts";
export { suggestMapping } from "./io/suggestMapping.ts";
export { COLUMN_ROLES } from "./io/columnRoles.ts";
export { columnMappingSchema, columnAssignmentSchema, columnWithRole } from "./io/columnMapping.ts";
export { checkSchema } from "./io/validation.ts";
export type { SchemaIssue } from "./io/validation.ts";
export type { ColumnMapping, ColumnAssignment, ColumnRole } from "./io/columnMapping.ts";
export { fileShapeSignature, findSavedMapping } from "./io/fileShape.ts";
export { emptySummary, mergeSummaries } from "./io/importSummary.ts";
export type { ImportSummary, ImportedStation } from "./io/importSummary.ts";
export { selectLayer, combineCells, detectDepthProfiles, LAYER_KINDS } from "./io/layerSelection.ts";
export type { LayerChoice, DepthProfileInfo } from "./io/layerSelection.ts";
export { chooseLayer, duplicateStationIssues } from "./io/layerDefault.ts";
export { variableKind, NON_MIXING_REASONS } from "./io/variableKinds.ts";
export type { VariableKind } from "./io/variableKinds.ts";
export {
  headOfText,
  suggestMappingForText,
  parseUnitOverride,
  applyUnitOverrides,
  mergeMapping,
} from "./io/mappingChoices.ts";
export { missingUnits, unusedColumns } from "./io/mappingGaps.ts";
export type { UnitOverride } from "./io/mappingChoices.ts";
export type { MissingUnit, UnusedColumn } from "./io/mappingGaps.ts";
export { classifyTable } from "./io/tableKind.ts";
export { groupSurveys, DEFAULT_SURVEY_GAP_DAYS } from "./io/groupSurveys.ts";
export type { SurveyGrouping } from "./io/groupSurveys.ts";
export {
  parseValueText,
  parseNumberText,
  isMissingText,
  MISSING_MARKERS,
  BELOW_DETECTION_WORDS,
} from "./io/valueText.ts";
export { parseCoordinateText } from "./io/coordinates.ts";
export type { CoordinateAxis } from "./io/coordinates.ts";
export { projectedToLonLat, projDefinition, EPSG_DEFINITIONS } from "./io/projection.ts";
export { parseDateTimeText, parseTimeOfDay, detectDateOrder, expandTwoDigitYear } from "./io/dateTime.ts";
export type { DateOrder, ParsedDateTime } from "./io/dateTime.ts";
export { DEFAULT_FLAG_MAP, readQcFlag, flagTarget, isRowFlagHeader } from "./io/qcFlags.ts";
export type { FlagDecision } from "./io/qcFlags.ts";
export { normaliseConstituentName, CONSTITUENT_SYNONYMS, ELEMENT_SYMBOLS } from "./io/constituentNames.ts";
export { splitHeaderUnit } from "./io/headerUnits.ts";
export type { HeaderParts } from "./io/headerUnits.ts";
export { canonicalUnitText, concentrationUnitText, isConcentrationUnit } from "./io/unitText.ts";
export type { UnitParser } from "./io/unitText.ts";
export { crossCheckUnits, COUNTED_ELEMENT } from "./io/unitCrossCheck.ts";
export { integralStationId, normaliseStationId } from "./io/stationIds.ts";
export type { NormalisedStationId } from "./io/stationIds.ts";
export { detectDialect, detectNewline, stripBom } from "./io/dialect.ts";
export { WORKSPACE_LIMITS } from "./io/workspaceFormat.ts";
export { conflictingStationPositions, STATION_POSITION_TOLERANCE_KM } from "./io/stationPositionCheck.ts";
export { MAX_DISCHARGE_M3S, MAX_STATION_ID_CHARS, PSS78_MAX_SALINITY } from "./io/rowReader.ts";
export type { TextDialect } from "./io/dialect.ts";
export { exportWorkspace, importWorkspace } from "./io/workspace.ts";
export { createWorkspace } from "./io/newWorkspace.ts";
export { workspaceSchema } from "./io/workspaceSchema.ts";
export { WORKSPACE_VERSION, WORKSPACE_FORMAT } from "./io/workspaceFormat.ts";
export type { WorkspaceDocument } from "./io/workspaceSchema.ts";
export { migrateV1toV2, workspaceV1Schema } from "./io/workspaceMigrations.ts";
// --- end io ---

// --- pipeline ---
export type {
  StationPlacement,
  IsohalineAtKm,
  SurveyFacts,
  DischargeProvenance,
  SurveyAnalysis,
  AlongChannelSeries,
  OffChannelStation,
} from "./pipeline/surveyAnalysis.ts";
export { analyzeSurvey, DEFAULT_OFF_CHANNEL_M } from "./pipeline/analyzeSurvey.ts";
export { constituentPartOf } from "./pipeline/constituentParts.ts";
export type { ConstituentPart } from "./pipeline/constituentParts.ts";
export { alongChannelSeries } from "./pipeline/alongChannelSeries.ts";
export { offChannelStations } from "./pipeline/offChannel.ts";
export { networkWithMouth } from "./pipeline/resolveMouth.ts";
export type { ResolvedNetwork } from "./pipeline/resolveMouth.ts";
export { centerlineFromStations, centerlineFromSurveys } from "./pipeline/centerlineFromStations.ts";
export type { CenterlineStation, StationCenterline } from "./pipeline/centerlineFromStations.ts";
export { distancesFromMouth } from "./pipeline/distancesFromMouth.ts";
export { distanceOrigin, salinityByDistance } from "./pipeline/distanceOrigin.ts";
export type { DistanceOrigin, SalinityAtDistance } from "./pipeline/distanceOrigin.ts";
export { riverArmEnd, salinityBreakIndex } from "./pipeline/salinityBreak.ts";
export type { ProfilePoint, RiverArmEnd } from "./pipeline/salinityBreak.ts";
export type { AnalyzeSurveyOptions, ConstituentSettings } from "./pipeline/analyzeSurvey.ts";
export { constituentSamples } from "./pipeline/mixingSamples.ts";
export type { ConstituentSamples } from "./pipeline/mixingSamples.ts";
export { placeStations } from "./pipeline/placeStations.ts";
export { SCREENING_CAUTION } from "./pipeline/caution.ts";
// --- end pipeline ---

// --- compare ---
export type {
  ComparableSurvey,
  EstimateDifference,
  IntrusionRow,
  ReferenceScaling,
  DischargeScaling,
  ConstituentShift,
  SurveyComparison,
} from "./compare/types.ts";
export { compareSurveys } from "./compare/compareSurveys.ts";
export type { CompareOptions } from "./compare/compareSurveys.ts";
export { constituentShift } from "./compare/constituentShift.ts";
export type { ShiftSide } from "./compare/constituentShift.ts";
export {
  differenceOfEstimates,
  differenceWithoutInterval,
  DIFFERENCE_INTERVAL_METHOD,
} from "./compare/differenceOfEstimates.ts";
export { dischargeScaling, REFERENCE_SCALINGS } from "./compare/dischargeScaling.ts";
export { surveyProfile, kmAtSalinity, kmEstimateOfSalinity } from "./compare/salinityKm.ts";
export { comparisonToCsv, COMPARISON_CSV_COLUMNS } from "./compare/comparisonCsv.ts";
export { formatSignificant, formatFixed, MINUS } from "./output/formatNumber.ts";
// --- end compare ---

// --- report ---
export { buildBriefing, BRIEFING_CAUTION } from "./report/buildBriefing.ts";
export { renderBriefingHtml } from "./report/renderHtml.ts";
export { BIBLIOGRAPHY, bibEntry, formatReference, referenceList } from "./report/referencesBibliography.ts";
export type { BibEntry } from "./report/referencesBibliography.ts";
export { authorYear, cite, briefingReferences, methodsParagraphs } from "./report/references.ts";
export type {
  BriefingDocument,
  BriefingInput,
  BriefingSurvey,
  BriefingComparison,
  BriefingFigure,
  BriefingTable,
  ProvenanceFile,
} from "./report/briefingTypes.ts";
export { constituentFindings, zoneWhere } from "./report/findings.ts";
export type { Finding } from "./report/findings.ts";
export { escapeHtml, html, joinHtml, SafeHtml } from "./report/html.ts";
export type { HtmlValue } from "./report/html.ts";
export { fractionInWords, multipleInWords, constituentWords, classWords } from "./report/wording.ts";
export { mapSvg } from "./report/mapSvg.ts";
export type { MapInput, MapZone } from "./report/mapSvg.ts";
export { fitProjection } from "./report/mapProjection.ts";
export type { MapProjection } from "./report/mapProjection.ts";
export { readBasemap } from "./report/basemap.ts";
export type { BasemapShape } from "./report/basemap.ts";
export { mixingPlotSvg } from "./report/mixingPlotSvg.ts";
export { profilePlotSvg } from "./report/profilePlotSvg.ts";
export { zoneStripSvg } from "./report/zoneStripSvg.ts";
export type { ZoneRow } from "./report/zoneStripSvg.ts";
// --- end report ---

// --- underway ---
export { readUnderwayText, readUnderwayStream } from "./underway/readUnderway.ts";
export type { ReadUnderwayOptions } from "./underway/recordReader.ts";
export { CELL_MEASURED, CELL_MISSING, CELL_INVALID, CELL_DERIVED } from "./underway/types.ts";
export type {
  UnderwayCellStatus,
  UnderwayRole,
  UnderwayColumn,
  UnderwayData,
  UnderwaySummary,
  UnderwayImport,
} from "./underway/types.ts";
export { underwayColumnRoles } from "./underway/headerRoles.ts";
export type { UnderwayColumnRole } from "./underway/headerRoles.ts";
export { IssueLog, DEFAULT_ISSUE_CAP } from "./underway/issueLog.ts";
export { projectUnderway } from "./underway/projectUnderway.ts";
export type { UnderwayProjection } from "./underway/projectUnderway.ts";
export { binUnderway } from "./underway/binUnderway.ts";
export type { UnderwayBin, UnderwayBins, UnderwayBinOptions } from "./underway/binUnderway.ts";
export type { BinStats } from "./underway/runningStats.ts";
export { binsToSurvey } from "./underway/binsToSurvey.ts";
export type { BinsToSurveyOptions } from "./underway/binsToSurvey.ts";
export { decimatePoints } from "./underway/decimatePoints.ts";
export type { DecimateOptions, DecimatedPoints } from "./underway/decimatePoints.ts";
// --- end underway ---

// --- archive ---
export type {
  SeriesPoint,
  Spread,
  GroupRow,
  SeasonTest,
  DischargeRelation,
  YearRow,
  QuantityRelations,
  ConstituentSeries,
  IntrusionPoint,
  ArchiveSummary,
  ArchiveWarning,
  FrontEnd,
} from "./archive/types.ts";
export {
  summarizeArchive,
  ARCHIVE_METHODS,
  NO_DISCHARGE_HINT,
  type ArchiveOptions,
} from "./archive/summarizeArchive.ts";
export { buildSeriesPoints, groupRows, isoDay, zoneCentreKm } from "./archive/buildSeries.ts";
export { quantityRelations, seasonTest, type QuantityPoint } from "./archive/quantityRelations.ts";
export { dischargeRelation, pWords } from "./archive/dischargeRelation.ts";
export { yearOnYear, type YearValue } from "./archive/yearOnYear.ts";
export { spreadOf, kruskalWallis } from "./archive/groupStats.ts";
export { fitLine, lineBandAt, type LineFit } from "./archive/linearFit.ts";
export { spearmanRank, kendallTauB, midRanks, type RankCorrelation } from "./archive/rankCorrelation.ts";
export {
  parseSeasons,
  seasonOf,
  monthOfDate,
  yearOfDate,
  DEFAULT_SEASONS,
  MONTH_LABELS,
  type Season,
} from "./archive/seasons.ts";
export {
  readDischargeTable,
  dischargeOnDate,
  CUBIC_FOOT_M3,
  type DischargeRow,
  type DischargeTable,
  type DischargeLookup,
} from "./archive/dischargeTable.ts";
export {
  dischargeTableReport,
  DISCHARGE_JOIN_RULE,
  DISCHARGE_JOIN_MAX_DAYS,
  type DischargeTableReport,
} from "./archive/dischargeJoin.ts";
export {
  surveyDischarge,
  DISCHARGE_PRECEDENCE,
  type DischargeGiven,
  type SurveyDischarge,
} from "./archive/surveyDischarge.ts";
export { archiveTableRows, ARCHIVE_TABLE_COLUMNS, type ArchiveCell } from "./archive/archiveTable.ts";
export { archiveSection, archiveName, type BriefingArchive } from "./archive/archiveSection.ts";
export {
  percentChangeSeriesSvg,
  channelTimeStripSvg,
  dischargeScatterSvg,
  seasonColor,
} from "./archive/archiveFigures.ts";
export { dayMs, paddedTimeDomain, timeTicks } from "./archive/timeTicks.ts";
export type { TimeTick } from "./archive/timeTicks.ts";
export { ARCHIVE_BIBLIOGRAPHY, ARCHIVE_KEYS } from "./archive/archiveReferences.ts";
// --- end archive ---
// --- output ---
export { toCsv, csvField, csvNumber, neutraliseFormula, type CsvValue } from "./output/csv.ts";
export {
  RESULT_COLUMNS,
  DEVIATION_COLUMNS,
  resultRows,
  deviationRows,
  tableCsv,
  tableObjects,
  type ColumnSpec,
  type ResultRow,
  type DeviationRow,
} from "./output/columns.ts";
export {
  BEHAVIOUR_STYLE,
  MARK_STYLE,
  OKABE_ITO,
  NEUTRAL_MUTED,
  NEUTRAL_RULE,
  type MarkStyle,
  type MarkSymbol,
} from "./output/symbols.ts";
export { mixingPlotModel, type MixingPlotModel, type DataSegment } from "./output/mixingPlot.ts";
export { stripControl } from "./output/terminalText.ts";
// --- end output ---

// --- workspace ---
export { readInputs, readStationTableFile, readSurveyFileAs, type PreReadFiles } from "./workspace/readInputs.ts";
export { placeWithoutCenterline } from "./workspace/stationPlacement.ts";
export {
  EMPTY_CONSTITUENTS_NOTICE,
  constituentsWithoutValues,
  emptyConstituentsNotice,
  type SurveyColumns,
} from "./workspace/emptyConstituents.ts";
export { plottedObservations, surveyObservations } from "./workspace/observations.ts";
export { stationListOrder } from "./workspace/stationOrder.ts";
export type { ObservationPoint } from "./workspace/observations.ts";
export { workspaceComparison } from "./workspace/comparison.ts";
export {
  analyzeInputs,
  type WorkspaceSettings,
  type WorkspaceResults,
  type SurveyResult,
} from "./workspace/analyzeInputs.ts";
export type { InputFile, InputChoices, InputFileReport, WorkspaceInputs } from "./workspace/types.ts";
export {
  readCenterline,
  type ChannelInput,
  type MouthDecision,
  type MouthSource,
  type ReadCenterlineOptions,
} from "./workspace/readCenterline.ts";
export {
  detectFileKind,
  decodeText,
  geoJsonKind,
  delimitedKind,
  isNetcdfMagic,
  EXPECTED_FILE,
} from "./workspace/fileKind.ts";
export { FILE_KIND_LABELS, provenanceRoleOf, type InputFileKind } from "./workspace/fileKindLabels.ts";
export {
  channelOverlay,
  surveyOverlay,
  TICK_SPACING_KM,
  MAJOR_TICK_EVERY,
  type ChannelOverlay,
  type SurveyOverlay,
  type ConstituentOverlay,
  type LonLat,
} from "./workspace/overlay.ts";
// --- end workspace ---
