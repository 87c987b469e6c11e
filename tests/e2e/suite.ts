// The per-describe dashboard set-up of the browser tests (kept apart from browser.ts, which the benchmarks
// import outside vitest).
import { afterAll, beforeAll } from "vitest";
import { openReadyDashboard, type Session } from "./browser.ts";

/**
 * A dashboard for the tests of one describe block: opened before them (by `open`, default
 * {@link openReadyDashboard}) and closed after them. Call inside the describe callback; the
 * returned session forwards to the one opened.
 */
export function suiteDashboard(open: () => Promise<Session> = openReadyDashboard, timeoutMs?: number): Session {
  let live: Session | undefined;
  const now = (): Session => {
    if (!live)
      throw new Error("suiteDashboard(): the dashboard is not open (used outside the describe block's tests?)");
    return live;
  };
  beforeAll(async () => {
    live = await open();
  }, timeoutMs);
  afterAll(async () => {
    await live?.close();
  });
  return {
    get context() {
      return now().context;
    },
    get page() {
      return now().page;
    },
    get url() {
      return now().url;
    },
    get errors() {
      return now().errors;
    },
    close: () => now().close(),
  };
}
