import { practicalSalinityFromConductivity } from "../seawater/practicalSalinity.ts";
import type { ImportIssue, Survey } from "../survey/survey.ts";
import type { ColumnMapping } from "./columnMapping.ts";
import type { CompiledMapping } from "./compileMapping.ts";
import { compileMapping } from "./compileMapping.ts";
import type { TextDialect } from "./dialect.ts";
import type { SurveyGrouping } from "./groupSurveys.ts";
import { groupSurveys } from "./groupSurveys.ts";
import type { ImportedStation, ImportSummary } from "./importSummary.ts";
import { makeIssue } from "./importSummary.ts";
import type { LayerChoice } from "./layerSelection.ts";
import { selectLayer } from "./layerSelection.ts";
import { chooseLayer, duplicateStationIssues } from "./layerDefault.ts";
import type { FlagDecision } from "./qcFlags.ts";
import type { RowReader, SalinityFromConductivity } from "./rowReader.ts";
import { createRowReader } from "./rowReader.ts";
import type { StationTable } from "./stationTable.ts";
import { joinStationTable } from "./stationTable.ts";
import { normaliseStationId } from "./stationIds.ts";
import { findSavedMapping } from "./fileShape.ts";
import { suggestMapping } from "./suggestMapping.ts";
import { applyUnitOverrides, mergeMapping } from "./mappingChoices.ts";
import { crossCheckUnits } from "./unitCrossCheck.ts";
import type { UnitParser } from "./unitText.ts";
import { canonicalUnitText } from "./unitText.ts";
import { conflictingStationPositions } from "./stationPositionCheck.ts";
import { appendAll } from "../survey/arrayExtent.ts";

/** Options shared by the survey readers. */
export interface ReadSurveyOptions {
  /** File name used in every issue. */
  fileName: string;
  /** Confirmed mapping; otherwise a saved mapping of the same shape, otherwise the suggestion. */
  mapping?: ColumnMapping;
  savedMappings?: readonly ColumnMapping[];
  /** Field delimiter / decimal comma; detected when absent (the mapping's choice comes first). */
  delimiter?: string;
  decimalComma?: boolean;
  parseUnit?: UnitParser;
  flagMap?: Readonly<Record<string, FlagDecision>>;
  /** PSS-78 conversion used when only conductivity is given. */
  salinityFromConductivity?: SalinityFromConductivity;
  /** Station table joined by station id (positions, distances). */
  stationTable?: StationTable;
  /** Units by column header or constituent name (`{ "Silicate": "µmol/L" }`), for headers without one. */
  unitOverrides?: Readonly<Record<string, string>>;
  /** Layer kept per station and survey (default: "shallowest" for depth-resolved files, else every row). */
  layer?: LayerChoice;
  /** Survey grouping (default: survey column when mapped, else date gaps of 3 days). */
  grouping?: SurveyGrouping;
  /** River discharge [m³/s] for all surveys, or by survey name. */
  riverDischargeM3s?: number | Readonly<Record<string, number>>;
  /** Progress callback, fraction done 0…1. */
  onProgress?: (fraction: number) => void;
}

/** Everything an import produces. */
export interface ImportResult {
  surveys: Survey[];
  issues: ImportIssue[];
  summary: ImportSummary;
  mapping: ColumnMapping;
  headers: string[];
  dialect: TextDialect;
  /** The layer used (the stated one, else "shallowest" for depth-resolved files, else "all"). */
  layer: LayerChoice;
}

/**
 * Default conductivity conversion: PSS-78 practical salinity (with the Hill et al. 1986 extension
 * below S = 2) from the shared seawater core; undefined where the inputs are outside its domain.
 */
export function pss78Salinity(
  conductivityMScm: number,
  temperatureC: number,
  pressureDbar: number,
): number | undefined {
  try {
    return practicalSalinityFromConductivity(conductivityMScm, temperatureC, Math.max(0, pressureDbar));
  } catch {
    return undefined;
  }
}

/**
 * Chooses the mapping: explicit (a partial one merged with the suggestion: columns it leaves out keep
 * the suggested role), saved for this shape, or suggested; then the user's unit overrides.
 */
