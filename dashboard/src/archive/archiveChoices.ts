/**
 * The user's archive choices kept in the workspace: seasons for the archive's summaries and a
 * river discharge table joined to the surveys by date. Absent = the analysis' defaults
 * (meteorological seasons; discharges as the survey files give them).
 */
import { DEFAULT_SEASONS, MONTH_LABELS, parseSeasons, type Season } from "../../../analysis/index.ts";
import type { TextFile } from "../worker/protocol.ts";

export interface ArchiveChoices {
  seasons?: Season[];
  dischargeTable?: TextFile;
}

/**
 * Seasons as editable text, "winter=Dec-Feb, spring=Mar-May", months in runs (a season whose months
 * are not one run is written with "+", e.g. "wet=Jan+Mar-Apr"). Reads back with parseSeasons.
 */
export function seasonsText(seasons: readonly Season[]): string {
  return seasons
    .map((s) => {
      const runs: string[] = [];
      let start = 0;
      for (let i = 1; i <= s.months.length; i++) {
        const prev = s.months[i - 1]!;
        if (i < s.months.length && s.months[i] === (prev % 12) + 1) continue;
        const a = MONTH_LABELS[s.months[start]! - 1]!;
        const b = MONTH_LABELS[prev - 1]!;
        runs.push(a === b ? a : `${a}-${b}`);
        start = i;
      }
      return `${s.name}=${runs.join("+")}`;
    })
    .join(", ");
}

/** The seasons in effect: the user's, else the analysis' defaults. */
export function seasonsInEffect(choices: ArchiveChoices): readonly Season[] {
  return choices.seasons ?? DEFAULT_SEASONS;
}

/**
 * Reads seasons typed in the editor: the seasons, or the analysis' message naming the bad part.
 * An empty text means the defaults.
 */
export function readSeasonsText(text: string): { seasons?: Season[]; error?: string } {
  if (text.trim() === "") return {};
  try {
    return { seasons: parseSeasons(text) };
  } catch (error) {
    return { error: (error as Error).message.replace(/^parseSeasons: /, "") };
  }
}
