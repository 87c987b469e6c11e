// Benchmark: reading a survey file with 100,000 columns (issue 15, item 9: the mapping compiler
// looked every header up with indexOf, 218 s), against 1,000 columns read in the same run and
// scaled ×100 — the time a linear reader would take.
import type { BenchCase, BenchRow } from "../benchCase.ts";
import { readSurveyText } from "../../analysis/io/readSurvey.ts";

function wideFile(columns: number): string {
  const header = ["station", "salinity", ...Array.from({ length: columns }, (_, i) => `Fe${i} (nmol/L)`)];
  const row = ["A", "5", ...Array.from({ length: columns }, () => "1")];
  return `${header.join(",")}\n${row.join(",")}\n`;
}

function secondsToRead(text: string): number {
  const t0 = performance.now();
  readSurveyText(text, { fileName: "wide.csv" });
  return (performance.now() - t0) / 1000;
}

export const wideHeaderBench: BenchCase = {
  name: "wide header",
  async run(): Promise<BenchRow[]> {
    const small = wideFile(1_000);
    const large = wideFile(100_000);
    secondsToRead(small); // warm-up
    const smallS = Math.min(secondsToRead(small), secondsToRead(small), secondsToRead(small));
    const largeS = secondsToRead(large);
    const linear = smallS * 100;
    return [
      {
        name: "read a survey file with 100,000 columns",
        value: largeS,
        unit: "s",
        baseline: { name: "1,000 columns ×100 (linear)", value: linear },
        ratio: linear / largeS,
        ratioLabel: "linear / measured",
        goal: "close to linear (was 218 s, quadratic)",
      },
    ];
  },
};