export function chooseMapping(headers: string[], sample: string[][], options: ReadSurveyOptions): ColumnMapping {
  const suggest = (): ColumnMapping => suggestMapping(headers, sample, options.parseUnit ?? canonicalUnitText);
  let mapping: ColumnMapping;
  if (options.mapping !== undefined) {
    const merged = mergeMapping(options.mapping, suggest());
    mapping = "mapping" in merged ? merged.mapping : options.mapping;
  } else {
    const saved = options.savedMappings === undefined ? undefined : findSavedMapping(headers, options.savedMappings);
    mapping = saved ?? suggest();
  }
  const overrides = Object.entries(options.unitOverrides ?? {}).map(([column, unit]) => ({ column, unit }));
  return overrides.length === 0 ? mapping : applyUnitOverrides(mapping, overrides).mapping;
}

/** Compiles the mapping and creates the row reader, adding file-level issues. */
export function startRows(
  headers: string[],
  mapping: ColumnMapping,
  dialect: TextDialect,
  options: ReadSurveyOptions,
): { reader: RowReader; compiled: CompiledMapping } {
  const { compiled, issues } = compileMapping(
    headers,
    mapping,
    options.fileName,
    options.parseUnit ?? canonicalUnitText,
  );
  const reader = createRowReader(compiled, mapping, {
    file: options.fileName,
    decimalComma: dialect.decimalComma,
    ...(options.flagMap !== undefined ? { flagMap: options.flagMap } : {}),
    salinityFromConductivity: options.salinityFromConductivity ?? pss78Salinity,
  });
  appendAll(reader.issues, issues);
  return { reader, compiled };
}

/** Joins, selects the layer, reports stations without position and groups into surveys. */
export function finishImport(
  reader: RowReader,
  compiled: CompiledMapping,
  mapping: ColumnMapping,
  headers: string[],
  dialect: TextDialect,
  options: ReadSurveyOptions,
): ImportResult {
  const file = options.fileName;
  const issues = reader.issues;
  const stationHeader = compiled.single.station === undefined ? "" : (headers[compiled.single.station] ?? "");
  appendAll(issues, crossCheckUnits(reader.stations, compiled.constituents, file));
  let rows: ImportedStation[] = reader.stations;
  if (options.stationTable !== undefined) {
    const joined = joinStationTable(rows, options.stationTable, file, stationHeader);
    rows = joined.stations;
    appendAll(issues, joined.issues);
  }
  appendAll(issues, conflictingStationPositions(reader.stations, file, stationHeader));
  const grouping: SurveyGrouping =
    options.grouping ?? (compiled.single.survey !== undefined ? { by: "column" } : { by: "dateGap" });
  const grouped = groupSurveys(rows, grouping, compiled.constituentList, file, options.riverDischargeM3s);
  appendAll(issues, grouped.issues);
  const layer = chooseLayer(
    rows,
    options.layer,
    headers[compiled.single.depth ?? compiled.single.depthLabel ?? -1] ?? "",
    file,
    issues,
  );
  for (const survey of grouped.surveys) {
    const layered = selectLayer(survey.stations as ImportedStation[], layer, file);
    survey.stations = layered.stations;
    appendAll(issues, layered.issues);
  }
  const noPos = new Map<string, ImportedStation>();
  for (const st of grouped.surveys.flatMap((s) => s.stations) as ImportedStation[])
    if (st.lonLat === undefined && st.distanceKm === undefined && !noPos.has(normaliseStationId(st.id).id))
      noPos.set(normaliseStationId(st.id).id, st);
  for (const st of noPos.values()) {
    const hint =
      st.distanceKm !== undefined
        ? `; the file's along-channel distance ${st.distanceKm} km is kept`
        : "; it can be placed by its along-axis label or a station table";
    issues.push(
      makeIssue(
        file,
        st.sourceRow,
        stationHeader,
        st.id,
        `a position for station ${st.id} (latitude/longitude, x/y or a station table)${hint}`,
        "warning",
      ),
    );
  }
  appendAll(issues, duplicateStationIssues(grouped.surveys, file, stationHeader));
  options.onProgress?.(1);
  return { surveys: grouped.surveys, issues, summary: reader.summary, mapping, headers, dialect, layer };
}
