import { existsSync } from "node:fs";
import { readFile } from "node:fs/promises";
import { join } from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { openReadyDashboard, settle, skipBrowser, waitForAnalysis, type Session } from "./browser.ts";
import {
  northBayCenterline,
  northBayNutrientTransects,
  SF_DIR,
  SF_PRESENT,
  STATION_FILE,
} from "../archive/helpers/sfBayArchive.ts";

// The archive view over real cruises: the 2017 and 2018 exports of the USGS San Francisco Bay water-quality
// program with its station table (Schraga & Cloern, 2017, Sci. Data 4:170098;
// ../shared/data/usgs-sfbay-2016-2022/SOURCE.md), read at test time, never copied into the
// repository, with a centerline through the North-Bay channel stations (tests/archive/helpers).
const CRUISES = ["2017ver.3.0SanFranciscoBayWaterQualityData.csv", "2018SanFranciscoBayWaterQualityData.csv"];
const present = SF_PRESENT && CRUISES.every((f) => existsSync(join(SF_DIR, f)));
if (!present) console.warn(`archiveView.e2e: skipped, ${SF_DIR} is absent`);

/** Nutrient columns whose headers carry no unit: µmol/L, as printed in the 2020–2022 headers (SOURCE.md). */
const UNITLESS = ["Silicate", "Nitrate_+_Nitrite", "Phosphate", "Ammonium", "Nitrite"];
const SHOTS = "/tmp";

async function fileInput(name: string) {
  return { name, mimeType: "text/csv", buffer: await readFile(join(SF_DIR, name)) };
}

