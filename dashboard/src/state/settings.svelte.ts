import type { CarbonateEndmember } from "../../../analysis/index.ts";
/**
 * User settings that steer the analysis or the display. Analysis settings are
 * sent to the worker; display settings only change how the map draws.
 */

import type { AnalysisSettings, ConstituentOverrides } from "../worker/protocol.ts";
import type { ArchiveChoices } from "../archive/archiveChoices.ts";

export type { AnalysisSettings, ConstituentOverrides, EndmemberOverride } from "../worker/protocol.ts";

/** How stations are coloured on the map. */
export type StationColouring = "salinity" | "deviation";

/**
 * TA/DIC end-members [µmol/kg] for the expected pH along the mixing line (speciation panel). A user
 * setting, absent unless given; `invented` marks the demo estuary's assumed values (not measurements).
 */
export interface CarbonateSetting {
  river: CarbonateEndmember;
  sea: CarbonateEndmember;
  invented: boolean;
}

export class Settings {
  /** Carbonate end-members for the expected-pH curve; undefined until the user gives them (or the demo runs). */
  carbonate = $state.raw<CarbonateSetting | undefined>(undefined);
  /** Analysis settings; replaced whole so the worker gets a plain object. */
  analysis = $state.raw<AnalysisSettings>({
    endmemberOverrides: {},
    precisionPercent: {},
    riverDischargeM3s: undefined,
    constantSet: "default",
    saltIntrusionSalinity: 2,
  });
  /** Archive view: the user's seasons and discharge table (not part of the per-survey analysis). */
  archive = $state.raw<ArchiveChoices>({});
  /** Colour stations by salinity or by deviation from the dilution line. */
  colouring = $state<StationColouring>("salinity");
  /** Optional raster tile URL template ({z}/{x}/{y}); used only when `useTiles` is on. */
  tileUrl = $state("");
  /** Off by default: the dashboard is offline unless the user opts in. */
  useTiles = $state(false);
  /** Natural Earth world land under imported data (an offline asset, fetched when first needed). */
  worldLand = $state(true);

  /** Replaces some analysis settings (triggers a new analysis). */
  updateAnalysis(patch: Partial<AnalysisSettings>): void {
    this.analysis = { ...this.analysis, ...patch };
  }

  /** Sets or clears the end-member override of one constituent. */
  setOverride(constituent: string, overrides: ConstituentOverrides | undefined): void {
    const next = { ...this.analysis.endmemberOverrides };
    if (overrides) next[constituent] = overrides;
    else delete next[constituent];
    this.updateAnalysis({ endmemberOverrides: next });
  }
}
