/**
 * Reads the latitude and longitude cells of an underway log with analysis/io's coordinate reader
 * (decimal degrees, degrees–minutes, hemisphere letters). A record without a readable position is
 * rejected (kept in the columns with NaN and counted by reason).
 */
import { parseCoordinateText } from "../io/coordinates.ts";
import { isMissingText } from "../io/valueText.ts";
import type { UnderwayColumnRole } from "./headerRoles.ts";
import type { IssueLog } from "./issueLog.ts";
import { GrowableFloat64 } from "./growableColumns.ts";
import { fastDecimal } from "./cellText.ts";

/** Reads positions record by record. */
export class PositionReader {
  readonly #lat: UnderwayColumnRole | undefined;
  readonly #lon: UnderwayColumnRole | undefined;
  readonly #lonDeg = new GrowableFloat64();
  readonly #latDeg = new GrowableFloat64();
  readonly originalText: Record<string, Map<number, string>> = {};

  constructor(
    roles: readonly UnderwayColumnRole[],
    private readonly file: string,
    private readonly decimalComma: boolean,
    private readonly log: IssueLog,
  ) {
    this.#lat = roles.find((r) => r.role === "latitude");
    this.#lon = roles.find((r) => r.role === "longitude");
    if (this.#lat === undefined || this.#lon === undefined)
      log.add("no position columns", file, 1, "", "", "latitude and longitude columns (e.g. lat, lon)");
  }

  #cell(
    fields: string[],
    row: number,
    index: number,
    col: UnderwayColumnRole,
    axis: "latitude" | "longitude",
  ): number | string {
    const text = fields[col.index] ?? "";
    const quick = this.decimalComma ? undefined : fastDecimal(text);
    if (quick !== undefined && Math.abs(quick) <= (axis === "latitude" ? 90 : 180)) return quick;
    const v = parseCoordinateText(text, axis, this.decimalComma);
    if (v !== undefined) return v;
    if (isMissingText(text)) return `no ${axis}`;
    (this.originalText[col.header] ??= new Map()).set(index, text);
    this.log.add(
      `unreadable ${axis}`,
      this.file,
      row,
      col.header,
      text,
      `a ${axis} in decimal degrees or degrees and minutes`,
    );
    return `unreadable ${axis}`;
  }

  /**
   * Reads one record's position.
   *
   * @returns undefined when accepted, else the rejection reason
   */
  read(fields: string[], row: number, index: number): string | undefined {
    if (this.#lat === undefined || this.#lon === undefined) {
      this.#lonDeg.push(Number.NaN);
      this.#latDeg.push(Number.NaN);
      return "no position columns";
    }
    const lat = this.#cell(fields, row, index, this.#lat, "latitude");
    const lon = this.#cell(fields, row, index, this.#lon, "longitude");
    if (typeof lat === "number" && typeof lon === "number") {
      this.#lonDeg.push(lon);
      this.#latDeg.push(lat);
      return undefined;
    }
    this.#lonDeg.push(Number.NaN);
    this.#latDeg.push(Number.NaN);
    const reasons = [lat, lon].filter((r): r is string => typeof r === "string");
    if (reasons.length === 2 && reasons[0]!.startsWith("no ") && reasons[1]!.startsWith("no ")) return "no position";
    return reasons.find((r) => r.startsWith("unreadable")) ?? reasons[0];
  }

  finish(): { lonDeg: Float64Array; latDeg: Float64Array; originalText: Record<string, Map<number, string>> } {
    return { lonDeg: this.#lonDeg.trimmed(), latDeg: this.#latDeg.trimmed(), originalText: this.originalText };
  }
}
