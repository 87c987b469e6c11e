/**
 * The one caution text shown beside every result: dashboard, CLI (`caution` field and stderr) and briefing.
 * Screening analysis, not a compliance assessment (common practice for screening tools).
 */
export const SCREENING_CAUTION =
  "Screening analysis, not a compliance assessment. Mixing diagrams assume steady state, two end-members and equal " +
  "dispersion of salt and constituent, which one survey cannot prove. Where results could bear on water-quality or " +
  "health decisions, defer to local regulations and licensed practice.";
