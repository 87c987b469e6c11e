/**
 * The invented demo estuary, read once when this module loads (worker/demoFiles.ts: fetched in the
 * built dashboard, inlined in the dev server and tests), so `demoBundle()` stays synchronous.
 */
import { readDemoFiles, type DemoBundle } from "../worker/demoFiles.ts";
import type { TextFile } from "../worker/protocol.ts";

export type { DemoBundle, TextFile };

const bundle = await readDemoFiles();

const copy = (f: TextFile | undefined) => (f ? { ...f } : undefined);

/** The demo files bundled into this build (new objects each call). */
export function demoBundle(): DemoBundle {
  return {
    surveys: bundle.surveys.map((f) => ({ ...f })),
    centerline: copy(bundle.centerline),
    basemap: copy(bundle.basemap),
  };
}
