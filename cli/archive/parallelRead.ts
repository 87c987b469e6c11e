/**
 * Reading an archive's survey files on the worker threads that will analyse them: the workers are
 * started before reading, each parses whole files (largest first) exactly as readInputs would, and
 * readInputs then takes those results (`preRead`) and does the rest (station table, centerline,
 * reports) on this thread. Falls back to reading everything here when that cannot be the same.
 */
import type { CommandIo } from "../command.ts";
import type { PreReadFiles, WorkspaceInputs } from "../../analysis/index.ts";
import type { OptionValues } from "../options.ts";
import { loadWorkspace, workspaceFiles } from "../workspace.ts";
import { surveyWorkerUrl } from "./analyzeArchive.ts";
import { readTaskHandler, type ReadResult, type ReadSetup, type ReadTask } from "./readTask.ts";
import { runPool, stopWorkers, type StartedWorkers } from "./workerPool.ts";
import { phaseMark } from "./phaseLog.ts";

/**
 * loadWorkspace with the survey files parsed on the started workers (kept running for the analysis).
 *
 * @param started workers from startWorkersEarly; none: everything is read on this thread
 * @throws InputError as loadWorkspace; on any error the started workers are ended
 */
export async function loadWorkspaceOnWorkers(
  paths: readonly string[],
  values: OptionValues,
  io: CommandIo,
  started?: StartedWorkers,
): Promise<WorkspaceInputs> {
  try {
    if (!started || started.workers.length === 0) return loadWorkspace(paths, values, io);
    const { files, choices } = workspaceFiles(paths, values);
    const given = choices.kindByFile ?? {};
    const tasks: ReadTask[] = files
      .filter((f) => given[f.name] !== "stationTable" && given[f.name] !== "centerline")
      .map((file) => ({ file }));
    if (tasks.length < 2) return loadWorkspace(paths, values, io, { files, choices, preRead: new Map() });
    const stationFile = files.find((f) => given[f.name] === "stationTable");
    const { onProgress: _p, ...plain } = choices;
    phaseMark("files read from disk; parsing");
    const results = await runPool<ReadSetup, ReadTask, ReadResult>({
      workerUrl: surveyWorkerUrl(),
      threads: started.workers.length,
      alsoHere: true,
      // A few long tasks: whichever thread is free takes the next file (no file held in hand).
      sharedQueue: true,
      started,
      handler: "read",
      keepStarted: true,
      setup: { choices: plain, ...(stationFile ? { stationFile } : {}) },
      tasks,
      cost: (t) => t.file.content.length,
      inline: readTaskHandler,
    });
    // Without --stations, a station table among the files would be joined to every survey: the
    // workers did not know it, so such inputs are read again here.
    if (!stationFile && results.some((r) => r.kind === "stationTable")) return loadWorkspace(paths, values, io);
    phaseMark("files parsed");
    const preRead = new Map<string, ReadResult>();
    tasks.forEach((t, i) => {
      const r = results[i]!;
      if (r.result) preRead.set(t.file.name, r);
    });
    return loadWorkspace(paths, values, io, { files, choices, preRead: preRead as PreReadFiles });
  } catch (error) {
    await stopWorkers(started);
    throw error;
  }
}
