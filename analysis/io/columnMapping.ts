import { int, num, v } from "./validation.ts";

import { COLUMN_ROLES, type ColumnRole } from "./columnRoles.ts";

export { COLUMN_ROLES, type ColumnRole };

export const columnAssignmentSchema = v.object({
  /** Header text exactly as in the file. */
  header: v.string(),
  role: v.picklist(COLUMN_ROLES),
  /** Constituent symbol (role "constituent"), e.g. "Si". */
  name: v.optional(v.string()),
  /** Canonical unit; required for constituents, conductivity, discharge. */
  unit: v.optional(v.string()),
  /** Unit text as found in the header. */
  unitText: v.optional(v.string()),
  /** For role "flag": the header of the value column the flag belongs to. */
  flagFor: v.optional(v.string()),
  /**
   * For constituents: "tracer" (dissolved, analysed against the dilution line) or "nonMixing"
   * (shown along the channel only); suggested from the name, the user may override it.
   */
  kind: v.optional(v.picklist(["tracer", "nonMixing"])),
  /** Why the suggestion chose this role (shown in the mapping dialog). */
  reason: v.optional(v.string()),
});

/** One column's assignment in a {@link ColumnMapping}. */
export type ColumnAssignment = v.InferOutput<typeof columnAssignmentSchema>;

export const columnMappingSchema = v.object({
  /** File-shape signature the mapping was made for (see fileShapeSignature). */
  shape: v.string(),
  columns: v.array(columnAssignmentSchema),
  /** Field delimiter; detected when absent. */
  delimiter: v.optional(v.string()),
  /** Decimal comma; detected when absent. */
  decimalComma: v.optional(v.boolean()),
  /** Order of day, month and year in slash or dot dates ("1/21/16"). */
  dateOrder: v.optional(v.picklist(["MDY", "DMY", "YMD"])),
  /** Time zone of the times as an ISO offset ("Z", "+01:00"); times stay local when absent. */
  timeZone: v.optional(v.string()),
  /** EPSG code of projected x/y columns. */
  epsg: v.optional(int),
  /** Depths for the labels in a "depthLabel" column, e.g. {"S": 0.2}; unlisted labels only give the layer. */
  depthLabels: v.optional(v.record(v.string(), num)),
});

/**
 * How the columns of one file shape are read: JSON-serialisable; the user confirms or corrects the
 * suggestion in the mapping dialog, and a saved mapping is reused for files of the same shape.
 */
export type ColumnMapping = v.InferOutput<typeof columnMappingSchema>;

/** Finds the first column with the role, or undefined. */
export function columnWithRole(mapping: ColumnMapping, role: ColumnRole): ColumnAssignment | undefined {
  return mapping.columns.find((c) => c.role === role);
}
