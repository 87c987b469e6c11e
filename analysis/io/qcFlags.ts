/** What a QC flag means for the analysis. */
export type FlagDecision = "accept" | "reject" | "missing";

/**
 * Default QC flag map (keys lower-case, trimmed).
 *
 * Numeric codes follow the IOC/IODE primary-level scheme (IOC Manuals and Guides 54, Vol. 3, 2013:
 * 1 good, 2 not evaluated, 3 questionable/suspect, 4 bad, 9 missing) and the closely related
 * 0–9 scheme used by many ocean-data exchanges (0 no QC, 1 good, 2 probably good, 3 probably bad,
 * 4 bad, 5 changed, 8 interpolated, 9 missing) — both read the same way here: 0, 1, 2, 5, 8 accept;
 * 3, 4 reject; 9 missing (from memory; the two schemes differ in the meaning of 2, which is accepted
 * in both). Letters and words: A/G/good/ok/pass/valid accept; R/B/bad/fail/reject/Q/S/suspect/
 * questionable reject (common practice). Any other flag text is rejected with a warning.
 */
export const DEFAULT_FLAG_MAP: Readonly<Record<string, FlagDecision>> = {
  "0": "accept",
  "1": "accept",
  "2": "accept",
  "3": "reject",
  "4": "reject",
  "5": "accept",
  "8": "accept",
  "9": "missing",
  a: "accept",
  g: "accept",
  good: "accept",
  ok: "accept",
  pass: "accept",
  valid: "accept",
  accepted: "accept",
  accept: "accept",
  "probably good": "accept",
  r: "reject",
  b: "reject",
  bad: "reject",
  fail: "reject",
  reject: "reject",
  rejected: "reject",
  q: "reject",
  s: "reject",
  suspect: "reject",
  questionable: "reject",
  "probably bad": "reject",
  m: "missing",
  missing: "missing",
};

/**
 * Reads a QC flag text with a flag map.
 *
 * @param text flag text as found ("1", "4.0", "A", "good"); blank means "no flag"
 * @param map flag map (keys lower-case); defaults to {@link DEFAULT_FLAG_MAP}
 * @returns the decision, "accept" for a blank flag, or undefined for an unknown flag
 */
export function readQcFlag(
  text: string,
  map: Readonly<Record<string, FlagDecision>> = DEFAULT_FLAG_MAP,
): FlagDecision | undefined {
  const t = text.trim().toLowerCase().replace(/\.0+$/, "");
  if (t.length === 0) return "accept";
  return map[t];
}

const FLAG_PATTERNS: readonly RegExp[] = [/^(.+?)[\s_-]*(flag|qc|qf|quality)$/i, /^(?:flag|qc|qf)[\s_-]+(.+)$/i];

/**
 * The value column a flag column belongs to: "Fe_flag", "Fe_qc", "flag_Fe", "QC Fe", "Fe flag"
 * name the column whose header is (or starts with) "Fe".
 *
 * @param header the candidate flag header
 * @param headers all headers of the file
 * @returns the header of the value column, or undefined when this is not a per-value flag column
 */
export function flagTarget(header: string, headers: readonly string[]): string | undefined {
  for (const re of FLAG_PATTERNS) {
    const m = re.exec(header.trim());
    if (m === null) continue;
    const base = m[1].trim().toLowerCase();
    if (base.length === 0) continue;
    const exact = headers.find((h) => h !== header && h.trim().toLowerCase() === base);
    if (exact !== undefined) return exact;
    const prefixed = headers.find((h) => {
      const l = h.trim().toLowerCase();
      return h !== header && l.startsWith(base) && /^[\s_([,]/.test(l.slice(base.length));
    });
    if (prefixed !== undefined) return prefixed;
  }
  return undefined;
}

/** True for a row-level flag header: "flag", "qc", "qc_flag", "quality", "quality_flag", "row_flag". */
export function isRowFlagHeader(header: string): boolean {
  return /^(flag|qc|qf|qc[\s_-]?flag|quality|quality[\s_-]?flag|row[\s_-]?flag|sample[\s_-]?flag)$/i.test(
    header.trim(),
  );
}
