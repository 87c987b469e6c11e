// The column roles of a mapping, apart from the mapping's schema so the dashboard's first page can
// list them without loading the schema library.
/** What a column holds. */
export const COLUMN_ROLES = [
  "station",
  "survey",
  "dateTime",
  "date",
  "time",
  "latitude",
  "longitude",
  "x",
  "y",
  "depth",
  "depthLabel",
  "salinity",
  "conductivity",
  "temperature",
  "pH",
  "constituent",
  "flag",
  "rowFlag",
  "discharge",
  "distance",
  "ignore",
] as const;

/** What a column holds (see {@link COLUMN_ROLES}). */
export type ColumnRole = (typeof COLUMN_ROLES)[number];
