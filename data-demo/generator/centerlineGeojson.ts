/**
 * The centerline file (GeoJSON FeatureCollection, RFC 7946, [lon, lat]): the main stem ordered
 * from mouth to head, the tributary ordered from its confluence upstream, and Point features
 * for the mouth and the head.
 */
import type { ChannelLine, Tributary } from "./centerline.ts";
import { roundTo } from "./format.ts";
import { INVENTED_DATA_NOTE, INVENTED_NAMES } from "./names.ts";

/** Builds the centerline FeatureCollection. */
export function centerlineGeojson(main: ChannelLine, tributary: Tributary): object {
  const mainLengthKm = main.cumKm[main.cumKm.length - 1];
  const tribLengthKm = tributary.line.cumKm[tributary.line.cumKm.length - 1];
  return {
    type: "FeatureCollection",
    disclaimer: INVENTED_DATA_NOTE,
    features: [
      {
        type: "Feature",
        properties: {
          role: "main",
          name: INVENTED_NAMES.river,
          mouth: "start",
          lengthKm: roundTo(mainLengthKm, 3),
          note: INVENTED_DATA_NOTE,
        },
        geometry: { type: "LineString", coordinates: main.lonLat },
      },
      {
        type: "Feature",
        properties: {
          role: "tributary",
          name: INVENTED_NAMES.tributary,
          mouth: "start",
          joinsAtKm: roundTo(tributary.confluenceKm, 3),
          lengthKm: roundTo(tribLengthKm, 3),
          note: INVENTED_DATA_NOTE,
        },
        geometry: { type: "LineString", coordinates: tributary.line.lonLat },
      },
      {
        type: "Feature",
        properties: { role: "mouth", name: `${INVENTED_NAMES.estuary} mouth`, note: INVENTED_DATA_NOTE },
        geometry: { type: "Point", coordinates: main.lonLat[0] },
      },
      {
        type: "Feature",
        properties: { role: "head", name: `Tidal limit at ${INVENTED_NAMES.quay}`, note: INVENTED_DATA_NOTE },
        geometry: { type: "Point", coordinates: main.lonLat[main.lonLat.length - 1] },
      },
    ],
  };
}
