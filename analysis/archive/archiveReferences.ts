/**
 * Bibliography entries of the archive statistics (see analysis/report/referencesBibliography.ts for
 * the meaning of `checked`; only confirmed entries are printed in a briefing's reference list).
 */
import type { BibEntry } from "../report/referencesBibliography.ts";

const MEMORY = "recalled; details not confirmed against the publication";

/** Entries cited by analysis/archive. */
export const ARCHIVE_BIBLIOGRAPHY: readonly BibEntry[] = [
  {
    key: "hyndman1996",
    authors: "Hyndman, R.J., Fan, Y.",
    year: 1996,
    title: "Sample quantiles in statistical packages",
    container: "The American Statistician 50(4), 361–365",
    doi: "10.1080/00031305.1996.10473566",
    checked: "confirmed",
    checkedAgainst:
      "authors, title, journal, volume, issue, pages and DOI as cited in two independent software reference pages",
  },
  {
    key: "kruskal1952",
    authors: "Kruskal, W.H., Wallis, W.A.",
    year: 1952,
    title: "Use of ranks in one-criterion variance analysis",
    container: "Journal of the American Statistical Association 47(260), 583–621",
    checked: "fromMemory",
    checkedAgainst: "title, journal, volume and issue confirmed from a software reference page; pages recalled",
  },
  {
    key: "spearman1904",
    authors: "Spearman, C.",
    year: 1904,
    title: "The proof and measurement of association between two things",
    container: "American Journal of Psychology 15, 72–101",
    checked: "fromMemory",
    checkedAgainst: MEMORY,
  },
  {
    key: "kendall1938",
    authors: "Kendall, M.G.",
    year: 1938,
    title: "A new measure of rank correlation",
    container: "Biometrika 30, 81–93",
    checked: "fromMemory",
    checkedAgainst: MEMORY,
  },
  {
    key: "kendall1970",
    authors: "Kendall, M.G.",
    year: 1970,
    title: "Rank Correlation Methods, 4th ed.",
    container: "Griffin, London",
    checked: "fromMemory",
    checkedAgainst: MEMORY,
  },
  {
    key: "draper1998",
    authors: "Draper, N.R., Smith, H.",
    year: 1998,
    title: "Applied Regression Analysis, 3rd ed.",
    container: "Wiley, New York",
    checked: "fromMemory",
    checkedAgainst: MEMORY,
  },
  {
    key: "dunn1961",
    authors: "Dunn, O.J.",
    year: 1961,
    title: "Multiple comparisons among means",
    container: "Journal of the American Statistical Association 56, 52–64",
    checked: "fromMemory",
    checkedAgainst: MEMORY,
  },
  {
    key: "hollander1973",
    authors: "Hollander, M., Wolfe, D.A.",
    year: 1973,
    title: "Nonparametric Statistical Methods",
    container: "Wiley, New York",
    checked: "fromMemory",
    checkedAgainst: MEMORY,
  },
];

/** Keys the archive section's methods cite. */
export const ARCHIVE_KEYS = [
  "draper1998",
  "spearman1904",
  "kendall1938",
  "kendall1970",
  "hyndman1996",
  "kruskal1952",
  "dunn1961",
] as const;
