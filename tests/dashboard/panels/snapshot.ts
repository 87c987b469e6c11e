/**
 * Saved-output comparison for rendered SVG panels: the rendered markup is
 * normalised (no framework comments or generated class names) and compared
 * with tests/dashboard/panels/__snapshots__/<name>.svg. On mismatch a
 * <name>-changed.svg is written beside it and the check fails; delete the old
 * file (or copy the -changed file over it) to accept a deliberate change.
 * A missing snapshot is written and the check fails under CI.
 */
import { existsSync, mkdirSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { dirname, join } from "node:path";
import { fileURLToPath } from "node:url";
import { expect } from "vitest";

const dir = join(dirname(fileURLToPath(import.meta.url)), "__snapshots__");

/** Normalises rendered SVG markup so saved output is stable across runs. */
export function normaliseSvg(markup: string): string {
  return (
    markup
      .replace(/<!--[\s\S]*?-->/g, "")
      .replace(/\s*\bsvelte-[a-z0-9]+\b/g, "")
      .replace(/ class=""/g, "")
      // one element per line for readable diffs
      .replace(/></g, ">\n<")
      .trim() + "\n"
  );
}

/** Compares `markup` with the saved snapshot `name`.svg; writes `name`-changed.svg and fails on mismatch. */
export function expectSvgSnapshot(markup: string, name: string): void {
  expectMarkupSnapshot(markup, name, "svg");
}

/** As {@link expectSvgSnapshot} for other markup ("html.snap" for HTML tables, kept out of the formatter). */
export function expectMarkupSnapshot(markup: string, name: string, ext: "svg" | "html.snap"): void {
  const actual = normaliseSvg(markup);
  const path = join(dir, `${name}.${ext}`);
  const changed = join(dir, `${name}-changed.${ext}`);
  mkdirSync(dir, { recursive: true });
  if (!existsSync(path)) {
    writeFileSync(path, actual);
    console.warn(`snapshot ${name}.${ext} was missing and has been written; review it`);
    expect(process.env.CI, `snapshot ${name}.${ext} missing (written now); commit it`).toBeFalsy();
    return;
  }
  const expected = readFileSync(path, "utf8");
  if (actual === expected) {
    if (existsSync(changed)) rmSync(changed);
    return;
  }
  writeFileSync(changed, actual);
  expect(actual, `output differs from __snapshots__/${name}.${ext}; see ${name}-changed.${ext}`).toBe(expected);
}
