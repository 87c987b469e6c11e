/** The caution shown beside every result; defined once in analysis/output/caution.ts. */
export { SCREENING_CAUTION } from "../output/caution.ts";
