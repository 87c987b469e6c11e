/** Plain names of the depth layers (analysis/io LAYER_KINDS) for the layer control and the import report. */
import type { LAYER_KINDS } from "../../../analysis/index.ts";

export const LAYER_LABELS: Record<(typeof LAYER_KINDS)[number], string> = {
  shallowest: "shallowest sample of each constituent (default)",
  surface: "surface samples",
  bottom: "bottom samples",
  depthAveraged: "mean over the depths sampled",
  depthRange: "mean over a depth range",
  all: "every row (no layering)",
};
