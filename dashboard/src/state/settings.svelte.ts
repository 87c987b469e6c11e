/**
 * User settings that steer the analysis or the display. Analysis settings are
 * sent to the worker; display settings only change how the map draws.
 */

/** A user-given end-member (overrides the one found from the data). */
export interface EndmemberOverride {
  salinity: number;
  conc: number;
  concSd?: number;
}

/** End-member overrides for one constituent. */
export interface ConstituentOverrides {
  river?: EndmemberOverride;
  sea?: EndmemberOverride;
}

/** How stations are coloured on the map. */
export type StationColouring = "salinity" | "deviation";

/** The settings of the analysis itself (sent to the worker). */
export interface AnalysisSettings {
  /** End-member overrides keyed by constituent name. */
  endmemberOverrides: Record<string, ConstituentOverrides>;
  /** Analytical precision per constituent [% of value], overriding the defaults. */
  precisionPercent: Record<string, number>;
  /** River discharge [m³/s] overriding the survey's own value, or undefined. */
  riverDischargeM3s: number | undefined;
  /** Name of the constant set used for speciation. */
  constantSet: string;
  /** Salinity of the isohaline that marks the salt intrusion (default 2). */
  saltIntrusionSalinity: number;
}

export class Settings {
  /** Analysis settings; replaced whole so the worker gets a plain object. */
  analysis = $state.raw<AnalysisSettings>({
    endmemberOverrides: {},
    precisionPercent: {},
    riverDischargeM3s: undefined,
    constantSet: "default",
    saltIntrusionSalinity: 2,
  });
  /** Colour stations by salinity or by deviation from the dilution line. */
  colouring = $state<StationColouring>("salinity");
  /** Optional raster tile URL template ({z}/{x}/{y}); used only when `useTiles` is on. */
  tileUrl = $state("");
  /** Off by default: the dashboard is offline unless the user opts in. */
  useTiles = $state(false);

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
