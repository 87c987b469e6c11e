import { readFile } from "node:fs/promises";
import { describe, expect, it } from "vitest";
import { openReadyDashboard, screenshot, settle, skipBrowser, waitForAnalysis } from "./browser.ts";
import { suiteDashboard } from "./suite.ts";
import { BAY_DIR, bayFilesPresent, importBayCruise2018 } from "./bayFiles.ts";

if (!bayFilesPresent) console.warn(`realData.e2e: skipped, ${BAY_DIR} is absent`);

/** Demo station ids and survey names (invented, data-demo/). */
const DEMO_SURVEYS = ["wet-2025-03", "dry-2025-09"];

describe.skipIf(skipBrowser || !bayFilesPresent)(
  "the raw San Francisco Bay cruise export through the dashboard",
  () => {
    const s = suiteDashboard(openReadyDashboard, 120_000);

    it("importing the cruise file with its station table asks for the unit-less nutrients' units", async () => {
      await expect(s.page.locator('[data-testid="demo-banner"]').count()).resolves.toBe(1);
      const dialog = await importBayCruise2018(s.page);
      // Oxygen is not a mixing tracer: given its unit it is drawn along the channel without end-members.
      await dialog.locator('tr[data-header="Oxygen"] input[aria-label^="Unit"]').fill("mg/L");
      await screenshot(s.page, "realdata-1-mapping-dialog");
      await dialog.locator('[data-testid="mapping-confirm"]').click();
      await s.page.locator('[data-testid="import-report"]').waitFor({ timeout: 60_000 });
      const notUsed = (await s.page.locator('[data-testid="not-used"]').first().textContent()) ?? "";
      console.log(`realData.e2e: not used: ${notUsed.replace(/\s+/g, " ").slice(0, 400)}`);
      expect(notUsed).toMatch(/Oxygen/);
      const [download] = await Promise.all([
        s.page.waitForEvent("download"),
        s.page.locator('[data-testid="mapping-download"]').first().click(),
      ]);
      expect(download.suggestedFilename()).toBe("2018SanFranciscoBayWaterQualityData.mapping.json");
      const mapping = JSON.parse(await readFile((await download.path())!, "utf8")) as {
        columns: Array<{ header: string; unit?: string }>;
      };
      expect(mapping.columns.find((c) => c.header === "Silicate")?.unit).toBe("µmol/L");
      await screenshot(s.page, "realdata-2-import-report");
      await s.page.locator('[data-testid="data-toggle"]').click();
    }, 120_000);

    it("the demo leaves: no banner, no demo surveys; the 2018 cruises are the surveys", async () => {
      await s.page.waitForFunction(
        (demo) => {
          const el = document.querySelector('[data-testid="survey-select"]') as HTMLSelectElement | null;
          const names = [...(el?.options ?? [])].map((o) => o.text);
          return names.length > 3 && !names.some((n) => demo.includes(n));
        },
        DEMO_SURVEYS,
        { timeout: 90_000 },
      );
      await waitForAnalysis(s.page);
      await expect(s.page.locator('[data-testid="demo-banner"]').count()).resolves.toBe(0);
      const names = await s.page
        .locator('[data-testid="survey-select"] option')
        .evaluateAll((els) => els.map((e) => e.textContent ?? ""));
      console.log(`realData.e2e: ${names.length} surveys: ${names.slice(0, 4).join(", ")} …`);
      expect(names.some((n) => DEMO_SURVEYS.includes(n))).toBe(false);
    }, 120_000);

    it("a winter transect shows a silicate mixing plot, and the map is zoomed to the bay", async () => {
      const names = await s.page
        .locator('[data-testid="survey-select"] option')
        .evaluateAll((els) => els.map((e) => (e as HTMLOptionElement).value + "\t" + (e.textContent ?? "")));
      const winter = names.find((n) => /2018-0?[12]-|Jan|Feb|2018-01|2018-02/.test(n)) ?? names[0]!;
      await s.page.locator('[data-testid="survey-select"]').selectOption(winter.split("\t")[0]!);
      await waitForAnalysis(s.page);
      const constituents = await s.page
        .locator('[data-testid="constituent-select"] option')
        .evaluateAll((els) => els.map((e) => (e as HTMLOptionElement).value));
      console.log(`realData.e2e: constituents ${constituents.join(", ")}`);
      const silicate = constituents.find((c) => /^(Si|Silicate)\b/i.test(c));
      expect(silicate, constituents.join(", ")).toBeDefined();
      await s.page.locator('[data-testid="constituent-select"]').selectOption(silicate!);
      await waitForAnalysis(s.page);
      await settle(s.page);
      const plot = s.page.locator("figure.mixing-plot svg title", { hasText: /Si|Silicate/ });
      await plot.first().waitFor({ state: "attached" });
      const points = await s.page.locator("figure.mixing-plot svg [aria-label]").count();
      console.log(`realData.e2e: winter survey ${winter.split("\t")[1]}: ${points} labelled points in the mixing plot`);
      expect(points).toBeGreaterThan(5);
      // The map is framed on the bay (about 122.5–121.7 °W, 37.4–38.2 °N), not the invented estuary.
      const centre = await s.page.evaluate(
        () =>
          (window as unknown as { __brackline?: { mapCenter?(): [number, number] } }).__brackline?.mapCenter?.() ??
          null,
      );
      if (centre) {
        expect(centre[0]).toBeGreaterThan(-123);
        expect(centre[0]).toBeLessThan(-121.5);
        expect(centre[1]).toBeGreaterThan(37.2);
        expect(centre[1]).toBeLessThan(38.4);
      }
      const variables = await s.page
        .locator('[data-testid="variables"] figure')
        .evaluateAll((els) => els.map((e) => e.getAttribute("data-variable")));
      console.log(`realData.e2e: along-channel variables: ${variables.join(", ")}`);
      expect(variables.length).toBeGreaterThan(0);
      const selected = await s.page.locator('[data-testid="constituent-select"]').inputValue();
      expect(selected).not.toMatch(/oxygen|O2/i);
      const row =
        (await s.page
          .locator("table tr", { hasText: /^\s*Si\b/ })
          .first()
          .textContent()) ?? "";
      console.log(`realData.e2e: behaviour row: ${row.replace(/\s+/g, " ")}`);
      await screenshot(s.page, "realdata-3-winter-silicate");
    }, 120_000);

    it("without a centerline the one built from the stations is the channel (as in the CLI): on-channel stations get km, off-channel ones say how far off", async () => {
      const built = s.page.locator('[data-testid="station-centerline-built"]');
      await built.waitFor();
      await waitForAnalysis(s.page);
      const notes = ((await s.page.locator('[data-testid="channel-notices"]').textContent()) ?? "").replace(
        /\s+/g,
        " ",
      );
      console.log(`realData.e2e: channel notices: ${notes.slice(0, 500)}`);
      expect(await s.page.locator('[data-testid="use-offered-centerline"]').count()).toBe(0);
      const rows = await s.page
        .locator("nav.stations li button")
        .evaluateAll((els) =>
          els.map((e) => [e.querySelector(".id")?.textContent ?? "", e.querySelector(".km")?.textContent ?? ""]),
        );
      console.log(`realData.e2e: station list: ${rows.map((r) => r.join(" ")).join("; ")}`);
      const onChannel = rows.filter(([, km]) => / km$/.test(km) && !/off channel/.test(km));
      const offChannel = rows.filter(([, km]) => /off channel/.test(km));
      // Every station is either placed along the channel or said to be off it; none shows a bare "0.0 km" off it.
      expect(onChannel.length + offChannel.length).toBe(rows.length);
      expect(onChannel.length).toBeGreaterThan(5);
      for (const [, km] of offChannel) expect(km).toMatch(/^off channel, \d+\.\d km away$/);
      // The list follows the channel from the mouth (the export lists South Bay first): on-channel
      // stations in ascending km, the off-channel ones after them.
      const firstOff = rows.findIndex(([, km]) => /off channel/.test(km));
      expect(firstOff).toBe(onChannel.length);
      const kms = onChannel.map(([, km]) => Number.parseFloat(km));
      expect(kms).toEqual([...kms].sort((a, b) => a - b));
      await settle(s.page);
      await screenshot(s.page, "realdata-4-station-centerline");
    }, 120_000);

    it("the station-built centerline opens in the draw tool's edit mode with its vertices", async () => {
      await s.page.locator('[data-testid="edit-station-centerline"]').click();
      const panel = s.page.locator('[data-testid="draw-panel"]');
      await expect.poll(() => panel.getAttribute("data-draw-mode")).toBe("editing");
      const vertices = Number(await panel.getAttribute("data-vertices"));
      console.log(`realData.e2e: station-built line opened for editing with ${vertices} vertices`);
      expect(vertices).toBeGreaterThan(5);
      await expect
        .poll(async () => (await s.page.locator('[data-testid="drawn-length"]').textContent()) ?? "")
        .toMatch(/\d+\.\d km from the mouth/);
      await settle(s.page);
      await screenshot(s.page, "realdata-4b-station-centerline-editing");
      await s.page.getByRole("button", { name: "Hide line" }).click();
    }, 120_000);

    it("Compare uses the two surveys chosen in the survey picker", async () => {
      await s.page.locator('[data-testid="survey-picker"] summary').click();
      await s.page.locator('[data-testid="survey-picker"] select').selectOption(["2018-01-10", "2018-02-07"]);
      await s.page.locator('[data-testid="survey-picker"] summary').click();
      await s.page.getByRole("button", { name: "Compare surveys" }).click();
      const heading = (await s.page.locator('[data-testid="compare-view"] h2').first().textContent()) ?? "";
      expect(heading).toBe("Compare surveys: 2018-01-10 and 2018-02-07");
      // The comparison table is made for exactly these two surveys (the worker compares the chosen ones).
      const table = s.page.locator('[data-testid="compare-view"] table').first();
      await table.waitFor({ timeout: 90_000 });
      const text = (await s.page.locator('[data-testid="compare-view"]').textContent()) ?? "";
      expect(text).toContain("2018-02-07");
      expect(text).not.toMatch(/2018-0[3-9]-\d\d|2018-1[0-2]-\d\d/);
      await settle(s.page);
      await screenshot(s.page, "realdata-5-compare");
      expect(s.errors).toEqual([]);
    }, 120_000);
  },
);
