// Loads tests/reference/mixing-cases.json (derived check cases of Boyle et al. 1974 and Liss 1976) and builds case samples.
import { readFileSync } from "node:fs";
import type { MixingSample } from "../../../analysis/mixing/options.ts";

interface CaseFile {
  caseA: { inputs: Record<string, number>; expected: Record<string, number>; tol: Record<string, number> };
  caseB: {
    inputs: { salinity: number[]; conc: number[]; dischargeM3s: number };
    expected: Record<string, number> & { localEffective: number[] };
    tol: Record<string, number>;
  };
  caseC: { inputs: Record<string, number>; expected: Record<string, number>; tol: Record<string, number> };
  caseF: {
    inputs: Record<string, number>;
    expected: { days: number[]; apparentEffective: number[] };
    tol: Record<string, number>;
  };
}

export const CASES = JSON.parse(
  readFileSync(new URL("../../reference/mixing-cases.json", import.meta.url), "utf8"),
) as CaseFile;

/** Samples from parallel salinity/concentration arrays. */
export function samplesOf(salinity: number[], conc: number[], prefix = "S"): MixingSample[] {
  return salinity.map((s, i) => ({
    stationId: `${prefix}${i + 1}`,
    salinity: s,
    conc: conc[i]!,
    censored: false,
    accepted: true,
  }));
}

/** Case B curve: C(S) = 1 + (0.005 − 1)·S/35 + 9·(1 − S/15)³ for S < 15 (derived check cases of Boyle et al. 1974 and Liss 1976). */
export function caseBConc(s: number): number {
  return 1 + ((0.005 - 1) * s) / 35 + (s < 15 ? 9 * (1 - s / 15) ** 3 : 0);
}
