import { readFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { screenshot, SCREENSHOT_DIR, selectionStatus, settle, skipBrowser } from "./browser.ts";
import { suiteDashboard } from "./suite.ts";

describe.skipIf(skipBrowser)("survey comparison view and the briefing download", () => {
  const s = suiteDashboard();

  it("Compare surveys shows both invented surveys in the intrusion table and the Fe zone shift with its interval statement", async () => {
    await s.page.getByRole("button", { name: "Compare surveys" }).click();
    const view = s.page.locator('[data-testid="compare-view"]');
    await view.waitFor();
    const table = view.locator('[data-testid="compare-table"]');
    await expect(table.locator('tr[data-survey="wet-2025-03"]').count()).resolves.toBe(1);
    await expect(table.locator('tr[data-survey="dry-2025-09"]').count()).resolves.toBe(1);
    const fe = table.locator('table.shift[data-constituent="Fe"]');
    await fe.waitFor();
    const feText = (await fe.textContent()) ?? "";
    expect(feText).toContain("landward end (km from mouth)");
    expect(feText).toMatch(/larger than the uncertainty|within the uncertainty/);
    const statements = (await table.locator('[data-testid="shift-statements"]').textContent()) ?? "";
    expect(statements).toMatch(/Fe reaction zone, landward end, moved landward by \d+ km/);
    await screenshot(s.page, "compare-1-view");
    await fe.screenshot({ path: join(SCREENSHOT_DIR, "compare-1b-fe-shift-table.png") });
  });

  it("the overlaid mixing diagram draws two series (one per survey) with a legend naming both", async () => {
    const plot = s.page.locator('[data-testid="compare-plot"]');
    await expect(plot.getAttribute("data-series")).resolves.toBe("2");
    await expect(plot.locator("g.series").count()).resolves.toBe(2);
    const legend = (await plot.locator(".legend").textContent()) ?? "";
    expect(legend).toContain("wet-2025-03");
    expect(legend).toContain("dry-2025-09");
    await expect(s.page.locator('[data-testid="compare-map"] path.zone').count()).resolves.toBeGreaterThan(1);
  });

  it("selections are shared with the main view: a point clicked in the comparison selects that station, a constituent chosen there is the header's", async () => {
    await s.page
      .locator('[data-testid="compare-plot"] g.series[data-survey="wet-2025-03"] [data-station-id="W12"]')
      .click();
    await settle(s.page);
    expect(await selectionStatus(s.page)).toBe("Selected: W12");
    await s.page.locator('[data-testid="compare-table"] table.classes button', { hasText: /^Ba$/ }).click();
    await expect(s.page.locator('[data-testid="constituent-select"]').inputValue()).resolves.toBe("Ba");
    await expect(s.page.locator('table.shift[data-constituent="Ba"]').count()).resolves.toBe(1);
    await screenshot(s.page, "compare-2-linked-Ba");
  });

  it("Briefing downloads one self-contained HTML document with the findings, the comparison and the cautions", async () => {
    const [download] = await Promise.all([
      s.page.waitForEvent("download", { timeout: 60_000 }),
      s.page.getByRole("button", { name: "Briefing" }).click(),
    ]);
    expect(download.suggestedFilename()).toMatch(/^briefing-.*\.html$/);
    const doc = readFileSync(await download.path(), "utf8");
    expect(doc.startsWith("<!DOCTYPE html>") || doc.startsWith("<!doctype html>")).toBe(true);
    expect(doc).toContain("<h3>Findings</h3>");
    expect(doc).toContain("Comparison of the surveys");
    expect(doc).toContain("<h2>Cautions</h2>");
    expect(doc).toContain("Screening analysis, not a compliance assessment");
    expect(doc).toContain("INVENTED DEMO DATA");
    expect(doc).toContain("wet-2025-03");
    expect(doc).toContain("dry-2025-09");
    expect(doc).not.toMatch(/<script\b/i);
  });

  it("logs no console errors, page errors or off-line requests", () => {
    expect(s.errors).toEqual([]);
  });
});
