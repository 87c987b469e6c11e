import { describe, expect, it } from "vitest";
import { screenshot, settle, skipBrowser } from "./browser.ts";
import { suiteDashboard } from "./suite.ts";

describe.skipIf(skipBrowser)(
  "speciation panel names its constant sets by their literature and states their limits",
  () => {
    const s = suiteDashboard();

    it("shows literature-named Fe(III) and Cd sets, the pH scale, the Fe(OH)₃⁰ upper limit and the Davies validity range", async () => {
      const panel = s.page.locator('[data-panel="SpeciationPanel"]');
      await panel.scrollIntoViewIfNeeded();
      await settle(s.page);
      const text = (await panel.textContent()) ?? "";
      expect(text).toContain("Baes & Mesmer 1976");
      expect(text).toContain("Stefánsson 2007");
      expect(text).toContain("Liu & Millero 2002");
      expect(text).toMatch(/pH scale: activity scale/);
      expect(text).toMatch(/upper limit/);
      expect(text).toMatch(/Davies equation.*0\.5 mol\/kg/);
      expect(text).not.toMatch(/WATEQ|PHREEQC|ThermoChimie|MINTEQ|llnl|\.dat\b/i);
      await panel.locator("[data-testid='cd-set-note']").scrollIntoViewIfNeeded();
      await settle(s.page);
      await screenshot(s.page, "speciation-1-constant-sets");
    });

    it("logs no console errors, page errors or off-line requests", () => {
      expect(s.errors).toEqual([]);
    });
  },
);
