/**
 * Issue-13 additions to readInputs: what each delimited file leaves unused or without a unit, and
 * how stations are placed when no centerline file is given (a centerline built from the station
 * positions, or the station table's distances oriented by salinity), always with a notice.
 */
import type { ColumnMapping } from "../io/columnMapping.ts";
import { headOfText, missingUnits, unusedColumns } from "../io/mappingChoices.ts";
import type { StationCenterline } from "../pipeline/centerlineFromStations.ts";
import { centerlineFromSurveys } from "../pipeline/centerlineFromStations.ts";
import { distancesFromMouth } from "../pipeline/distancesFromMouth.ts";
import type { MouthOption } from "../geometry/types.ts";
import type { Survey } from "../survey/survey.ts";
import { decodeText, type InputFileKind } from "./fileKind.ts";
import { readCenterline, type ChannelInput } from "./readCenterline.ts";
import type { InputFile, InputFileReport } from "./types.ts";

/**
 * The columns of a delimited survey file that have no unit or are not used.
 *
 * @param file the input file
 * @param kind its kind
 * @param mapping the mapping the reader used
 * @returns missingUnits and notUsed for the file report (empty for other kinds)
 */
export function columnReport(
  file: InputFile,
  kind: InputFileKind,
  mapping: ColumnMapping,
): Pick<InputFileReport, "missingUnits" | "notUsed"> {
  if (kind !== "surveyText") return {};
  const head = headOfText(decodeText(file.content));
  const missing = missingUnits(mapping);
  const notUsed = [
    ...unusedColumns(mapping, head.headers, head.sample),
    ...missing.map((m) => ({ header: m.header, reason: `no unit in the header; add ${m.option} to use it` })),
  ];
  return { missingUnits: missing, notUsed };
}

/**
 * Without a centerline file: builds the station centerline (offered; used as the channel when
 * `use`), else orients the stations' along-channel distances by salinity.
 *
 * @param surveys the surveys read
 * @param use whether to use the built centerline as the channel
 * @param mouth the user's mouth choice for the built line (else the one mouth rule: its salinity suggestion)
 * @returns surveys (distances from the mouth when oriented), the channel if used, the offered line, notices
 */
export function placeWithoutCenterline(
  surveys: readonly Survey[],
  use: boolean,
  mouth?: MouthOption,
): {
  surveys: Survey[];
  channel?: ChannelInput;
  offered?: StationCenterline;
  notices: Array<{ code: string; message: string }>;
} {
  const offered = centerlineFromSurveys(surveys);
  const notices: Array<{ code: string; message: string }> = [];
  if (offered !== undefined && offered.properties.stationIds.length >= 3) {
    if (!use) return { surveys: [...surveys], offered, notices };
    const stations = surveys.flatMap((s) =>
      s.stations.map((st) => ({ lonLat: st.lonLat, salinity: st.salinity.accepted ? st.salinity.value : undefined })),
    );
    const read = readCenterline(JSON.stringify(offered), {
      fileName: "centerline from stations",
      stations,
      ...(mouth !== undefined ? { mouth } : {}),
    });
    if (read.channel !== undefined) {
      const left = offered.properties.leftOut;
      notices.push({
        code: "centerlineFromStations",
        message: `No centerline given: one was built from the station positions, ordered along the salinity gradient and smoothed (${offered.properties.stationIds.length} stations on it${left.length > 0 ? `; ${left.join(", ")} left off it` : ""}).${(offered.properties.sideArm?.length ?? 0) > 0 ? ` The file's along-channel distances do not count from the mouth (their salinity maximum lies inside the range): ${offered.properties.sideArm!.join(", ")} lie on a separate arm beyond it and were left off the line.` : ""}${(offered.properties.pastMouth?.length ?? 0) > 0 ? ` Past the end of the river's salinity gradient the stations turn across the estuary's axis into a side bay: ${offered.properties.pastMouth!.join(", ")} were left off the line, which ends at the bay entrance (a side bay can be as salty as the entrance, or saltier after evaporation in a dry season).` : ""} It follows the stations, not the deep channel: check it (--centerline-out saves it) and pass an edited one with --centerline, or draw one in the dashboard.`,
      });
      return { surveys: [...surveys], channel: read.channel, offered, notices };
    }
  }
  const oriented = distancesFromMouth(surveys, mouth);
  if (oriented.notice) notices.push(oriented.notice);
  return { surveys: oriented.surveys, ...(offered ? { offered } : {}), notices };
}
