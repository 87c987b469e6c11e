import type { BenchCase } from "../benchCase.ts";

/** Every benchmark of `npm run bench`, in table order. */
export const benchCases: BenchCase[] = [];
