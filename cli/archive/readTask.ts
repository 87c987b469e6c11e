/**
 * The other task a survey worker runs: read one survey file exactly as readInputs would
 * (readSurveyFileAs), so the files of an archive are parsed on the worker threads in parallel and
 * handed to readInputs as `preRead`. The station table is read once per worker from its bytes.
 */
import type { ImportResult, InputChoices, InputFile, InputFileKind, StationTable } from "../../analysis/index.ts";
import { detectFileKind, readStationTableFile, readSurveyFileAs } from "../../analysis/index.ts";
import { columnReport } from "../../analysis/workspace/stationPlacement.ts";
import type { TaskHandler } from "./workerPool.ts";

/** What every worker receives once for reading: the choices (plain data) and the station table file. */
export interface ReadSetup {
  choices: Omit<InputChoices, "onProgress">;
  stationFile?: InputFile;
}

/** One file to read. */
export interface ReadTask {
  file: InputFile;
}

/** The file's kind (as readInputs decides it) and, for a survey file, what it read and its column report. */
export interface ReadResult {
  kind: InputFileKind;
  result?: ImportResult;
  columns?: ReturnType<typeof columnReport>;
}

let setup: ReadSetup | undefined;
let table: StationTable | undefined;

/** Reads one survey file per task (in a worker, or inline). */
export const readTaskHandler: TaskHandler<ReadSetup, ReadTask, ReadResult> = {
  setup(data) {
    setup = data;
    table = data.stationFile ? readStationTableFile(data.stationFile, data.choices) : undefined;
  },
  run({ file }) {
    if (!setup) throw new Error("readTaskHandler: run before setup");
    const kind = setup.choices.kindByFile?.[file.name] ?? detectFileKind(file.content).kind;
    if (!kind.startsWith("survey")) return { kind };
    const result = readSurveyFileAs(file, kind, setup.choices, table);
    return { kind, result, columns: columnReport(file, kind, result.mapping) };
  },
};
