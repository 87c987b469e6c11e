/**
 * Brackline's visual language, defined once and shared by every panel, the
 * legend and the map layers.
 *
 * - Interface colours: calm neutrals (ink, muted text, grid, paper).
 * - Categories (behaviour classes, point kinds): the Okabe & Ito (2008)
 *   colour-universal-design set, distinguishable with the common forms of
 *   colour-vision deficiency.
 * - Salinity (sequential): cividis, a perceptually uniform scale built to read
 *   the same for colour-blind viewers (Nuñez, Anderton & Renslow 2018).
 * - Deviation from the dilution line (diverging, centred on zero): purple for
 *   removal (below the line), orange for addition (above), after ColorBrewer
 *   PuOr (Harrower & Brewer 2003), which is colour-blind safe.
 */
import { interpolateCividis, interpolatePuOr } from "d3-scale-chromatic";
import { BEHAVIOUR_STYLE, MARK_STYLE, NEUTRAL_MUTED, NEUTRAL_RULE, OKABE_ITO } from "../../../../analysis/index.ts";
import type { BehaviourClass } from "../../../../analysis/mixing/result.ts";

/** Okabe & Ito (2008) colour-universal-design set, by its published colour names (the output spec's). */
export const okabeIto = OKABE_ITO;

/** Neutral interface colours (muted and rule are the output spec's). */
export const neutral = {
  ink: "#25292e",
  text: "#3d434a",
  muted: NEUTRAL_MUTED,
  rule: NEUTRAL_RULE,
  grid: "#e6e8eb",
  paper: "#fbfbfa",
  panel: "#ffffff",
  band: "#d9dde2",
  zone: "#f3ead8",
} as const;

/** Colours with a fixed meaning in every plot. */
export const roles = {
  /** Observed stations. */
  point: neutral.text,
  /** Selected stations (ring and fill). */
  selected: okabeIto.reddishPurple,
  /** Station under the pointer. */
  hovered: okabeIto.orange,
  /** Below-detection (censored) observations. */
  censored: MARK_STYLE.belowDetection.colour,
  /** QC-rejected observations. */
  rejected: MARK_STYLE.rejected.colour,
  /** Theoretical dilution line. */
  dilutionLine: neutral.muted,
  /** Fitted curve. */
  fit: okabeIto.blue,
  /** 95 % confidence band of the fit. */
  fitBand: "#cfe3f1",
  /** Tangent from the seaward segment and the effective river end-member. */
  tangent: MARK_STYLE.effectiveEndmember.colour,
  /** Salinity line in the channel profile. */
  salinity: okabeIto.skyBlue,
  /** Reaction zone shading. */
  zone: neutral.zone,
  /** Maximum marker. */
  maximum: MARK_STYLE.maximum.colour,
  /** Brush rectangle. */
  brush: "rgba(204, 121, 167, 0.14)",
} as const;

/** One colour per behaviour class: the output spec's colour-and-symbol code (analysis/output). */
export const behaviourColour = Object.fromEntries(
  Object.entries(BEHAVIOUR_STYLE).map(([k, v]) => [k, v.colour]),
) as Record<BehaviourClass, string>;

/** Ordered category colours for series without a fixed meaning (Okabe–Ito without black). */
export const categorical: readonly string[] = [
  okabeIto.blue,
  okabeIto.orange,
  okabeIto.bluishGreen,
  okabeIto.vermillion,
  okabeIto.skyBlue,
  okabeIto.reddishPurple,
  okabeIto.yellow,
];

/** Practical-salinity range the sequential scale spans (fresh to open sea). */
export const salinityDomain: readonly [number, number] = [0, 36];

/**
 * Colour for a practical salinity on the perceptually uniform cividis scale.
 * Values outside {@link salinityDomain} are clamped.
 */
export function salinityColour(salinity: number): string {
  const [lo, hi] = salinityDomain;
  const t = Math.min(1, Math.max(0, (salinity - lo) / (hi - lo)));
  return interpolateCividis(t);
}

/**
 * Colour for a percentage deviation from the dilution line on the diverging
 * scale: purple below the line (removal), orange above (addition), neutral at 0.
 * `limitPercent` is the deviation drawn at full saturation (clamped beyond).
 */
export function deviationColour(deviationPercent: number, limitPercent = 50): string {
  if (!(limitPercent > 0)) throw new RangeError(`deviationColour(): limitPercent must be > 0, got ${limitPercent}`);
  const t = Math.min(1, Math.max(-1, deviationPercent / limitPercent));
  // d3's PuOr runs purple (0) → light neutral (0.5) → orange (1); removal (negative) → purple.
  return interpolatePuOr(0.5 + t / 2);
}

/** Evenly spaced stops of a colour function for legends and map ramps. */
export function rampStops(
  colour: (t: number) => string,
  domain: readonly [number, number],
  n = 9,
): Array<[number, string]> {
  if (!(n >= 2)) throw new RangeError(`rampStops(): n must be ≥ 2, got ${n}`);
  const [lo, hi] = domain;
  return Array.from({ length: n }, (_, i) => {
    const v = lo + ((hi - lo) * i) / (n - 1);
    return [v, colour(v)] as [number, string];
  });
}
