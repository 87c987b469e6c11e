// The raw cruise exports of the USGS San Francisco Bay water-quality program and its station table
// (Schraga & Cloern, 2017, Sci. Data 4:170098; ../shared/data/usgs-sfbay-2016-2022/SOURCE.md), read at
// test time, never copied into the repository. Shared by the browser tests that import them.
import { existsSync } from "node:fs";
import { readFile } from "node:fs/promises";
import { join } from "node:path";
import type { Locator, Page } from "playwright-core";
import { REPO_ROOT } from "./browser.ts";

export const BAY_DIR = join(REPO_ROOT, "..", "shared", "data", "usgs-sfbay-2016-2022");
export const BAY_CRUISE_2018 = "2018SanFranciscoBayWaterQualityData.csv";
export const BAY_STATIONS = "USGSSFBayStations_from_xlsx.csv";

/** True when the 2018 export and the station table are both there (tests skip otherwise). */
export const bayFilesPresent = existsSync(join(BAY_DIR, BAY_CRUISE_2018)) && existsSync(join(BAY_DIR, BAY_STATIONS));

/** The nutrient columns whose headers carry no unit: µmol/L (SOURCE.md). */
export const BAY_UNITLESS = ["Silicate", "Nitrate_+_Nitrite", "Phosphate", "Ammonium", "Nitrite"];

/** One of the bay files as a playwright file-input payload. */
export async function bayFileInput(name: string): Promise<{ name: string; mimeType: string; buffer: Buffer }> {
  return { name, mimeType: "text/csv", buffer: await readFile(join(BAY_DIR, name)) };
}

/**
 * Drops the 2018 export and the station table on the import input, as a user would, waits for the
 * mapping dialog and gives every unit-less nutrient column µmol/L (SOURCE.md); returns the open
 * dialog, not yet confirmed.
 */
export async function importBayCruise2018(page: Page): Promise<Locator> {
  await page
    .locator('[data-testid="import-input"]')
    .setInputFiles([await bayFileInput(BAY_CRUISE_2018), await bayFileInput(BAY_STATIONS)]);
  const dialog = page.locator('[data-testid="mapping-dialog"][open]');
  await dialog.waitFor({ timeout: 60_000 });
  for (const header of BAY_UNITLESS) {
    const unit = dialog.locator(`tr[data-header="${header}"] input[aria-label^="Unit"]`);
    if ((await unit.count()) === 0) continue;
    if ((await unit.inputValue()).trim() === "") await unit.fill("µmol/L");
  }
  return dialog;
}
