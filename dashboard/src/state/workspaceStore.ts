/**
 * Keeps the workspace in the browser's IndexedDB (through `idb`) as the
 * versioned workspace text written by analysis/io exportWorkspace, so a
 * restore goes through the same validation and migration as "Open workspace".
 */
import { openDB, type IDBPDatabase } from "idb";

const DB_NAME = "brackline";
const STORE = "workspace";
const KEY = "current";

/** Where the workspace text is kept; IndexedDB in the browser, a Map in tests. */
export interface WorkspaceStore {
  load(): Promise<string | undefined>;
  save(text: string): Promise<void>;
  clear(): Promise<void>;
}

/** The workspace store in IndexedDB (database "brackline", one record). */
export function indexedDbStore(factory?: IDBFactory): WorkspaceStore {
  let db: Promise<IDBPDatabase> | undefined;
  const open = (): Promise<IDBPDatabase> => {
    if (factory) (globalThis as { indexedDB?: IDBFactory }).indexedDB ??= factory;
    db ??= openDB(DB_NAME, 1, {
      upgrade(d) {
        d.createObjectStore(STORE);
      },
    });
    return db;
  };
  return {
    async load() {
      const value: unknown = await (await open()).get(STORE, KEY);
      return typeof value === "string" ? value : undefined;
    },
    async save(text) {
      await (await open()).put(STORE, text, KEY);
    },
    async clear() {
      await (await open()).delete(STORE, KEY);
    },
  };
}

/** A store in memory (tests, or a browser without IndexedDB). */
export function memoryStore(): WorkspaceStore {
  let text: string | undefined;
  return {
    load: () => Promise.resolve(text),
    save: (t) => {
      text = t;
      return Promise.resolve();
    },
    clear: () => {
      text = undefined;
      return Promise.resolve();
    },
  };
}
