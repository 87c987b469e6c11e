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

  it("the mouth choice, off-channel distance, keep option and depth layer are saved and restored (common practice)", async () => {
    const app = fakeApp();
    const data = new DataState(app, memoryStore(), fixedNow);
    await data.boot();
    await importQuirky(data);
    app.settings.updateAnalysis({ mouth: "end", offChannelM: 4300, keepOffChannel: true });
    data.flow.layer = { kind: "depthRange", minM: 1, maxM: 3 };
    const text = await data.exportText();
    const doc = JSON.parse(text);
    expect(doc.analysis).toMatchObject({ mouth: "end", offChannelM: 4300, keepOffChannel: true });
    expect(doc.settings.layer).toEqual({ kind: "depthRange", minM: 1, maxM: 3 });

    const app2 = fakeApp();
    const data2 = new DataState(app2, memoryStore(), fixedNow);
    expect(await data2.openText(text)).toBe(true);
    expect(app2.settings.analysis.mouth).toBe("end");
    expectWithin(app2.settings.analysis.offChannelM!, 4300, 0, "restored off-channel distance [m]");
    expect(app2.settings.analysis.keepOffChannel).toBe(true);
    expect(data2.flow.layer).toEqual({ kind: "depthRange", minM: 1, maxM: 3 });
  });

  it("a workspace saved before these settings existed still opens, with the defaults (one mouth rule, default distance, shallowest layer)", async () => {
    const app = fakeApp();
    const data = new DataState(app, memoryStore(), fixedNow);
    await data.boot();
    await importQuirky(data);
    const doc = JSON.parse(await data.exportText());
    for (const k of ["mouth", "offChannelM", "keepOffChannel"]) delete doc.analysis[k];
    delete doc.settings.layer;
    const app2 = fakeApp();
    const data2 = new DataState(app2, memoryStore(), fixedNow);
    app2.settings.updateAnalysis({ mouth: "start", offChannelM: 10, keepOffChannel: true });
    expect(await data2.openText(JSON.stringify(doc))).toBe(true);
    expect(data2.notices).toEqual([]);
    expect(app2.settings.analysis.mouth).toBeUndefined();
    expect(app2.settings.analysis.offChannelM).toBeUndefined();
    expect(app2.settings.analysis.keepOffChannel).toBeUndefined();
    expect(data2.flow.layer).toBeUndefined();
  });

  it("a workspace with an off-channel distance that is not a distance is refused with the path of the value", async () => {
    const app = fakeApp();
    const data = new DataState(app, memoryStore(), fixedNow);
    await data.boot();
    await importQuirky(data);
    const doc = JSON.parse(await data.exportText());
    doc.analysis.offChannelM = -5;
    doc.analysis.mouth = "middle";
    const data2 = new DataState(fakeApp(), memoryStore(), fixedNow);
    await data2.openText(JSON.stringify(doc));
    expect(data2.notices.map((n) => n.column).join(" ")).toMatch(/offChannelM|mouth/);
  });
});

describe("ImportFlow: a saved mapping reopened on re-import to add a unit (issue 13)", () => {
  const SI_CSV = [
    "Cruise,Stn,Date,Lat,Lon,Salinity,Fe (nmol/L),Silicate",
    "s1,N01,2025-11-04,45.04869,-35.30269,33.2,2.0,10",
    "s1,N02,2025-11-04,45.05041,-35.30234,20.1,5.5,40",
    "s1,N03,2025-11-04,45.05351,-35.30693,5.4,9.1,90",
  ].join("\n");

  it("with 'Review saved column mappings' the dialog opens with the saved mapping; the unit added is saved and the column read", async () => {
    const app = fakeApp();
    const data = new DataState(app, memoryStore(), fixedNow);
    await data.boot();
    let done = data.flow.importFiles([file("si.csv", SI_CSV)]);
    for (let i = 0; i < 50 && !data.flow.question; i++) await new Promise((r) => setTimeout(r, 5));
    expect(data.flow.question?.savedOn).toBeUndefined();
    data.flow.question!.answer(data.flow.question!.mapping);
    await done;
    const first = data.mappings[0].columns.find((c) => c.header === "Silicate");
    expect(first?.unit).toBeUndefined();
    expect(app.results.surveys[0].constituents.map((c) => c.name)).not.toContain("Silicate");

    data.flow.reviewSaved = true;
    done = data.flow.importFiles([file("si.csv", SI_CSV)]);
    for (let i = 0; i < 50 && !data.flow.question; i++) await new Promise((r) => setTimeout(r, 5));
    const q = data.flow.question!;
    expect(q.savedOn).toBe("2026-01-05T10:00:00.000Z");
    expect(q.mapping).toEqual(data.mappings[0]);
    const edited = structuredClone(q.mapping);
    const si = edited.columns.find((c) => c.header === "Silicate")!;
    si.role = "constituent";
    si.name = "Silicate";
    si.unit = "µmol/L";
    q.answer(edited);
    await done;
    expect(data.mappings).toHaveLength(1);
    expect(data.mappings[0].columns.find((c) => c.header === "Silicate")?.unit).toBe("µmol/L");
    const last = app.results.surveys.at(-1)!;
    expect(last.constituents.find((c) => c.name === "Silicate")?.unit).toBe("µmol/L");
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
