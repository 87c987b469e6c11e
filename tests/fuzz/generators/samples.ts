import type { MixingSample } from "../../../analysis/mixing/options.ts";
import type { Rnd } from "./random.ts";
import { int, pick } from "./random.ts";

/**
 * One seeded small sample set for the mixing analysis, of the kinds that break fits: few stations,
 * repeated salinities, many zeros (up to 30 stations), all equal, censored values, negative or huge concentrations,
 * narrow salinity spans, rejected values.
 */
export function sampleSet(r: Rnd): MixingSample[] {
  const kind = int(r, 9);
  const n = kind === 8 ? 5 + int(r, 26) : int(r, 14);
  const zeros = r();
  const out: MixingSample[] = [];
  for (let i = 0; i < n; i += 1) {
    let salinity = pick(r, [0, 0.1, 5, 10, 20, 30, 35]) + (kind === 1 ? 0 : r() * 5);
    if (kind === 2) salinity = 10 + r() * 0.5;
    let conc = 100 * (1 - salinity / 35) + 2 + r() * 20;
    if (kind === 3 || (kind === 4 && r() < 0.7) || (kind === 8 && r() < zeros)) conc = 0;
    if (kind === 5) conc = 7;
    if (kind === 6) conc = pick(r, [-5, 1e-12, 1e12, 0, 3]);
    const censored = kind === 7 && r() < 0.5;
    out.push({
      stationId: `S${i}`,
      salinity,
      conc: censored ? 0 : conc,
      censored,
      ...(censored ? { detectionLimit: pick(r, [0.5, 5]) } : {}),
      accepted: r() > 0.05,
    });
  }
  return out;
}
