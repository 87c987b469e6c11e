/**
 * Argument checks for the public readers: caller mistakes (not bad file content) throw, naming the
 * function, the argument and the bad value.
 */

/** Throws TypeError unless `value` is a string. */
export function requireString(fn: string, arg: string, value: unknown): void {
  if (typeof value !== "string") throw new TypeError(`${fn}(): ${arg} must be a string, got ${describe(value)}`);
}

/** Throws TypeError unless `options.fileName` is a string. */
export function requireOptions(fn: string, options: unknown): void {
  if (typeof options !== "object" || options === null)
    throw new TypeError(`${fn}(): options must be an object, got ${describe(options)}`);
  requireString(fn, "options.fileName", (options as { fileName?: unknown }).fileName);
}

/** Throws TypeError unless `value` is an array of strings. */
export function requireStringArray(fn: string, arg: string, value: unknown): void {
  if (!Array.isArray(value) || value.some((v) => typeof v !== "string")) {
    throw new TypeError(`${fn}(): ${arg} must be an array of strings, got ${describe(value)}`);
  }
}

function describe(value: unknown): string {
  if (value === null) return "null";
  if (Array.isArray(value)) return `an array of length ${value.length}`;
  return typeof value === "object" ? "an object" : `${typeof value} ${String(value).slice(0, 40)}`;
}