describe.skipIf(skipBrowser || !present)("the survey archive view over the 2017–2018 San Francisco Bay cruises", () => {
  let s: Session;
  let silicate = "";

  beforeAll(async () => {
    s = await openReadyDashboard();
  }, 120_000);

  afterAll(async () => {
    await s?.close();
  });

  it("imports the 2017 and 2018 cruises with the station table and a North-Bay centerline", async () => {
    const line = {
      name: "north-bay-channel.geojson",
      mimeType: "application/geo+json",
      buffer: Buffer.from(northBayCenterline()),
    };
    await s.page
      .locator('[data-testid="import-input"]')
      .setInputFiles([...(await Promise.all(CRUISES.map(fileInput))), await fileInput(STATION_FILE), line]);
    const dialog = s.page.locator('[data-testid="mapping-dialog"][open]');
    await dialog.waitFor({ timeout: 60_000 });
    for (const header of UNITLESS) {
      const unit = dialog.locator(`tr[data-header="${header}"] input[aria-label^="Unit"]`);
      if ((await unit.count()) === 0) continue;
      if ((await unit.inputValue()).trim() === "") await unit.fill("µmol/L");
    }
    const oxygen = dialog.locator('tr[data-header="Oxygen"] input[aria-label^="Unit"]');
    if ((await oxygen.count()) > 0) await oxygen.fill("mg/L");
    await dialog.locator('[data-testid="mapping-confirm"]').click();
    await s.page.locator('[data-testid="import-report"]').waitFor({ timeout: 60_000 });
    await s.page.locator('[data-testid="data-toggle"]').click();
    await s.page.waitForFunction(
      () => {
        const el = document.querySelector('[data-testid="survey-select"]') as HTMLSelectElement | null;
        return [...(el?.options ?? [])].some((o) => o.text.startsWith("2018-"));
      },
      undefined,
      { timeout: 90_000 },
    );
    await waitForAnalysis(s.page);
  }, 240_000);

  it("the archive view has a silicate mark for every 2017–2018 North-Bay transect", async () => {
    const toggle = s.page.locator('[data-testid="archive-toggle"]');
    await expect(toggle.isDisabled()).resolves.toBe(false);
    await toggle.click();
    await s.page.locator('[data-testid="archive-view"][data-status="ready"]').waitFor({ timeout: 60_000 });
    const names = await s.page
      .locator('[data-testid="archive-multiple"]')
      .evaluateAll((els) => els.map((e) => e.getAttribute("data-constituent") ?? ""));
    console.log(`archiveView.e2e: small multiples ${names.join(", ")}`);
    silicate = names.find((n) => /^(Si|Silicate)\b/i.test(n)) ?? "";
    expect(silicate, names.join(", ")).not.toBe("");
    const marks = await s.page
      .locator(`[data-testid="archive-multiple"][data-constituent="${silicate}"] g.pt`)
      .evaluateAll((els) => els.map((e) => e.getAttribute("data-date") ?? ""));
    const transects = northBayNutrientTransects().filter((d) => d.startsWith("2017-") || d.startsWith("2018-"));
    console.log(
      `archiveView.e2e: ${marks.length} silicate marks; North-Bay transects 2017–2018: ${transects.join(", ")}`,
    );
    expect(transects.length).toBeGreaterThan(3);
    for (const d of transects) expect(marks, d).toContain(d);
    await expect(s.page.locator('[data-testid="archive-legend"]').textContent()).resolves.toMatch(/winter/);
    await expect(s.page.locator('[data-testid="archive-view"] .caution').textContent()).resolves.toMatch(/screening/i);
    await expect(s.page.locator('[data-testid="archive-strip"]').count()).resolves.toBe(1);
    // pointing at a mark highlights that survey in every panel and names it under the legend
    const first = s.page.locator(`[data-testid="archive-multiple"][data-constituent="${silicate}"] g.pt`).last();
    const name = (await first.getAttribute("data-survey")) ?? "";
    await first.locator("path").hover();
    await expect(s.page.locator('[data-testid="archive-hover"]').textContent()).resolves.toContain(name);
    await expect(
      s.page.locator(`[data-testid="archive-strip"] g.col.hov[data-survey="${name}"]`).count(),
    ).resolves.toBe(1);
    await settle(s.page);
    await s.page.screenshot({ path: `${SHOTS}/archview-1-archive-1440.png` });
  }, 120_000);

  it("brushing a period chooses its surveys in the shared selection: table, zone map, mixing overlay, survey picker", async () => {
    const pickerBefore = (await s.page.locator('[data-testid="survey-picker"] summary').textContent()) ?? "";
    const svg = s.page.locator(`[data-testid="archive-multiple"][data-constituent="${silicate}"] svg`);
    const box = (await svg.boundingBox())!;
    const y = box.y + box.height * 0.5;
    await s.page.mouse.move(box.x + box.width * 0.3, y);
    await s.page.mouse.down();
    await s.page.mouse.move(box.x + box.width * 0.5, y, { steps: 4 });
    await s.page.mouse.move(box.x + box.width * 0.7, y, { steps: 4 });
    await s.page.mouse.up();
    const chosen = s.page.locator('[data-testid="archive-chosen"]');
    await s.page.waitForFunction(
      () => Number(document.querySelector('[data-testid="archive-chosen"]')?.getAttribute("data-count")) > 0,
    );
    const count = Number(await chosen.getAttribute("data-count"));
    const rows = await chosen.locator("tbody tr").count();
    // the table draws the first 25 chosen surveys until "Show all" is pressed
    expect(rows).toBe(Math.min(count, 25));
    const pickerAfter = (await s.page.locator('[data-testid="survey-picker"] summary').textContent()) ?? "";
    console.log(`archiveView.e2e: brushed ${count} surveys; picker "${pickerBefore}" → "${pickerAfter}"`);
    expect(pickerAfter).toContain(`${count} of`);
    expect(pickerAfter).not.toBe(pickerBefore);
    await expect(chosen.locator('[data-testid="compare-map"]').count()).resolves.toBe(1);
    await expect(chosen.locator('[data-testid="compare-plot"]').count()).resolves.toBe(1);
    const note = s.page.locator('[data-testid="map-chosen-zones"]');
    await expect(note.textContent()).resolves.toContain(`${count} surveys chosen`);
    console.log(
      `archiveView.e2e: main map: ${(await note.textContent())?.replace(/\s+/g, " ")}; ${await note.getAttribute("data-paths")} zone stretches`,
    );
    expect(Number(await note.getAttribute("data-paths"))).toBeGreaterThan(0);
    // deck.gl, loaded on demand for the zones, has drawn them over the map.
    await s.page.waitForSelector('[data-dense-drawn~="archive-chosen-zones"]', { timeout: 60_000 });
    const dimmed = await s.page.locator('[data-testid="archive-strip"] g.col.dim').count();
    expect(dimmed).toBeGreaterThan(0);
    await settle(s.page);
    await s.page.screenshot({ path: `${SHOTS}/archview-2-brushed-1440.png`, fullPage: true });
    await s.page.setViewportSize({ width: 1280, height: 800 });
    await settle(s.page);
    await s.page.screenshot({ path: `${SHOTS}/archview-3-brushed-1280.png` });
    await s.page.locator('[data-testid="archive-findings"]').scrollIntoViewIfNeeded();
    await s.page.screenshot({ path: `${SHOTS}/archview-3b-findings-1280.png` });
    await s.page.locator('[data-testid="archive-chosen"]').scrollIntoViewIfNeeded();
    await s.page.screenshot({ path: `${SHOTS}/archview-4-chosen-1280.png` });
    await s.page.setViewportSize({ width: 1440, height: 900 });
  }, 120_000);

  it("a period typed in the date fields (keyboard) chooses the surveys dated inside it", async () => {
    await s.page.locator('[data-testid="archive-from"]').fill("2018-06-01");
    await s.page.locator('[data-testid="archive-to"]').fill("2018-08-31");
    await s.page.locator('[data-testid="archive-to"]').dispatchEvent("change");
    await s.page.waitForFunction(() =>
      document.querySelector('[data-testid="archive-chosen"] h3 span')?.textContent?.includes("2018-06"),
    );
    const dates = await s.page
      .locator('[data-testid="archive-chosen-table"] tbody tr td:first-of-type')
      .evaluateAll((els) => els.map((e) => e.textContent ?? ""));
    console.log(`archiveView.e2e: typed period chose ${dates.join(", ")}`);
    expect(dates.length).toBeGreaterThan(0);
    for (const d of dates) expect(d >= "2018-06-01" && d <= "2018-08-31", d).toBe(true);
  }, 60_000);

  it("an invented discharge table is joined by date: the scatter appears, a box on it chooses surveys; seasons edited", async () => {
    // INVENTED flows (not measurements): a smooth wet-winter, dry-autumn cycle, one row a day, 2016-12-01 … 2018-12-31.
    const lines = ["date,discharge m3/s"];
    for (let d = Date.UTC(2016, 11, 1); d <= Date.UTC(2018, 11, 31); d += 86_400_000) {
      const doy = (d - Date.UTC(new Date(d).getUTCFullYear(), 0, 1)) / 86_400_000;
      lines.push(
        `${new Date(d).toISOString().slice(0, 10)},${(300 + 1200 * Math.max(0, Math.cos((2 * Math.PI * (doy - 30)) / 365))).toFixed(1)}`,
      );
    }
    await s.page.locator('[data-testid="discharge-table-input"]').setInputFiles({
      name: "invented-flows-not-measured.csv",
      mimeType: "text/csv",
      buffer: Buffer.from(lines.join("\n")),
    });
    const status = s.page.locator('[data-testid="discharge-table-status"]');
    await status.waitFor({ timeout: 60_000 });
    const scatter = s.page.locator('[data-testid="archive-scatter"]');
    await scatter.waitFor({ timeout: 60_000 });
    console.log(`archiveView.e2e: discharge table: ${await status.textContent()}`);
    await expect(s.page.locator('[data-testid="discharge-join-rule"]').textContent()).resolves.toMatch(
      /nearest earlier day/,
    );
    expect(Number(await scatter.getAttribute("data-points"))).toBeGreaterThan(2);
    await expect(s.page.locator('[data-testid="archive-findings"] .warnings').count()).resolves.toBe(0);

    const clear = s.page.getByRole("button", { name: "Clear choice" });
    if (!(await clear.isDisabled())) await clear.click();
    await s.page.waitForFunction(
      () => Number(document.querySelector('[data-testid="archive-chosen"]')?.getAttribute("data-count") ?? 0) === 0,
    );
    await scatter.scrollIntoViewIfNeeded();
    const box = (await scatter.locator("svg").boundingBox())!;
    await s.page.mouse.move(box.x + box.width * 0.15, box.y + box.height * 0.05);
    await s.page.mouse.down();
    await s.page.mouse.move(box.x + box.width * 0.6, box.y + box.height * 0.5, { steps: 4 });
    await s.page.mouse.move(box.x + box.width * 0.98, box.y + box.height * 0.85, { steps: 4 });
    await s.page.mouse.up();
    await s.page.waitForFunction(
      () => Number(document.querySelector('[data-testid="archive-chosen"]')?.getAttribute("data-count")) > 0,
    );
    const inBox = Number(await s.page.locator('[data-testid="archive-chosen"]').getAttribute("data-count"));
    console.log(`archiveView.e2e: box on the scatter chose ${inBox} surveys`);
    expect(inBox).toBeGreaterThan(0);
    await expect(s.page.locator('[data-testid="archive-view"]').count()).resolves.toBe(1);

    const seasons = s.page.locator('[data-testid="archive-seasons"]');
    await seasons.fill("wet=Dec-Apr, dry=Apr-Nov");
    await expect(s.page.locator('[data-testid="archive-seasons-apply"]').isDisabled()).resolves.toBe(true);
    await seasons.fill("wet=Dec-Apr, transition=May-Jul, dry=Aug-Nov");
    await s.page.locator('[data-testid="archive-seasons-apply"]').click();
    await s.page.waitForFunction(() =>
      document.querySelector('[data-testid="archive-legend"]')?.textContent?.includes("transition"),
    );
    await settle(s.page);
    await s.page.screenshot({ path: `${SHOTS}/archview2-1-discharge-1440.png` });
    await s.page.setViewportSize({ width: 1280, height: 800 });
    await scatter.scrollIntoViewIfNeeded();
    await settle(s.page);
    await s.page.screenshot({ path: `${SHOTS}/archview2-2-scatter-1280.png` });
    await s.page.setViewportSize({ width: 1440, height: 900 });
  }, 120_000);

  it("clicking a mark opens that survey in the main view", async () => {
    const mark = s.page.locator(`[data-testid="archive-multiple"][data-constituent="${silicate}"] g.pt`).nth(2);
    const survey = (await mark.getAttribute("data-survey")) ?? "";
    await mark.locator("path").click();
    await s.page.locator('[data-testid="archive-view"]').waitFor({ state: "detached" });
    const value = await s.page.locator('[data-testid="survey-select"]').evaluate((el) => {
      const sel = el as HTMLSelectElement;
      return sel.options[sel.selectedIndex]?.text ?? "";
    });
    console.log(`archiveView.e2e: clicked ${survey}, survey menu shows ${value}`);
    expect(value).toContain(survey);
    await settle(s.page);
    await s.page.screenshot({ path: `${SHOTS}/archview-5-opened-1440.png` });
    expect(s.errors).toEqual([]);
  }, 120_000);
});
