import { describe, expect, it } from "vitest";
import { screenshot, type Session, settle, skipBrowser, stationPixel, waitForAnalysis, waitForMap } from "./browser.ts";
import { suiteDashboard } from "./suite.ts";

// An invented survey file with the quirks of real exports: semicolons, decimal commas, a censored
// value, an unreadable cell, a salinity header no pattern knows, and a row without a station id.
const QUIRKY_CSV = [
  "Cruise;Stn;Date;Lat;Lon;S_field;Fe (nmol/L);Mn (nmol/L)",
  "autumn-2025-11;N01;2025-11-04;45,04869;-35,30269;33,2;<0,05;3,1",
  "autumn-2025-11;N02;2025-11-04;45,05041;-35,30234;30,1;5,5;4,2",
  "autumn-2025-11;N03;2025-11-04;45,05351;-35,30693;25,4;abc;6,0",
  "autumn-2025-11;;2025-11-04;45,0600;-35,3100;12,5;30,2;9,5",
  "autumn-2025-11;N05;2025-11-04;45,0650;-35,3150;2,5;40,2;19,5",
].join("\n");

const csvFile = (name: string) => ({ name, mimeType: "text/csv", buffer: Buffer.from(QUIRKY_CSV, "utf8") });

async function selectedSurvey(s: Session): Promise<string> {
  return s.page.locator('[data-testid="survey-select"]').evaluate((el) => {
    const select = el as HTMLSelectElement;
    return select.options[select.selectedIndex]?.text ?? "";
  });
}

