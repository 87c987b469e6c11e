/**
 * Cold start order (issue 17): the survey on screen is analysed and drawn first; the other surveys are
 * analysed after its first view (and the map's first idle), and the views that need every survey
 * (Compare, the briefing) say how many are done until then. A fresh browser profile, so nothing comes
 * from the result cache. No timing is asserted, only the order. Demo data are invented.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import {
  missingBrowserMessage,
  openDashboard,
  skipBrowser,
  waitForAnalysis,
  waitForFirstView,
  waitForMap,
  type Session,
} from "./browser.ts";

describe.skipIf(skipBrowser)("cold start: the survey on screen first, the other surveys after its first view", () => {
  let s: Session;
  let atFirstView: { analysed: string; briefing: string; mixing: boolean };

  beforeAll(async () => {
    const missing = missingBrowserMessage();
    if (missing) throw new Error(missing);
    s = await openDashboard();
    // Read in the page, in the first frame that shows the survey on screen analysed (not a later round trip).
    const first = await s.page.waitForFunction(
      () =>
        document.querySelector('[data-active-analysis="ready"]')
          ? {
              analysed: document.querySelector("[data-surveys-analysed]")?.getAttribute("data-surveys-analysed") ?? "",
              briefing: document.querySelector('[data-testid="briefing-status"]')?.textContent ?? "",
              mixing: document.querySelector('[data-panel="MixingPlot"] svg') !== null,
            }
          : false,
      undefined,
      { polling: "raf", timeout: 90_000 },
    );
    atFirstView = (await first.jsonValue()) as typeof atFirstView;
    await waitForFirstView(s.page);
    await waitForMap(s.page);
    await waitForAnalysis(s.page);
  });

  afterAll(async () => {
    await s?.close();
  });

  it("when the survey on screen is drawn, one of the two demo surveys is analysed and the briefing says so", () => {
    expect(atFirstView.mixing).toBe(true);
    expect(atFirstView.analysed).toBe("1/2");
    expect(atFirstView.briefing).toContain("1 of 2");
  });

  it("after the first view every survey is analysed and the briefing can be made", async () => {
    await expect(s.page.getAttribute("[data-surveys-analysed]", "data-surveys-analysed")).resolves.toBe("2/2");
    await expect(s.page.locator('[data-testid="briefing-button"]').isEnabled()).resolves.toBe(true);
    await expect(s.page.locator('[data-testid="briefing-status"]').textContent()).resolves.toBe("");
  });
});
