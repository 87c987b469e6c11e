/**
 * Bibliography entries for estuarine mixing, salt intrusion and statistics (see referencesBibliography.ts
 * for the meaning of `checked`). "Reference sheet" = the project's shared methods reference sheet,
 * whose "confirmed" tags mean checked against the abstract page, DOI or a reference list.
 */
import type { BibEntry } from "./referencesBibliography.ts";

const SHEET = "reference sheet: confirmed against abstract page or DOI";
const MEMORY = "recalled; volume, pages and title not confirmed";

/** Mixing-related entries. */
export const MIXING_BIBLIOGRAPHY: readonly BibEntry[] = [
  {
    key: "boyle1974",
    authors: "Boyle, E., Collier, R., Dengler, A.T., Edmond, J.M., Ng, A.C., Stallard, R.F.",
    year: 1974,
    title: "On the chemical mass-balance in estuaries",
    container: "Geochimica et Cosmochimica Acta 38, 1719–1728",
    checked: "confirmed",
    checkedAgainst: SHEET,
  },
  {
    key: "liss1976",
    authors: "Liss, P.S.",
    year: 1976,
    title: "Conservative and non-conservative behaviour of dissolved constituents during estuarine mixing",
    container: "In: Burton, J.D., Liss, P.S. (Eds.), Estuarine Chemistry. Academic Press, London, 93–130",
    checked: "fromMemory",
    checkedAgainst:
      "book, editors and pages confirmed by the reference sheet from a citing publication; chapter title from memory",
  },
  {
    key: "savenije1993",
    authors: "Savenije, H.H.G.",
    year: 1993,
    title: "Predictive model for salt intrusion in estuaries",
    container: "Journal of Hydrology 148, 203–218",
    checked: "confirmed",
    checkedAgainst: "first page of the article (stored copy), and reference sheet",
  },
  {
    key: "regnier1998",
    authors: "Regnier, P., Mouchet, A., Wollast, R., Ronday, F.",
    year: 1998,
    title: "A discussion of methods for estimating residual fluxes in strong tidal estuaries",
    container: "Continental Shelf Research 18, 1543–1571",
    checked: "fromMemory",
    checkedAgainst: "reference sheet confirmed authors, title, journal, volume and first page; end page from memory",
  },
  {
    key: "craven1979",
    authors: "Craven, P., Wahba, G.",
    year: 1979,
    title: "Smoothing noisy data with spline functions",
    container: "Numerische Mathematik 31, 377–403",
    checked: "confirmed",
    checkedAgainst: "a statistics manual's reference list (authors, year, title, volume, pages)",
  },
  {
    key: "efron1993",
    authors: "Efron, B., Tibshirani, R.J.",
    year: 1993,
    title: "An Introduction to the Bootstrap",
    container: "Chapman & Hall, New York",
    checked: "fromMemory",
    checkedAgainst: MEMORY,
  },
  {
    key: "officer1979",
    authors: "Officer, C.B.",
    year: 1979,
    title: "Discussion of the behaviour of nonconservative dissolved constituents in estuaries",
    container: "Estuarine and Coastal Marine Science 9, 91–94",
    checked: "fromMemory",
    checkedAgainst: MEMORY,
  },
  {
    key: "officerLynch1981",
    authors: "Officer, C.B., Lynch, D.R.",
    year: 1981,
    title: "Dynamics of mixing in estuaries",
    container: "Estuarine, Coastal and Shelf Science 12, 525–533",
    checked: "fromMemory",
    checkedAgainst: MEMORY,
  },
  {
    key: "loderReichard1981",
    authors: "Loder, T.C., Reichard, R.P.",
    year: 1981,
    title: "The dynamics of conservative mixing in estuaries",
    container: "Estuaries 4, 64–69",
    checked: "fromMemory",
    checkedAgainst: MEMORY,
  },
  {
    key: "cifuentes1990",
    authors: "Cifuentes, L.A., Schemel, L.E., Sharp, J.H.",
    year: 1990,
    title:
      "Qualitative and numerical analyses of the effects of river inflow variations on mixing diagrams in estuaries",
    container: "Estuarine, Coastal and Shelf Science 30, 411–427",
    checked: "fromMemory",
    checkedAgainst: MEMORY,
  },
  {
    key: "hansenRattray1965",
    authors: "Hansen, D.V., Rattray, M.",
    year: 1965,
    title: "Gravitational circulation in straits and estuaries",
    container: "Journal of Marine Research 23, 104–122",
    checked: "fromMemory",
    checkedAgainst: MEMORY,
  },
  {
    key: "chatwin1976",
    authors: "Chatwin, P.C.",
    year: 1976,
    title: "Some remarks on the maintenance of the salinity distribution in estuaries",
    container: "Estuarine and Coastal Marine Science 4, 555–566",
    checked: "fromMemory",
    checkedAgainst: MEMORY,
  },
  {
    key: "monismith2002",
    authors: "Monismith, S.G., Kimmerer, W., Burau, J.R., Stacey, M.T.",
    year: 2002,
    title: "Structure and flow-induced variability of the subtidal salinity field in northern San Francisco Bay",
    container: "Journal of Physical Oceanography 32, 3003–3019",
    checked: "fromMemory",
    checkedAgainst: `${MEMORY}; the exponent −1/7 is also from memory`,
  },
  {
    key: "kaulFroelich1984",
    authors: "Kaul, L.W., Froelich, P.N.",
    year: 1984,
    title: "Modeling estuarine nutrient geochemistry in a simple system",
    container: "Geochimica et Cosmochimica Acta 48, 1417–1433",
    checked: "fromMemory",
    checkedAgainst: MEMORY,
  },
];
