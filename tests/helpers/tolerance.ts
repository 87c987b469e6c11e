import { expect } from "vitest";

/**
 * The one tolerance helper for numeric checks.
 *
 * Fails with a message that names the case, the actual and expected values, the
 * absolute difference and the limit, so a failing reference check explains itself.
 *
 * @param actual value computed by Brackline
 * @param expected reference value
 * @param tol absolute tolerance (same unit as the values)
 * @param label what is being checked and against which source
 */
export function expectWithin(actual: number | undefined, expected: number, tol: number, label = ""): void {
  const diff = actual === undefined ? Number.POSITIVE_INFINITY : Math.abs(actual - expected);
  const ok = Number.isFinite(diff) && diff <= tol;
  expect(
    ok,
    `${label}: got ${String(actual)}, expected ${expected}, |diff| = ${diff.toExponential(3)} > limit ${tol}`,
  ).toBe(true);
}

/** Relative variant: |actual − expected| ≤ relTol·|expected|. */
export function expectWithinRel(actual: number | undefined, expected: number, relTol: number, label = ""): void {
  expectWithin(actual, expected, Math.abs(expected) * relTol, `${label} (relative ${relTol})`);
}
