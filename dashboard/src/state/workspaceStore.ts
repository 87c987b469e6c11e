/**
 * Keeps the workspace in the browser's IndexedDB (through `idb`) as the
 * versioned workspace text written by analysis/io exportWorkspace, so a
 * restore goes through the same validation and migration as "Open workspace".
 */
import { openDB, type IDBPDatabase } from "idb";

const DB_NAME = "brackline";
const STORE = "workspace";
const KEY = "current";
/** localStorage key set while IndexedDB holds a saved workspace (a hint; IndexedDB stays the record). */
const SAVED_HINT = "brackline.workspace.saved";

function hint(): Storage | undefined {
  try {
    return globalThis.localStorage;
  } catch {
    return undefined;
  }
}

/** Where the workspace text is kept; IndexedDB in the browser, a Map in tests. */
export interface WorkspaceStore {
  /**
   * A synchronous hint read before the store is opened: false when the store certainly holds no
   * workspace (so the demo can start without waiting for IndexedDB), true when it may hold one.
   */
  mayHold?(): boolean;
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
    mayHold() {
      // No localStorage (or it throws): may hold, so boot waits for IndexedDB as before.
      try {
        const storage = hint();
        return storage === undefined || storage.getItem(SAVED_HINT) !== null;
      } catch {
        return true;
      }
    },
    async load() {
      const value: unknown = await (await open()).get(STORE, KEY);
      return typeof value === "string" ? value : undefined;
    },
    async save(text) {
      await (await open()).put(STORE, text, KEY);
      try {
        hint()?.setItem(SAVED_HINT, "1");
      } catch {
        // without the hint the next start reads IndexedDB after starting the demo (see boot)
      }
    },
    async clear() {
      await (await open()).delete(STORE, KEY);
      try {
        hint()?.removeItem(SAVED_HINT);
      } catch {
        // a stale hint only makes the next start wait for IndexedDB
      }
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
