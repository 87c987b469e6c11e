/**
 * Data types of the along-channel geometry: the channel network built from a
 * GeoJSON centerline, station projections and warnings.
 *
 * All values are plain data (arrays, typed arrays, an ArrayBuffer), so a network
 * can be posted to a Web Worker with structured clone.
 */

/** A notice about the geometry or the data; shown to the user, never thrown. */
export interface GeometryWarning {
  /** Stable machine-readable code, e.g. "offChannel", "noPosition", "mouthAssumed". */
  code: string;
  /** Plain-language explanation naming the station, branch or value concerned. */
  message: string;
}

/** Which end of the main stem is the mouth (seaward end). */
export type MouthOption =
  /** the first coordinate of the main stem as given in the GeoJSON */
  | "start"
  /** the last coordinate of the main stem as given in the GeoJSON */
  | "end"
  /** a point [lon, lat]; the main-stem end nearest to it is the mouth */
  | [number, number];

/** One channel of the network: the main stem or a tributary branch. */
export interface ChannelBranch {
  /** From `properties.id`, else `properties.name`, else the feature id, else "branch-<n>". */
  id: string;
  /** `properties.name` when given. */
  name?: string;
  role: "main" | "tributary";
  /** Id of the branch this one joins (undefined for the main stem). */
  parentId?: string;
  /** Chainage of the branch's downstream end [km from the mouth]; 0 for the main stem, the confluence km for a tributary. */
  kmStart: number;
  /** Chainage of the branch's upstream end [km from the mouth]. */
  kmEnd: number;
  /** Length of the branch itself [km] = kmEnd − kmStart. */
  lengthKm: number;
  /** Vertices from the downstream end (mouth or confluence) upstream, [lon, lat]; longitudes unwrapped (continuous across ±180°). */
  coordinates: [number, number][];
  /** Chainage of each vertex [km from the mouth]. */
  vertexKm: number[];
  /** True when `coordinates` run opposite to the order in the input GeoJSON. */
  reversed: boolean;
}

/**
 * The segments of all branches packed into typed arrays (pieces of at most
 * `maxSegmentM`), indexed for nearest-segment search. Internal to the geometry
 * functions but plain data.
 */
export interface ChannelSegments {
  lon0: Float64Array;
  lat0: Float64Array;
  lon1: Float64Array;
  lat1: Float64Array;
  /** Chainage at each segment end [km from the mouth]. */
  km0: Float64Array;
  km1: Float64Array;
  /** Index into {@link ChannelNetwork.branches}. */
  branch: Int32Array;
  /** 1 for the segment that starts at the mouth (points beyond it lie seaward of km 0). */
  atMouth: Uint8Array;
  /** 1 for the last segment of a branch (points beyond it lie upstream of the branch head). */
  atHead: Uint8Array;
}

/** A channel centerline network with chainage measured from the mouth. */
export interface ChannelNetwork {
  /** Branches; index 0 is the main stem, tributaries follow in attachment order. */
  branches: ChannelBranch[];
  /** Id of the main stem. */
  mainBranchId: string;
  /** The mouth (km 0) [lon, lat]. */
  mouthLonLat: [number, number];
  /** How the mouth was chosen; "assumed" means the caller did not say (see suggestMouth). */
  mouthSource: "start" | "end" | "point" | "assumed";
  /** Total length of all branches [km]. */
  totalLengthKm: number;
  /** Longitude the unwrapped coordinates are centred on [deg]; query longitudes are shifted by 360° multiples towards it. */
  centerLonDeg: number;
  segments: ChannelSegments;
  /** Serialized flatbush index over segment boxes (x = lon·lonScale, y = lat, in degrees). */
  segmentIndexData: ArrayBuffer;
  /** Factor applied to longitudes in the index so that degrees are roughly isotropic: N cos φ / M at the mid latitude. */
  indexLonScale: number;
  /** Largest |latitude| of any vertex [deg]. */
  maxAbsLatDeg: number;
  /** Notices raised while building (assumed mouth, joined parts...). */
  warnings: GeometryWarning[];
}

/** Where one station lies along the channel. */
export interface StationProjection {
  /** The station id as given. */
  id: string;
  /** Chainage of the nearest channel point [km from the mouth along the path to the mouth]; undefined without a position. */
  alongChannelKm: number | undefined;
  /**
   * Signed distance from the channel [m]: positive = right bank looking seaward
   * (downstream), negative = left bank. Undefined without a position.
   */
  offsetM: number | undefined;
  /** Id of the branch of the nearest point; undefined without a position. */
  branchId: string | undefined;
  /** Nearest channel point [lon, lat] (longitude in [−180, 180]); undefined without a position. */
  nearestLonLat: [number, number] | undefined;
  /** True when |offsetM| exceeds the caller's threshold (or the station has no position). */
  offChannel: boolean;
}
