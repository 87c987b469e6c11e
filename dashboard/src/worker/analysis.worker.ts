/**
 * Analysis worker: reads the files and analyses every survey off the UI
 * thread, posting progress as it goes. A newer request supersedes an older one.
 */
import type { Survey } from "../../../analysis/index.ts";
import type { WorkerRequest, WorkerResponse } from "./protocol.ts";
import type { AnalysisSettings } from "../state/settings.svelte.ts";
import { analyse, readChannel, readSurveys, type Channel } from "./engine.ts";
import type { ChannelOverlay } from "./overlay.ts";

const scope = self as unknown as DedicatedWorkerGlobalScope;

let latestId = 0;
let surveys: Survey[] = [];
let channel: Channel = undefined;
let channelOverlay: ChannelOverlay | undefined;

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
      post({ type: "analysis", id, surveyIndex: i, analysis, overlay });
    } catch (error) {
      post({ type: "error", id, message: `Survey "${surveys[i].name}": ${messageOf(error)}` });
    }
  }
  post({ type: "progress", id, stage: "Analysis complete", done: 1, total: 1 });
  post({ type: "done", id });
}

async function handle(request: WorkerRequest): Promise<void> {
  latestId = request.id;
  if (request.type === "load") {
    post({ type: "progress", id: request.id, stage: "Reading files", done: 0, total: 1 });
    await yieldToQueue();
    const read = readSurveys(request.surveys, (fraction) =>
      post({ type: "progress", id: request.id, stage: "Reading files", done: Math.round(fraction * 100), total: 100 }),
    );
    let built: ReturnType<typeof readChannel>;
    try {
      built = readChannel(request.centerline);
    } catch (error) {
      post({
        type: "error",
        id: request.id,
        message: `${request.centerline?.name ?? "centerline"}: ${messageOf(error)}`,
      });
    }
    surveys = read.surveys;
    channel = built?.channel;
    channelOverlay = built?.overlay;
    post({
      type: "loaded",
      id: request.id,
      surveys: read.surveys,
      issues: read.issues,
      channel: built?.overlay,
    });
  }
  await analyseAll(request.id, request.settings);
}

scope.onmessage = (event: MessageEvent<WorkerRequest>) => {
  handle(event.data).catch((error: unknown) => {
    post({ type: "error", id: event.data.id, message: messageOf(error) });
  });
};
