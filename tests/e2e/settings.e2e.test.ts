import { describe, expect, it } from "vitest";
import { screenshot, settle, skipBrowser, waitForAnalysis } from "./browser.ts";
import { suiteDashboard } from "./suite.ts";

describe.skipIf(skipBrowser)("changing an end-member in the settings re-runs the analysis", () => {
  const s = suiteDashboard();

  const feRowText = async (): Promise<string> =>
    (await s.page.locator('[data-panel="BehaviourTable"] tr', { hasText: "Fe" }).first().textContent()) ?? "";

  it("a river end-member override for Fe changes the % change shown in the behaviour table, and clearing it restores the data end-member", async () => {
    const before = await feRowText();
    expect(before).toMatch(/−9\d\.\d/);
    await s.page.locator("summary", { hasText: "Settings" }).click();
    const form = s.page.getByRole("form", { name: /End-members and precision for Fe/ });
    await form.locator('input[name="river-conc"]').fill("500");
    await form.locator('input[name="river-sd"]').fill("10");
    await form.getByRole("button", { name: "Apply to Fe" }).click();
    await waitForAnalysis(s.page);
    await settle(s.page);
    const after = await feRowText();
    // (C*0 − 500)/500 with C*0 ≈ 67 nmol/L is about −87 %, no longer about −92 %.
    expect(after).toMatch(/−8\d\.\d/);
    await screenshot(s.page, "settings-1-fe-river-override");
    await form.getByRole("button", { name: "Use data end-members" }).click();
    await waitForAnalysis(s.page);
    await settle(s.page);
    expect(await feRowText()).toMatch(/−9\d\.\d/);
  });

  it("the mouth choice and off-channel distance and keep option are saved with the workspace and come back after a reload", async () => {
    const summary = s.page.locator("summary", { hasText: "Settings" });
    if ((await s.page.locator("details.settings[open]").count()) === 0) await summary.click();
    await s.page.locator('[data-testid="mouth-select"]').selectOption("start");
    await s.page.locator('[data-testid="offchannel-input"]').fill("4300");
    await s.page.locator('[data-testid="keep-offchannel"]').check();
    await s.page.getByRole("button", { name: "Re-run analysis" }).click();
    await waitForAnalysis(s.page);
    await settle(s.page);
    // Stored in IndexedDB when the workspace changes (analysis/io workspace document).
    await s.page.waitForTimeout(1500);
    await s.page.reload({ waitUntil: "load" });
    await s.page.waitForSelector('[data-testid="data-bar"][data-workspace-ready="true"]');
    await waitForAnalysis(s.page);
    await s.page.locator("summary", { hasText: "Settings" }).click();
    await expect.poll(() => s.page.locator('[data-testid="mouth-select"]').inputValue()).toBe("start");
    expect(await s.page.locator('[data-testid="offchannel-input"]').inputValue()).toBe("4300");
    expect(await s.page.locator('[data-testid="keep-offchannel"]').isChecked()).toBe(true);
    await screenshot(s.page, "settings-2-restored-after-reload");
  });

  it("logs no console errors, page errors or off-line requests", () => {
    expect(s.errors).toEqual([]);
  });
});
