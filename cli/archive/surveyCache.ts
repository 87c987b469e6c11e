/**
 * Per-survey result cache on disk: one JSON file per survey analysis, keyed by a SHA-256 of
 * everything the result depends on (the survey's data, the channel, the settings and the
 * analysis code), so adding a file to an archive re-analyses only the new surveys.
 */
import { createHash } from "node:crypto";
import { mkdirSync, readdirSync, readFileSync, renameSync, statSync, writeFileSync } from "node:fs";
import { homedir } from "node:os";
import { dirname, join } from "node:path";
import { fileURLToPath } from "node:url";

/** Bumped when the cached result format changes. */
export const CACHE_FORMAT = 2;

/** Default cache directory: $XDG_CACHE_HOME/brackline/surveys, else ~/.cache/brackline/surveys. */
export function defaultCacheDir(): string {
  return join(process.env.XDG_CACHE_HOME || join(homedir(), ".cache"), "brackline", "surveys");
}

function findAnalysisDir(): string | undefined {
  let dir = dirname(fileURLToPath(import.meta.url));
  for (let i = 0; i < 6; i++) {
    const candidate = join(dir, "analysis");
    if (statSync(join(candidate, "index.ts"), { throwIfNoEntry: false })?.isFile()) return candidate;
    dir = dirname(dir);
  }
  return undefined;
}

let fingerprint: string | undefined;

/**
 * Fingerprint of the analysis code: SHA-256 over every analysis/**.ts file (path and content), so a
 * changed estimator never returns a stale cached result. Computed once per process.
 */
export function codeFingerprint(): string {
  if (fingerprint) return fingerprint;
  const h = createHash("sha256");
  const root = findAnalysisDir();
  if (!root) h.update(`no-sources:${process.env.npm_package_version ?? ""}`);
  else {
    const walk = (dir: string): void => {
      for (const e of readdirSync(dir, { withFileTypes: true }).sort((a, b) => a.name.localeCompare(b.name))) {
        const p = join(dir, e.name);
        if (e.isDirectory()) walk(p);
        else if (e.name.endsWith(".ts")) h.update(p.slice(root.length)).update(readFileSync(p));
      }
    };
    walk(root);
  }
  return (fingerprint = h.digest("hex"));
}

/**
 * Cache key of one survey's analysis.
 *
 * @param parts everything the result depends on (survey data, channel digest, settings); plain data
 * @returns hex SHA-256
 */
export function surveyCacheKey(parts: unknown): string {
  return createHash("sha256")
    .update(JSON.stringify({ format: CACHE_FORMAT, code: codeFingerprint(), parts }))
    .digest("hex");
}

/** A directory of cached results; every method is safe to call when the directory is unusable. */
export class SurveyCache {
  constructor(readonly dir: string | undefined) {}

  /** The cached result for a key, or undefined. */
  get<T>(key: string): T | undefined {
    if (!this.dir) return undefined;
    try {
      return JSON.parse(readFileSync(join(this.dir, `${key}.json`), "utf8")) as T;
    } catch {
      return undefined;
    }
  }

  /** Stores a result (written to a temporary file, then renamed, so a cancelled run leaves no half file). */
  set(key: string, value: unknown): void {
    if (!this.dir) return;
    try {
      mkdirSync(this.dir, { recursive: true });
      const tmp = join(this.dir, `${key}.${process.pid}.tmp`);
      writeFileSync(tmp, JSON.stringify(value));
      renameSync(tmp, join(this.dir, `${key}.json`));
    } catch {
      // A cache that cannot be written only costs time.
    }
  }
}
