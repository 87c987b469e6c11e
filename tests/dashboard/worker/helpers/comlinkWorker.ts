/**
 * The worker API behind Comlink, as the dashboard calls it: createWorkerApi() exposed on one end of a
 * MessageChannel and wrapped on the other, as the browser worker exposes it; both ports close after
 * the test file.
 */
import { afterAll } from "vitest";
import { expose, wrap, type Remote } from "comlink";
import { createWorkerApi, type WorkerApi } from "../../../../dashboard/src/worker/api.ts";

export function comlinkWorker(): Remote<WorkerApi> {
  const channel = new MessageChannel();
  expose(createWorkerApi(), channel.port1);
  afterAll(() => {
    channel.port1.close();
    channel.port2.close();
  });
  return wrap<WorkerApi>(channel.port2);
}
