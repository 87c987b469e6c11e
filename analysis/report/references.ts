/**
 * Methods citations of the briefing (from the project's reference sheet mixing-methods.md §8;
 * entries marked there as recalled rather than read carry a check-before-citing note).
 */

const CHECK = " [details from memory in the reference sheet; check before citing]";

/** Reference list, alphabetical. */
export const BRIEFING_REFERENCES: readonly string[] = [
  "Boyle, E., Collier, R., Dengler, A.T., Edmond, J.M., Ng, A.C., Stallard, R.F. (1974) On the chemical mass-balance in estuaries. Geochim. Cosmochim. Acta 38, 1719–1728.",
  "Chatwin, P.C. (1976) Some remarks on the maintenance of the salinity distribution in estuaries. Estuarine Coastal Mar. Sci. 4, 555–566." +
    CHECK,
  "Cifuentes, L.A., Schemel, L.E., Sharp, J.H. (1990) Estuar. Coast. Shelf Sci. 30, 411–427." + CHECK,
  "Craven, P., Wahba, G. (1979) Smoothing noisy data with spline functions. Numer. Math. 31, 377–403." + CHECK,
  "Efron, B., Tibshirani, R.J. (1993) An Introduction to the Bootstrap. Chapman & Hall, New York." + CHECK,
  "Hansen, D.V., Rattray, M. (1965) Gravitational circulation in straits and estuaries. J. Mar. Res. 23, 104–122." +
    CHECK,
  "Liss, P.S. (1976) Conservative and non-conservative behaviour of dissolved constituents during estuarine mixing. In: Burton, J.D., Liss, P.S. (eds) Estuarine Chemistry. Academic Press, London, 93–130.",
  "Loder, T.C., Reichard, R.P. (1981) The dynamics of conservative mixing in estuaries. Estuaries 4, 64–69." + CHECK,
  "Monismith, S.G., Kimmerer, W., Burau, J.R., Stacey, M.T. (2002) Structure and flow-induced variability of the subtidal salinity field in northern San Francisco Bay. J. Phys. Oceanogr. 32, 3003–3019." +
    CHECK,
  "Officer, C.B. (1979) Discussion of the behaviour of nonconservative dissolved constituents in estuaries. Estuarine Coastal Mar. Sci. 9, 91–94." +
    CHECK,
  "Officer, C.B., Lynch, D.R. (1981) Dynamics of mixing in estuaries. Estuarine Coastal Shelf Sci. 12, 525–533." +
    CHECK,
  "Regnier, P., Mouchet, A., Wollast, R., Ronday, F. (1998) A discussion of methods for estimating residual fluxes in strong tidal estuaries. Cont. Shelf Res. 18, 1543–1571.",
  "Savenije, H.H.G. (1993) Predictive model for salt intrusion in estuaries. J. Hydrol. 148, 203–218.",
];

/**
 * Methods paragraphs of the briefing.
 *
 * @param fitMethod how the C–S curves were fitted (from the analyses), when known
 * @param bootstrap draws and seed of the bootstrap, when known
 * @param comparison true when surveys are compared
 */
export function methodsParagraphs(
  fitMethod: string | undefined,
  bootstrap: { draws: number; seed: number } | undefined,
  comparison: boolean,
): string[] {
  const out = [
    "Stations are placed on the channel centerline (GeoJSON, RFC 7946) as distance from the mouth along the channel in km; salinity along the channel is fitted as a profile that falls landward, and isohaline positions are interpolated between stations. The salt intrusion length is the distance of the S = 2 isohaline from the mouth (mixing-methods.md §5.1).",
    "Each dissolved constituent is plotted against salinity and compared with the theoretical dilution line, the straight line joining the river and sea end-members that a conservatively mixing constituent would follow (Liss 1976; Boyle et al. 1974). A constituent is called non-conservative only when the stations depart from the line by more than twice the analytical precision and the curvature tests agree (common practice).",
    `The concentration–salinity curve is fitted as ${fitMethod ?? "a smoothing spline"} (Craven & Wahba 1979). Uncertainties are 95 % intervals from a bootstrap over stations${bootstrap ? ` (${bootstrap.draws} draws, seed ${bootstrap.seed})` : ""} (Efron & Tibshirani 1993).`,
    "The effective river end-member C*₀ is the straight seaward part of the curve extrapolated back to river salinity. The net change, 100·(C*₀ − C₀)/C₀ in %, is negative for removal and positive for addition; with the river discharge Q, the river supplies Q·C₀, Q·C*₀ passes to the sea, and Q·(C*₀ − C₀) is the estuary's net sink or source in mol/s (Boyle et al. 1974).",
    "Reaction zones are the salinity ranges where the curve departs significantly from conservative mixing, placed on the channel through the survey's salinity profile; a mid-estuarine maximum is the highest point of the curve above the dilution line.",
    "All of this assumes steady river flow and end-members over at least one flushing time, two end-members only and the same mixing for salt and the constituent (Officer 1979; Officer & Lynch 1981). A changing river concentration can make a conservative constituent look removed or added (Loder & Reichard 1981; Cifuentes et al. 1990), and straight lines can arise in changing conditions (Regnier et al. 1998).",
  ];
  if (comparison)
    out.push(
      "Surveys are compared as later minus reference survey. The 95 % interval of a difference combines the two surveys' intervals in quadrature, an approximation that treats the surveys as independent. The apparent discharge exponent n in L ∝ Qⁿ is the slope of ln L against ln Q; it is set beside the classical theoretical −1 (constant dispersion) and −1/3 (gravitational circulation; Hansen & Rattray 1965; Chatwin 1976) and the −1/7 observed in northern San Francisco Bay (Monismith et al. 2002). Other estuaries give other exponents (Savenije 1993).",
    );
  return out;
}
