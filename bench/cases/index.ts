import type { BenchCase } from "../benchCase.ts";
import { mixingBench } from "./mixing.ts";
import { projectionBench } from "./projection.ts";
import { underwayImportBench } from "./underwayImport.ts";
import { underwayBinningBench } from "./underwayBinning.ts";
import { bundleSizeBench } from "./bundleSize.ts";
import { dashboardBench } from "./dashboard.ts";
import { archiveBench } from "./archive.ts";
import { archiveViewBench } from "./archiveView.ts";
import { wideHeaderBench } from "./wideHeader.ts";
import { cliStartBench } from "./cliStart.ts";
import { dashboardUnderwayBench } from "./dashboardUnderway.ts";

/** Every benchmark of `npm run bench`, in table order. */
export const benchCases: BenchCase[] = [
  mixingBench,
  projectionBench,
  underwayImportBench,
  underwayBinningBench,
  wideHeaderBench,
  dashboardBench,
  dashboardUnderwayBench,
  bundleSizeBench,
  archiveBench,
  archiveViewBench,
  cliStartBench,
];
