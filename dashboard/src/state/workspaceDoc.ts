/**
 * Builds the versioned workspace document (analysis/io) from the dashboard's
 * state, and reads the dashboard's pieces back out of one.
 */
import {
  createWorkspace,
  type ColumnMapping,
  type LayerChoice,
  type Survey,
  type WorkspaceDocument,
} from "../../../analysis/index.ts";
import type { AnalysisSettings, StationColouring } from "./settings.svelte.ts";

/** One file's import record as kept in the workspace. */
export type ImportRecord = WorkspaceDocument["imports"][number];

/** The dashboard state a workspace holds. */
export interface WorkspaceParts {
  surveys: Survey[];
  centerline: object | null;
  /** True while the invented demo basemap fits the data (no centerline of the user's own). */
  demoBasemap: boolean;
  mappings: ColumnMapping[];
  /** When each mapping was confirmed, by shape signature (ISO 8601). */
  mappingDates: Record<string, string>;
  imports: ImportRecord[];
  colouring: StationColouring;
  tileUrl: string;
  useTiles: boolean;
  /** Natural Earth world land under imported data (Settings → Basemap). */
  worldLand: boolean;
  /** Depth layer kept from depth-resolved files at import (absent: the reader's default, the shallowest sample). */
  layer?: LayerChoice;
  analysis: AnalysisSettings;
  selectedSurvey?: string;
  selectedConstituent?: string;
}

/** Drops keys whose value is undefined (JSON cannot hold them; the schema wants them absent). */
function defined<T extends object>(o: T): T {
  return Object.fromEntries(Object.entries(o).filter(([, v]) => v !== undefined)) as T;
}

/** The workspace document of the dashboard state. */
export function toWorkspaceDocument(parts: WorkspaceParts, savedAt: string): WorkspaceDocument {
  const ws = createWorkspace("Brackline workspace");
  ws.savedAt = savedAt;
  ws.surveys = parts.surveys;
  ws.centerline = parts.centerline as WorkspaceDocument["centerline"];
  ws.mappings = parts.mappings;
  ws.imports = parts.imports;
  ws.settings = {
    colouring: parts.colouring,
    tileUrl: parts.tileUrl,
    useTiles: parts.useTiles,
    worldLand: parts.worldLand,
    mappingDates: parts.mappingDates,
    demoBasemap: parts.demoBasemap,
    ...(parts.layer ? { layer: parts.layer } : {}),
  };
  ws.analysis = defined({
    endmemberOverrides: parts.analysis.endmemberOverrides,
    precisionPercent: parts.analysis.precisionPercent,
    riverDischargeM3s: parts.analysis.riverDischargeM3s,
    constantSet: parts.analysis.constantSet,
    saltIntrusionSalinity: parts.analysis.saltIntrusionSalinity,
    mouth: parts.analysis.mouth,
    offChannelM: parts.analysis.offChannelM,
    keepOffChannel: parts.analysis.keepOffChannel,
    selectedSurvey: parts.selectedSurvey,
    selectedConstituent: parts.selectedConstituent,
  });
  return ws;
}

/** The dashboard state held by a workspace document (defaults where the document is silent). */
export function fromWorkspaceDocument(ws: WorkspaceDocument): WorkspaceParts {
  const s = ws.settings as Record<string, unknown>;
  const a = ws.analysis;
  const dates = s.mappingDates;
  return {
    surveys: ws.surveys,
    centerline: ws.centerline,
    demoBasemap: s.demoBasemap === true,
    mappings: ws.mappings,
    mappingDates:
      typeof dates === "object" && dates !== null
        ? Object.fromEntries(Object.entries(dates).filter(([, v]) => typeof v === "string"))
        : {},
    imports: ws.imports,
    colouring: s.colouring === "deviation" ? "deviation" : "salinity",
    tileUrl: typeof s.tileUrl === "string" ? s.tileUrl : "",
    useTiles: s.useTiles === true,
    // Older workspaces do not hold it: the world land is on by default.
    worldLand: s.worldLand !== false,
    analysis: {
      endmemberOverrides: a.endmemberOverrides ?? {},
      precisionPercent: a.precisionPercent ?? {},
      riverDischargeM3s: a.riverDischargeM3s,
      constantSet: a.constantSet ?? "default",
      saltIntrusionSalinity: a.saltIntrusionSalinity ?? 2,
      // Older workspaces have none of these: the one mouth rule, the default off-channel distance, left out.
      ...(a.mouth !== undefined ? { mouth: a.mouth } : {}),
      ...(a.offChannelM !== undefined ? { offChannelM: a.offChannelM } : {}),
      ...(a.keepOffChannel === true ? { keepOffChannel: true } : {}),
    },
    ...(ws.settings.layer ? { layer: ws.settings.layer } : {}),
    ...(a.selectedSurvey !== undefined ? { selectedSurvey: a.selectedSurvey } : {}),
    ...(a.selectedConstituent !== undefined ? { selectedConstituent: a.selectedConstituent } : {}),
  };
}
