// Cold start: with the store's hint saying nothing is saved (a first visit), boot() starts the demo at
// once instead of waiting for IndexedDB to open; a workspace found there all the same (saved before
// the hint existed) then replaces the demo. The hint is a localStorage key kept by save() and clear().
import "fake-indexeddb/auto";
import { afterEach, beforeEach, describe, expect, it } from "vitest";
import { indexedDbStore, type WorkspaceStore } from "../../../dashboard/src/state/workspaceStore.ts";
import { DataState, fakeApp } from "../import/fixtures.ts";

const fixedNow = () => new Date("2026-01-05T10:00:00Z");

/** A Map-backed localStorage for Node. */
function fakeLocalStorage(): Storage {
  const m = new Map<string, string>();
  return {
    get length() {
      return m.size;
    },
    clear: () => m.clear(),
    getItem: (k) => m.get(k) ?? null,
    key: (i) => [...m.keys()][i] ?? null,
    removeItem: (k) => void m.delete(k),
    setItem: (k, v) => void m.set(k, String(v)),
  };
}

/** A store whose load() resolves only when `release` is called, with `text`. */
function slowStore(mayHold: boolean, text: string | undefined): WorkspaceStore & { release(): void } {
  let release = () => undefined as void;
  const read = new Promise<string | undefined>((r) => (release = () => r(text)));
  return {
    mayHold: () => mayHold,
    load: () => read,
    save: () => Promise.resolve(),
    clear: () => Promise.resolve(),
    release: () => release(),
  };
}

describe("boot() and the store's saved-workspace hint", () => {
  beforeEach(() => {
    (globalThis as { localStorage?: Storage }).localStorage = fakeLocalStorage();
  });
  afterEach(() => {
    delete (globalThis as { localStorage?: Storage }).localStorage;
  });

  it("nothing saved: the demo starts before the store has been read, and only once", async () => {
    const app = fakeApp();
    const store = slowStore(false, undefined);
    const data = new DataState(app, store, fixedNow);
    const booted = data.boot();
    expect(app.started).toBe(1);
    store.release();
    await booted;
    expect(app.started).toBe(1);
    expect(data.ready).toBe(true);
  });

  it("nothing saved by the hint, yet a workspace in the store (saved before the hint): it replaces the demo", async () => {
    const first = new DataState(fakeApp(), slowStore(true, undefined), fixedNow);
    const text = await first.exportText();
    const app = fakeApp();
    const store = slowStore(false, text);
    const data = new DataState(app, store, fixedNow);
    const booted = data.boot();
    expect(app.started).toBe(1);
    store.release();
    await booted;
    expect(app.started).toBe(1);
    expect(data.dirty).toBe(true);
    expect(data.notices.filter((i) => i.severity === "error")).toEqual([]);
  });

  it("maybe saved: the demo waits for the store and starts when it is empty", async () => {
    const app = fakeApp();
    const store = slowStore(true, undefined);
    const data = new DataState(app, store, fixedNow);
    const booted = data.boot();
    expect(app.started).toBe(0);
    store.release();
    await booted;
    expect(app.started).toBe(1);
  });

  it("the IndexedDB store sets the hint on save and removes it on clear", async () => {
    const store = indexedDbStore();
    await store.clear();
    expect(store.mayHold?.()).toBe(false);
    await store.save("text");
    expect(store.mayHold?.()).toBe(true);
    await store.clear();
    expect(store.mayHold?.()).toBe(false);
  });

  it("without localStorage the IndexedDB store may hold a workspace (boot waits as before)", () => {
    delete (globalThis as { localStorage?: Storage }).localStorage;
    expect(indexedDbStore().mayHold?.()).toBe(true);
  });
});
