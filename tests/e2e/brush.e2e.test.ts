import { describe, expect, it } from "vitest";
import { screenshot, settle, skipBrowser } from "./browser.ts";
import { suiteDashboard } from "./suite.ts";

describe.skipIf(skipBrowser)("brushing a salinity range in the mixing plot", () => {
  const s = suiteDashboard();

  it("dragging across salinities in the mixing plot names the channel stretch in km and shades it on the map", async () => {
    const box = (await s.page.locator('[data-panel="MixingPlot"] svg').first().boundingBox())!;
    const y = box.y + box.height * 0.5;
    await s.page.mouse.move(box.x + box.width * 0.35, y);
    await s.page.mouse.down();
    await s.page.mouse.move(box.x + box.width * 0.5, y, { steps: 6 });
    await s.page.mouse.move(box.x + box.width * 0.62, y, { steps: 6 });
    await s.page.mouse.up();
    await settle(s.page);
    const status = s.page.locator('[data-testid="brush-status"]');
    await status.waitFor();
    expect((await status.textContent()) ?? "").toMatch(/Salinity \d+\.\d–\d+\.\d lies at km\s+\d+\.\d–\d+\.\d/);
    await screenshot(s.page, "brush-1-salinity-range-on-channel");
  });

  it("logs no console errors, page errors or off-line requests", () => {
    expect(s.errors).toEqual([]);
  });
});
