// Worker entry when the CLI runs from its TypeScript sources (tests, tsx): registers tsx in this
// worker thread, then loads the TypeScript worker. The built CLI uses cli/dist/surveyWorker.js.
import { register } from "tsx/esm/api";

register();
await import("./surveyWorker.ts");
