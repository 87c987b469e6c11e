import { buildChannelNetwork } from "../geometry/buildNetwork.ts";
import type { CenterlineGeoJson } from "../geometry/geojsonInput.ts";
import { centerlineMouthHint } from "../geometry/mouthHint.ts";
import type { MouthEvidence } from "../geometry/suggestMouth.ts";
import { suggestMouth } from "../geometry/suggestMouth.ts";
import type { ChannelNetwork, MouthOption } from "../geometry/types.ts";
import type { MixingWarning } from "./surveyAnalysis.ts";

/** How the mouth of a network was chosen. */
export interface ResolvedNetwork {
  network: ChannelNetwork;
  /** "stated": by the user; "file": by the centerline file; "suggested": from salinity; "assumed": no evidence. */
  mouthChoice: "stated" | "file" | "suggested" | "assumed";
  /** The notice to show (suggested or assumed mouth), naming how to change it. */
  notice?: MixingWarning;
}

const HOW_TO_CHANGE =
  "Change it with --mouth start|end|lon,lat on the command line or the Mouth control in the dashboard.";

/**
 * Builds the channel network with its mouth: as the user stated it, else as the centerline file
 * states it, else suggested from the stations' salinity (salinity rises towards the sea; see
 * suggestMouth, Spearman 1904), else the first vertex with a notice. A suggested mouth is stated as
 * such, with the CLI flag and the dashboard control that change it.
 *
 * @param geojson centerline (RFC 7946)
 * @param stated the user's mouth choice, if any
 * @param evidence station positions and salinities (all surveys)
 * @param options other network options (main branch id, tolerances)
 * @returns the network and how its mouth was chosen
 * @throws RangeError/TypeError as buildChannelNetwork for an unusable centerline
 */
export function networkWithMouth(
  geojson: CenterlineGeoJson,
  stated: MouthOption | undefined,
  evidence: readonly MouthEvidence[],
  options: Omit<Parameters<typeof buildChannelNetwork>[1] & object, "mouth"> = {},
): ResolvedNetwork {
  if (stated !== undefined)
    return { network: buildChannelNetwork(geojson, { ...options, mouth: stated }), mouthChoice: "stated" };
  if (centerlineMouthHint(geojson) !== undefined)
    return { network: buildChannelNetwork(geojson, options), mouthChoice: "file" };
  const assumed = buildChannelNetwork(geojson, options);
  const s = suggestMouth(assumed, evidence);
  if (s === undefined)
    return {
      network: assumed,
      mouthChoice: "assumed",
      notice: {
        code: "mouthAssumed",
        message: `The mouth was not stated and the stations' salinity cannot suggest it (fewer than 3 placed stations with salinity); the first vertex of the centerline is used. ${HOW_TO_CHANGE}`,
      },
    };
  const network = buildChannelNetwork(geojson, { ...options, mouth: s.mouth });
  network.warnings = network.warnings.filter((w) => w.code !== "mouthAssumed");
  return {
    network,
    mouthChoice: "suggested",
    notice: {
      code: "mouthSuggested",
      message: `Mouth suggested from salinity: the ${s.mouth} of the centerline [${s.mouthLonLat[0].toFixed(4)}, ${s.mouthLonLat[1].toFixed(4)}], towards which salinity rises (Spearman ρ = ${Math.abs(s.spearmanRho).toFixed(2)}, n = ${s.nStations}). ${HOW_TO_CHANGE}`,
    },
  };
}
