/**
 * The one colour-and-symbol code for what a result means, shared by the dashboard, the briefing and any
 * other rendering: behaviour classes, point kinds (below detection, rejected) and marks (effective
 * end-member, maximum). Colours are the Okabe & Ito colour-universal-design set, readable with the
 * common forms of colour-vision deficiency.
 *
 * @see Okabe, M. & Ito, K. (2008) Color Universal Design (CUD): how to make figures and presentations
 *   that are friendly to colorblind people. J*Fly Data Depository for Drosophila Researchers.
 */
import type { BehaviourClass } from "../mixing/result.ts";

/** Okabe & Ito (2008) colours by their published names. */
export const OKABE_ITO = {
  black: "#000000",
  orange: "#E69F00",
  skyBlue: "#56B4E9",
  bluishGreen: "#009E73",
  yellow: "#F0E442",
  blue: "#0072B2",
  vermillion: "#D55E00",
  reddishPurple: "#CC79A7",
} as const;

/** Muted neutral used for conservative behaviour, below-detection points and the dilution line. */
export const NEUTRAL_MUTED = "#6e757d";
/** Light neutral for "not enough data". */
export const NEUTRAL_RULE = "#c9cdd2";

/** Symbol shapes a renderer draws (SVG, canvas, map icon or terminal glyph). */
export type MarkSymbol = "dot" | "triangle" | "cross" | "diamond" | "star" | "square" | "ring";

/** How one meaning is shown everywhere: colour, symbol, a short and a plain-words label. */
export interface MarkStyle {
  colour: string;
  symbol: MarkSymbol;
  short: string;
  label: string;
}

/** Behaviour classes: one colour, symbol and wording each. */
export const BEHAVIOUR_STYLE: Record<BehaviourClass, MarkStyle> = {
  conservative: { colour: NEUTRAL_MUTED, symbol: "dot", short: "conservative", label: "Mixes conservatively" },
  removal: { colour: OKABE_ITO.blue, symbol: "triangle", short: "removal", label: "Removed in the estuary" },
  addition: { colour: OKABE_ITO.vermillion, symbol: "square", short: "addition", label: "Added in the estuary" },
  "removal-then-conservative": {
    colour: OKABE_ITO.skyBlue,
    symbol: "triangle",
    short: "removal, then conservative",
    label: "Removed at low salinity, then conservative",
  },
  "maximum-then-conservative": {
    colour: OKABE_ITO.orange,
    symbol: "star",
    short: "maximum, then conservative",
    label: "Mid-estuary maximum, then conservative",
  },
  "insufficient-data": {
    colour: NEUTRAL_RULE,
    symbol: "ring",
    short: "insufficient data",
    label: "Not enough data to say",
  },
};

/** Marks with a fixed meaning in every plot and map. */
export const MARK_STYLE = {
  belowDetection: {
    colour: NEUTRAL_MUTED,
    symbol: "triangle",
    short: "below detection",
    label: "Below detection (at limit)",
  },
  rejected: { colour: OKABE_ITO.vermillion, symbol: "cross", short: "rejected", label: "Rejected by QC" },
  effectiveEndmember: {
    colour: OKABE_ITO.bluishGreen,
    symbol: "diamond",
    short: "C*₀",
    label: "C*₀ (effective river end-member)",
  },
  maximum: { colour: OKABE_ITO.orange, symbol: "star", short: "maximum", label: "Maximum (95 % range)" },
} as const satisfies Record<string, MarkStyle>;
