import { z } from "./zodMini.ts";

import { COLUMN_ROLES, type ColumnRole } from "./columnRoles.ts";

export { COLUMN_ROLES, type ColumnRole };

export const columnAssignmentSchema = z.object({
  /** Header text exactly as in the file. */
  header: z.string(),
  role: z.enum(COLUMN_ROLES),
  /** Constituent symbol (role "constituent"), e.g. "Si". */
  name: z.optional(z.string()),
  /** Canonical unit; required for constituents, conductivity, discharge. */
  unit: z.optional(z.string()),
  /** Unit text as found in the header. */
  unitText: z.optional(z.string()),
  /** For role "flag": the header of the value column the flag belongs to. */
  flagFor: z.optional(z.string()),
  /**
   * For constituents: "tracer" (dissolved, analysed against the dilution line) or "nonMixing"
   * (shown along the channel only); suggested from the name, the user may override it.
   */
  kind: z.optional(z.enum(["tracer", "nonMixing"])),
  /** Why the suggestion chose this role (shown in the mapping dialog). */
  reason: z.optional(z.string()),
});

/** One column's assignment in a {@link ColumnMapping}. */
export type ColumnAssignment = z.infer<typeof columnAssignmentSchema>;

export const columnMappingSchema = z.object({
  /** File-shape signature the mapping was made for (see fileShapeSignature). */
  shape: z.string(),
  columns: z.array(columnAssignmentSchema),
  /** Field delimiter; detected when absent. */
  delimiter: z.optional(z.string()),
  /** Decimal comma; detected when absent. */
  decimalComma: z.optional(z.boolean()),
  /** Order of day, month and year in slash or dot dates ("1/21/16"). */
  dateOrder: z.optional(z.enum(["MDY", "DMY", "YMD"])),
  /** Time zone of the times as an ISO offset ("Z", "+01:00"); times stay local when absent. */
  timeZone: z.optional(z.string()),
  /** EPSG code of projected x/y columns. */
  epsg: z.optional(z.int()),
  /** Depths for the labels in a "depthLabel" column, e.g. {"S": 0.2}; unlisted labels only give the layer. */
  depthLabels: z.optional(z.record(z.string(), z.number())),
});

/**
 * How the columns of one file shape are read: JSON-serialisable; the user confirms or corrects the
 * suggestion in the mapping dialog, and a saved mapping is reused for files of the same shape.
 */
export type ColumnMapping = z.infer<typeof columnMappingSchema>;

/** Finds the first column with the role, or undefined. */
export function columnWithRole(mapping: ColumnMapping, role: ColumnRole): ColumnAssignment | undefined {
  return mapping.columns.find((c) => c.role === role);
}
