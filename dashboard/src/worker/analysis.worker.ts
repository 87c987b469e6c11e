/**
 * Analysis worker: reads the files and analyses every survey off the UI
 * thread, posting progress as it goes. A newer request supersedes an older one.
 */
import type { ImportIssue, Survey } from "../../../analysis/index.ts";
import type { WorkerRequest, WorkerResponse } from "./protocol.ts";
import type { AnalysisSettings } from "../state/settings.svelte.ts";
import type { TextFile } from "../lib/demoData.ts";
import { analyse, readChannel, readSurveys, type AnalysisResult, type Channel } from "./engine.ts";
import { briefingHtml, fileProvenance } from "./briefing.ts";
import type { ChannelOverlay } from "./overlay.ts";
import { handleImportRequest } from "../import/workerImport.ts";
import { isImportRequest } from "../import/importProtocol.ts";
import { isUnderwayRequest } from "./underwayProtocol.ts";
import { handleUnderway } from "./underwayEngine.ts";

const scope = self as unknown as DedicatedWorkerGlobalScope;

let latestId = 0;
let surveys: Survey[] = [];
let channel: Channel = undefined;
let channelOverlay: ChannelOverlay | undefined;
/** Latest analysis of each survey, kept for the briefing. */
let analyses: Array<AnalysisResult | undefined> = [];
/** The files read (survey files and centerline), for the briefing's provenance table. */
let files: TextFile[] = [];
let issues: ImportIssue[] = [];
let centerlineFile: TextFile | undefined;

function post(message: WorkerResponse): void {
  scope.postMessage(message);
}

/** Lets queued messages (a newer request) arrive between steps. */
function yieldToQueue(): Promise<void> {
  return new Promise((resolve) => setTimeout(resolve, 0));
}

function messageOf(error: unknown): string {
  return error instanceof Error ? `${error.name}: ${error.message}` : String(error);
}

async function analyseAll(id: number, settings: AnalysisSettings): Promise<void> {
  const total = surveys.length;
  for (let i = 0; i < total; i++) {
    post({ type: "progress", id, stage: `Analysing ${surveys[i].name}`, done: i * 100, total: total * 100 });
    await yieldToQueue();
    if (id !== latestId) return;
    try {
      const name = surveys[i].name;
      const { analysis, overlay } = analyse(surveys[i], channel, channelOverlay, settings, (fraction, label) =>
        post({
          type: "progress",
          id,
          stage: `${name}: ${label}`,
          done: Math.round((i + fraction) * 100),
          total: total * 100,
        }),
      );
      analyses[i] = analysis;
      post({ type: "analysis", id, surveyIndex: i, analysis, overlay });
    } catch (error) {
      post({ type: "error", id, message: `Survey "${surveys[i].name}": ${messageOf(error)}` });
    }
  }
  post({ type: "progress", id, stage: "Analysis complete", done: 1, total: 1 });
  post({ type: "done", id });
}

/** Builds the channel from a centerline file; a broken file is reported and leaves no channel. */
function useCenterline(id: number, file: TextFile | undefined): void {
  let built: ReturnType<typeof readChannel>;
  try {
    built = readChannel(file);
  } catch (error) {
    post({ type: "error", id, message: `${file?.name ?? "centerline"}: ${messageOf(error)}` });
  }
  centerlineFile = file;
  channel = built?.channel;
  channelOverlay = built?.overlay;
}

async function handle(request: WorkerRequest): Promise<void> {
  if (isImportRequest(request)) return handleImportRequest(request, post);
  if (isUnderwayRequest(request)) return handleUnderway(request, (m, transfer) => scope.postMessage(m, transfer ?? []));
  if (request.type === "briefing") {
    const done = analyses.filter((a): a is AnalysisResult => a !== undefined);
    const provenance = await fileProvenance(files, centerlineFile);
    const html = briefingHtml(done, channel, provenance, request.basemap, request.dataNotice);
    post({ type: "briefing", id: request.id, html });
    return;
  }
  latestId = request.id;
  if (request.type === "centerline") {
    useCenterline(request.id, request.centerline);
    analyses = surveys.map(() => undefined);
    post({ type: "loaded", id: request.id, surveys, issues, channel: channelOverlay });
  }
  if (request.type === "setSurveys") {
    useCenterline(request.id, request.centerline);
    surveys = request.surveys;
    files = [];
    issues = [];
    analyses = surveys.map(() => undefined);
    post({ type: "loaded", id: request.id, surveys, issues, channel: channelOverlay });
  }
  if (request.type === "load") {
    post({ type: "progress", id: request.id, stage: "Reading files", done: 0, total: 1 });
    await yieldToQueue();
    const read = readSurveys(request.surveys, (fraction) =>
      post({ type: "progress", id: request.id, stage: "Reading files", done: Math.round(fraction * 100), total: 100 }),
    );
    useCenterline(request.id, request.centerline);
    surveys = read.surveys;
    files = request.surveys;
    issues = read.issues;
    analyses = surveys.map(() => undefined);
    post({
      type: "loaded",
      id: request.id,
      surveys: read.surveys,
      issues: read.issues,
      channel: channelOverlay,
    });
  }
  await analyseAll(request.id, request.settings);
}

scope.onmessage = (event: MessageEvent<WorkerRequest>) => {
  handle(event.data).catch((error: unknown) => {
    post({ type: "error", id: event.data.id, message: messageOf(error) });
  });
};
