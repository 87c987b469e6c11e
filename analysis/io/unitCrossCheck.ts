import type { ImportIssue } from "../survey/survey.ts";
import { ATOMIC_WEIGHTS } from "../seawater/atomicWeights.ts";
import { convertConcentration } from "../seawater/convertConcentration.ts";
import type { ConstituentColumn } from "./compileMapping.ts";
import type { ImportedStation } from "./importSummary.ts";
import { makeIssue } from "./importSummary.ts";

/** The element a constituent's amount or mass counts (carbon for DOC/POC, nitrogen for DON/PN, ...). */
export const COUNTED_ELEMENT: Readonly<Record<string, string>> = {
  DOC: "C",
  POC: "C",
  DIC: "C",
  DON: "N",
  PN: "N",
  PON: "N",
  DIN: "N",
  NO3: "N",
  NO2: "N",
  NH4: "N",
  "NO3+NO2": "N",
  DOP: "P",
  PO4: "P",
  Si: "Si",
};

/** Relative disagreement above which two columns of one constituent are reported (common practice: 5 %). */
export const UNIT_RATIO_TOLERANCE = 0.05;

function baseName(key: string): string {
  return key.replace(/ \(.*\)$/, "");
}

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  const m = Math.floor(s.length / 2);
  return s.length % 2 === 1 ? s[m] : (s[m - 1] + s[m]) / 2;
}

function expectedRatio(fromUnit: string, toUnit: string, element: string | undefined): number | undefined {
  try {
    return convertConcentration(1, fromUnit, toUnit, element === undefined ? {} : { element });
  } catch {
    return undefined;
  }
}

/**
 * Checks pairs of columns holding the same constituent in different units (e.g. "POC_uM" and
 * "POC_mgL"): the median ratio of paired measured values must match the unit conversion
 * (convertConcentration, CIAAW 2021 atomic weights) within {@link UNIT_RATIO_TOLERANCE}. A mismatch is
 * reported with the units the numbers fit instead, when one of µg/L, mg/L, µmol/L, nmol/L fits.
 * Per-litre ↔ per-kilogram pairs are skipped (they need each sample's density).
 *
 * @param stations rows as read
 * @param columns the constituent columns
 * @param file file name for issues
 * @returns one warning per inconsistent pair
 */
export function crossCheckUnits(
  stations: readonly ImportedStation[],
  columns: readonly ConstituentColumn[],
  file: string,
): ImportIssue[] {
  const issues: ImportIssue[] = [];
  for (let i = 0; i < columns.length; i += 1) {
    for (let j = i + 1; j < columns.length; j += 1) {
      const a = columns[i];
      const b = columns[j];
      const name = baseName(a.key);
      if (name !== baseName(b.key) || a.constituent.unit === b.constituent.unit) continue;
      const element = COUNTED_ELEMENT[name] ?? (Object.hasOwn(ATOMIC_WEIGHTS, name) ? name : undefined);
      const expected = expectedRatio(b.constituent.unit, a.constituent.unit, element);
      if (expected === undefined) continue;
      const ratios: number[] = [];
      for (const s of stations) {
        const va = s.values[a.key];
        const vb = s.values[b.key];
        if (
          va?.status === "measured" &&
          vb?.status === "measured" &&
          va.value !== undefined &&
          vb.value !== undefined &&
          vb.value > 0 &&
          va.value > 0
        ) {
          ratios.push(va.value / vb.value);
        }
      }
      if (ratios.length < 3) continue;
      const observed = median(ratios);
      if (Math.abs(observed / expected - 1) <= UNIT_RATIO_TOLERANCE) continue;
      const fits = ["µg/L", "mg/L", "ng/L", "µmol/L", "nmol/L", "mmol/L"].find((u) => {
        const r = expectedRatio(b.constituent.unit, u, element);
        return r !== undefined && Math.abs(observed / r - 1) <= UNIT_RATIO_TOLERANCE;
      });
      const hint = fits === undefined ? "" : `; the numbers fit ${fits} for "${a.constituent.header}"`;
      issues.push(
        makeIssue(
          file,
          0,
          a.constituent.header,
          `median ratio ${observed.toPrecision(4)} to "${b.constituent.header}"`,
          `ratio ${expected.toPrecision(4)} for ${a.constituent.unit} vs ${b.constituent.unit}${hint} — check the column unit`,
          "warning",
        ),
      );
    }
  }
  return issues;
}
