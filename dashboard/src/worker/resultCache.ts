/**
 * A cache of per-survey analysis results in the browser's IndexedDB, so a reload (or re-opening
 * the same workspace) skips the bootstrap when nothing that the result depends on has changed.
 * The key is a SHA-256 of the survey, the channel it is placed on (centerline GeoJSON and mouth),
 * the input choices, the analysis settings and the engine fingerprint: a hash of every source file
 * of analysis/ and of this worker, injected by the Vite build (`__BRACKLINE_ENGINE__`). Without
 * that fingerprint (Node, tests), IndexedDB or Web Crypto there is no cache and every survey is
 * analysed, as before.
 */
import { openDB, type IDBPDatabase } from "idb";
import type { AnalysisResult } from "./engine.ts";
import type { SurveyOverlay } from "./overlay.ts";

declare const __BRACKLINE_ENGINE__: string | undefined;

/** One survey's result as the worker sends it. */
export interface CachedAnalysis {
  analysis: AnalysisResult;
  overlay: SurveyOverlay;
}

/** Where results are kept between page loads. */
export interface ResultCache {
  /** The hex key of what a result depends on. */
  key(parts: unknown): Promise<string>;
  get(key: string): Promise<CachedAnalysis | undefined>;
  put(key: string, value: CachedAnalysis): Promise<void>;
}

const DB_NAME = "brackline-results";
const STORE = "analyses";
/** Results kept; the oldest go first (a result is ~0.2 MB). */
const MAX_ENTRIES = 40;

/** The engine fingerprint of this build, or undefined outside a Vite build. */
export function engineFingerprint(): string | undefined {
  return typeof __BRACKLINE_ENGINE__ === "string" && __BRACKLINE_ENGINE__ !== "" ? __BRACKLINE_ENGINE__ : undefined;
}

async function sha256Hex(text: string): Promise<string> {
  const digest = await crypto.subtle.digest("SHA-256", new TextEncoder().encode(text));
  let hex = "";
  for (const b of new Uint8Array(digest)) hex += b.toString(16).padStart(2, "0");
  return hex;
}

/** The IndexedDB result cache, or undefined where it cannot work (no engine fingerprint, IndexedDB or Web Crypto). */
export function browserResultCache(): ResultCache | undefined {
  const engine = engineFingerprint();
  if (!engine || typeof indexedDB === "undefined" || typeof crypto === "undefined" || !crypto.subtle) return undefined;
  let db: Promise<IDBPDatabase> | undefined;
  const open = () =>
    (db ??= openDB(DB_NAME, 1, {
      upgrade(d) {
        d.createObjectStore(STORE);
      },
    }));
  // Open the database as the worker starts, while the first job's files are read, not when the first
  // survey looks up its result (on a cold start IndexedDB takes a while to open an empty profile).
  void open().catch(() => undefined);
  return {
    key: (parts) => sha256Hex(JSON.stringify({ engine, parts })),
    async get(key) {
      try {
        const hit = (await (await open()).get(STORE, key)) as { value: CachedAnalysis } | undefined;
        return hit?.value;
      } catch {
        return undefined;
      }
    },
    async put(key, value) {
      try {
        const d = await open();
        await d.put(STORE, { value, storedAt: Date.now() }, key);
        const keys = await d.getAllKeys(STORE);
        if (keys.length <= MAX_ENTRIES) return;
        const dated = await Promise.all(
          keys.map(async (k) => ({
            k,
            at: ((await d.get(STORE, k)) as { storedAt?: number } | undefined)?.storedAt ?? 0,
          })),
        );
        dated.sort((a, b) => a.at - b.at);
        for (const { k } of dated.slice(0, keys.length - MAX_ENTRIES)) await d.delete(STORE, k);
      } catch {
        // A full or unavailable store only costs the next load its analysis.
      }
    },
  };
}
