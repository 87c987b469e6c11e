import { z } from "zod";

import { COLUMN_ROLES, type ColumnRole } from "./columnRoles.ts";

export { COLUMN_ROLES, type ColumnRole };

export const columnAssignmentSchema = z.object({
  /** Header text exactly as in the file. */
  header: z.string(),
  role: z.enum(COLUMN_ROLES),
  /** Constituent symbol (role "constituent"), e.g. "Si". */
  name: z.string().optional(),
  /** Canonical unit; required for constituents, conductivity, discharge. */
  unit: z.string().optional(),
  /** Unit text as found in the header. */
  unitText: z.string().optional(),
  /** For role "flag": the header of the value column the flag belongs to. */
  flagFor: z.string().optional(),
  /**
   * For constituents: "tracer" (dissolved, analysed against the dilution line) or "nonMixing"
   * (shown along the channel only); suggested from the name, the user may override it.
   */
  kind: z.enum(["tracer", "nonMixing"]).optional(),
  /** Why the suggestion chose this role (shown in the mapping dialog). */
  reason: z.string().optional(),
});

/** One column's assignment in a {@link ColumnMapping}. */
export type ColumnAssignment = z.infer<typeof columnAssignmentSchema>;

export const columnMappingSchema = z.object({
  /** File-shape signature the mapping was made for (see fileShapeSignature). */
  shape: z.string(),
  columns: z.array(columnAssignmentSchema),
  /** Field delimiter; detected when absent. */
  delimiter: z.string().optional(),
  /** Decimal comma; detected when absent. */
  decimalComma: z.boolean().optional(),
  /** Order of day, month and year in slash or dot dates ("1/21/16"). */
  dateOrder: z.enum(["MDY", "DMY", "YMD"]).optional(),
  /** Time zone of the times as an ISO offset ("Z", "+01:00"); times stay local when absent. */
  timeZone: z.string().optional(),
  /** EPSG code of projected x/y columns. */
  epsg: z.number().int().optional(),
  /** Depths for the labels in a "depthLabel" column, e.g. {"S": 0.2}; unlisted labels only give the layer. */
  depthLabels: z.record(z.string(), z.number()).optional(),
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
