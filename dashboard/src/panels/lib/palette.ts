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
import type { BehaviourClass } from "../../../../analysis/mixing/result.ts";

/** Okabe & Ito (2008) colour-universal-design set, by its published colour names. */
export const okabeIto = {
  black: "#000000",
  orange: "#E69F00",
  skyBlue: "#56B4E9",
  bluishGreen: "#009E73",
  yellow: "#F0E442",
  blue: "#0072B2",
  vermillion: "#D55E00",
  reddishPurple: "#CC79A7",
} as const;

/** Neutral interface colours. */
export const neutral = {
  ink: "#25292e",
  text: "#3d434a",
  muted: "#6e757d",
  rule: "#c9cdd2",
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
  censored: neutral.muted,
  /** QC-rejected observations. */
  rejected: okabeIto.vermillion,
  /** Theoretical dilution line. */
  dilutionLine: neutral.muted,
  /** Fitted curve. */
  fit: okabeIto.blue,
  /** 95 % confidence band of the fit. */
  fitBand: "#cfe3f1",
  /** Tangent from the seaward segment and the effective river end-member. */
  tangent: okabeIto.bluishGreen,
  /** Salinity line in the channel profile. */
  salinity: okabeIto.skyBlue,
  /** Reaction zone shading. */
  zone: neutral.zone,
  /** Maximum marker. */
  maximum: okabeIto.orange,
  /** Brush rectangle. */
  brush: "rgba(204, 121, 167, 0.14)",
} as const;

/** One colour per behaviour class (Okabe–Ito). */
export const behaviourColour: Record<BehaviourClass, string> = {
  conservative: neutral.muted,
  removal: okabeIto.blue,
  addition: okabeIto.vermillion,
  "removal-then-conservative": okabeIto.skyBlue,
  "maximum-then-conservative": okabeIto.orange,
  "insufficient-data": neutral.rule,
};

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