describe.skipIf(skipBrowser)("importing a survey file: mapping dialog, report, map, persistence after reload", () => {
  const s = suiteDashboard();

  it("a dropped semicolon file opens the mapping dialog with suggested roles, units and a preview", async () => {
    await s.page.locator('[data-testid="import-input"]').setInputFiles(csvFile("autumn.csv"));
    const dialog = s.page.locator('[data-testid="mapping-dialog"][open]');
    await dialog.waitFor();
    await expect(dialog.locator('tr[data-header="Fe (nmol/L)"] select').inputValue()).resolves.toBe("constituent");
    await expect(dialog.locator('tr[data-header="Fe (nmol/L)"] input[aria-label^="Unit"]').inputValue()).resolves.toBe(
      "nmol/L",
    );
    await expect(dialog.locator('tr[data-header="S_field"] select').inputValue()).resolves.toBe("ignore");
    expect(await dialog.locator('tr[data-header="Fe (nmol/L)"] .values').textContent()).toContain("<0,05");
    await screenshot(s.page, "import-1-mapping-dialog");
  });

  it("fixing S_field to salinity and confirming shows the report: 5 read, 4 accepted, 1 rejected, the bad Fe cell at row 4", async () => {
    const dialog = s.page.locator('[data-testid="mapping-dialog"][open]');
    await dialog.locator('tr[data-header="S_field"] select').selectOption("salinity");
    await dialog.locator('[data-testid="mapping-confirm"]').click();
    const report = s.page.locator('[data-testid="import-report"]');
    await report.waitFor();
    await expect(report.locator('[data-count="read"]').textContent()).resolves.toBe("5 rows read");
    await expect(report.locator('[data-count="accepted"]').textContent()).resolves.toBe("4 accepted");
    await expect(report.locator('[data-count="rejected"]').textContent()).resolves.toBe("1 rejected");
    await expect(report.locator('[data-count="invalid"]').textContent()).resolves.toBe("1 invalid");
    const bad = report.locator('[data-testid="issue-table"] tr[data-row="4"][data-column="Fe (nmol/L)"]');
    expect(await bad.textContent()).toContain("abc");
    const reasons = (await report.locator("ul.reasons").textContent()) ?? "";
    expect(reasons).toMatch(/1 ×/);
    await s.page.locator('[data-testid="issue-filter"]').fill("abc");
    await expect(report.locator('[data-testid="issue-table"] tbody tr').count()).resolves.toBe(1);
    await s.page.locator('[data-testid="issue-filter"]').fill("");
  });

  it("the new survey replaces the invented demo surveys, is selected, and its stations are on the map", async () => {
    await s.page.waitForFunction(() => {
      const el = document.querySelector('[data-testid="survey-select"]') as HTMLSelectElement | null;
      return el?.options[el.selectedIndex]?.text === "autumn-2025-11";
    });
    await waitForAnalysis(s.page);
    await settle(s.page);
    const options = await s.page
      .locator('[data-testid="survey-select"] option')
      .evaluateAll((els) => els.map((e) => e.textContent ?? ""));
    expect(options).toEqual(["autumn-2025-11"]);
    await expect(s.page.locator('[data-testid="demo-banner"]').count()).resolves.toBe(0);
    const p = await stationPixel(s.page, "N01");
    expect(p[0]).toBeGreaterThan(0);
    await screenshot(s.page, "import-2-report-and-map");
  });

  it("after a reload the workspace comes back from IndexedDB: the imported survey is selected and on the map", async () => {
    await s.page.waitForTimeout(1000); // the save is debounced
    await s.page.reload({ waitUntil: "load" });
    await waitForMap(s.page);
    await waitForAnalysis(s.page);
    await s.page.waitForFunction(() => {
      const el = document.querySelector('[data-testid="survey-select"]') as HTMLSelectElement | null;
      return el?.options[el.selectedIndex]?.text === "autumn-2025-11";
    });
    await settle(s.page);
    expect(await selectedSurvey(s)).toBe("autumn-2025-11");
    const p = await stationPixel(s.page, "N03");
    expect(p[1]).toBeGreaterThan(0);
    await s.page.locator('[data-testid="data-toggle"]').click();
    const earlier = (await s.page.locator('[data-testid="earlier-imports"]').textContent()) ?? "";
    expect(earlier).toContain("autumn.csv: 5 rows read, 4 accepted, 1 rejected; 2 problems");
    await screenshot(s.page, "import-3-after-reload");
  });

  it("a second file of the same shape is read without the dialog, and the report says the mapping was reused", async () => {
    await s.page.locator('[data-testid="import-input"]').setInputFiles(csvFile("autumn-copy.csv"));
    const reused = s.page.locator('[data-testid="mapping-reused"]');
    await reused.waitFor();
    expect(await reused.textContent()).toMatch(/^mapping reused from \d{4}-\d{2}-\d{2} \d{2}:\d{2} UTC$/);
    expect(await s.page.locator('[data-testid="mapping-dialog"][open]').count()).toBe(0);
    await s.page.waitForFunction(() => {
      const el = document.querySelector('[data-testid="survey-select"]') as HTMLSelectElement | null;
      return el?.options[el.selectedIndex]?.text === "autumn-2025-11 (2)";
    });
  });

  it("with “Review saved column mappings” a re-import reopens the saved mapping; a unit added there is saved and used", async () => {
    await s.page.locator('[data-testid="review-saved-mappings"]').check();
    await s.page.locator('[data-testid="import-input"]').setInputFiles(csvFile("autumn-again.csv"));
    const dialog = s.page.locator('[data-testid="mapping-dialog"][open]');
    await dialog.waitFor();
    expect(await dialog.locator('[data-testid="mapping-saved-on"]').textContent()).toMatch(/saved \d{4}-\d{2}-\d{2}/);
    // The saved mapping, not the suggestion: S_field is salinity as the user set it on the first import.
    expect(await dialog.locator('tr[data-header="S_field"] select').inputValue()).toBe("salinity");
    // Mn is re-read as µmol/L (an edit a user makes when a unit was wrong or missing).
    const mn = dialog.locator('tr[data-header="Mn (nmol/L)"] input[aria-label^="Unit"]');
    await mn.fill("µmol/L");
    await screenshot(s.page, "import-4-saved-mapping-reopened");
    await dialog.locator('[data-testid="mapping-confirm"]').click();
    await s.page.waitForFunction(() => {
      const el = document.querySelector('[data-testid="survey-select"]') as HTMLSelectElement | null;
      return el?.options[el.selectedIndex]?.text === "autumn-2025-11 (3)";
    });
    await s.page.locator('[data-testid="review-saved-mappings"]').uncheck();
    // The edited mapping replaced the saved one: the next file of this shape is read with it, silently.
    await s.page.locator('[data-testid="import-input"]').setInputFiles(csvFile("autumn-fourth.csv"));
    await s.page.locator('[data-testid="mapping-reused"]').waitFor();
    const [download] = await Promise.all([
      s.page.waitForEvent("download"),
      s.page.locator('[data-testid="mapping-download"]').first().click(),
    ]);
    const { readFile } = await import("node:fs/promises");
    const mapping = JSON.parse(await readFile((await download.path())!, "utf8")) as {
      columns: Array<{ header: string; unit?: string }>;
    };
    expect(mapping.columns.find((c) => c.header === "Mn (nmol/L)")?.unit).toBe("µmol/L");
  });

  it("Reset to demo brings back the two demo surveys", async () => {
    await s.page.locator('[data-testid="workspace-reset"]').click();
    await s.page.waitForFunction(() => document.querySelectorAll('[data-testid="survey-select"] option').length === 2);
    await waitForAnalysis(s.page);
    expect(await selectedSurvey(s)).toBe("wet-2025-03");
  });

  it("logs no console errors, page errors or off-line requests", () => {
    expect(s.errors).toEqual([]);
  });
});
