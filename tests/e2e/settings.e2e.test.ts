import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { openReadyDashboard, screenshot, settle, skipBrowser, waitForAnalysis, type Session } from "./browser.ts";

describe.skipIf(skipBrowser)("changing an end-member in the settings re-runs the analysis", () => {
  let s: Session;

  beforeAll(async () => {
    s = await openReadyDashboard();
  });

  afterAll(async () => {
    await s?.close();
  });

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

  it("logs no console errors, page errors or off-line requests", () => {
    expect(s.errors).toEqual([]);
  });
});
