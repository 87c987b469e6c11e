import "fake-indexeddb/auto";
import { describe, expect, it } from "vitest";
import type { Survey } from "../../../analysis/index.ts";
import { indexedDbStore, memoryStore, type WorkspaceStore } from "../../../dashboard/src/state/workspaceStore.ts";
import { uniqueSurveyNames } from "../../../dashboard/src/state/surveyNames.ts";
import { expectWithin } from "../../helpers/tolerance.ts";
import { DataState, QUIRKY_CSV, fakeApp, file } from "./fixtures.ts";

const fixedNow = () => new Date("2026-01-05T10:00:00Z");

async function importQuirky(data: DataState, name = "quirky.csv"): Promise<void> {
  const done = data.flow.importFiles([file(name, QUIRKY_CSV)]);
  for (let i = 0; i < 50 && !data.flow.question; i++) await new Promise((r) => setTimeout(r, 5));
  const q = data.flow.question;
  if (q) {
    const m = structuredClone(q.mapping);
    m.columns[5].role = "salinity";
    q.answer(m);
  }
  await done;
}

describe("SavedWorkspace and ImportFlow: mapping dialog, mapping reuse by file shape, surveys in the switcher (common practice)", () => {
  it("the first import asks for the mapping; the confirmed mapping is saved with its date and the survey joins the switcher", async () => {
    const app = fakeApp();
    const data = new DataState(app, memoryStore(), fixedNow);
    await data.boot();
    expect(app.started).toBe(1);
    await importQuirky(data);
    expect(data.mappings).toHaveLength(1);
    expect(data.mappingDates[data.mappings[0].shape]).toBe("2026-01-05T10:00:00.000Z");
    expect(app.results.surveys.map((s) => s.name)).toEqual(["autumn-2025-11"]);
    expect(app.selection.surveyIndex).toBe(0);
    expect(data.flow.report[0].outcome.summary?.rowsRejected).toBe(1);
    expect(data.flow.report[0].reusedFrom).toBeUndefined();
  });

  it("a second file of the same shape is read with the saved mapping without asking, noting the date; names stay unique", async () => {
    const app = fakeApp();
    const data = new DataState(app, memoryStore(), fixedNow);
    await data.boot();
    await importQuirky(data);
    let asked = false;
    const done = data.flow.importFiles([file("again.csv", QUIRKY_CSV)]);
    for (let i = 0; i < 20; i++) {
      await new Promise((r) => setTimeout(r, 5));
      if (data.flow.question) asked = true;
    }
    await done;
    expect(asked).toBe(false);
    expect(data.flow.report[0].reusedFrom).toBe("2026-01-05T10:00:00.000Z");
    expect(app.results.surveys.map((s) => s.name)).toEqual(["autumn-2025-11", "autumn-2025-11 (2)"]);
    expect(app.selection.surveyIndex).toBe(1);
  });

  it("the demo starts with its invented carbonate end-members, labelled invented; imported data drop them (no pH curve from invented values)", async () => {
    const app = fakeApp();
    const data = new DataState(app, memoryStore(), fixedNow);
    await data.boot();
    expect(app.settings.carbonate?.invented).toBe(true);
    await importQuirky(data);
    expect(app.settings.carbonate).toBeUndefined();
  });

  it("cancelling the dialog skips the file: nothing read, no mapping saved", async () => {
    const app = fakeApp();
    const data = new DataState(app, memoryStore(), fixedNow);
    await data.boot();
    const done = data.flow.importFiles([file("quirky.csv", QUIRKY_CSV)]);
    for (let i = 0; i < 50 && !data.flow.question; i++) await new Promise((r) => setTimeout(r, 5));
    data.flow.question?.answer(undefined);
    await done;
    expect(data.mappings).toEqual([]);
    expect(app.results.surveys).toEqual([]);
  });

  it("editing a survey's river discharge re-sends the surveys with the new value [m³/s]", async () => {
    const app = fakeApp();
    const data = new DataState(app, memoryStore(), fixedNow);
    await data.boot();
    await importQuirky(data);
    data.editSurvey(0, { riverDischargeM3s: 412.5, name: "Autumn" });
    expectWithin(app.results.surveys[0].riverDischargeM3s ?? NaN, 412.5, 0, "edited discharge");
    expect(app.results.surveys[0].name).toBe("Autumn");
  });
});

describe("SavedWorkspace and ImportFlow: workspace saved in the store and restored (analysis/io workspace format)", () => {
  async function roundTrip(store: WorkspaceStore): Promise<void> {
    const app = fakeApp();
    const data = new DataState(app, store, fixedNow);
    await data.boot();
    await data.save();
    expect(await store.load()).toBeUndefined(); // the untouched start is not stored
    await importQuirky(data);
    app.settings.updateAnalysis({ saltIntrusionSalinity: 5 });
    await data.save();
    const text = await store.load();
    expect(text).toContain('"format": "brackline-workspace"');

    const app2 = fakeApp();
    const data2 = new DataState(app2, store, fixedNow);
    await data2.boot();
    expect(app2.started).toBe(0);
    expect(app2.results.surveys.map((s) => s.name)).toEqual(["autumn-2025-11"]);
    expect(app2.results.surveys[0].stations.find((s) => s.id === "N03")?.values.Fe).toMatchObject({
      status: "invalid",
      original: "abc",
    });
    expectWithin(app2.settings.analysis.saltIntrusionSalinity, 5, 0, "restored isohaline salinity");
    expect(data2.mappings).toEqual(data.mappings);
    expect(data2.mappingDates).toEqual(data.mappingDates);
    expect(data2.imports[0]).toMatchObject({ file: "quirky.csv", rowsRead: 5, rowsAccepted: 4, rowsRejected: 1 });

    await data2.resetToDemo();
    expect(await store.load()).toBeUndefined();
    expect(app2.started).toBe(1);
  }

  it("in memory", async () => {
    await roundTrip(memoryStore());
  });

  it("in IndexedDB through idb (fake-indexeddb in Node)", async () => {
    await roundTrip(indexedDbStore());
  });

  it("an unreadable stored workspace falls back to the demo and says why", async () => {
    const store = memoryStore();
    await store.save("{ not json");
    const app = fakeApp();
    const data = new DataState(app, store, fixedNow);
    await data.boot();
    expect(app.started).toBe(1);
    expect(data.notices[0].expected).toMatch(/JSON/);
  });

  it("exportText() is the versioned document; openText() of it gives the same surveys", async () => {
    const app = fakeApp();
    const data = new DataState(app, memoryStore(), fixedNow);
    await data.boot();
    await importQuirky(data);
    const text = await data.exportText();
    expect(JSON.parse(text)).toMatchObject({ format: "brackline-workspace", version: 2 });
    const app2 = fakeApp();
    const data2 = new DataState(app2, memoryStore(), fixedNow);
    expect(await data2.openText(text)).toBe(true);
    expect(app2.results.surveys).toEqual(app.results.surveys);
  });
});

describe("uniqueSurveyNames()", () => {
  it("numbers repeated names from 2 and keeps the rest", () => {
    const s = (name: string): Survey => ({ name, stations: [], constituents: [] });
    expect(uniqueSurveyNames([s("a"), s("b"), s("a"), s("a")]).map((x) => x.name)).toEqual([
      "a",
      "b",
      "a (2)",
      "a (3)",
    ]);
  });
});
