/**
 * A short signature of a file's column layout, used to find the saved mapping for files of the same
 * shape: the headers are normalised (trimmed, lower-case, inner white space collapsed, BOM removed),
 * sorted, joined with a newline and hashed with 32-bit FNV-1a (Fowler–Noll–Vo; common practice for
 * short non-cryptographic keys).
 *
 * @param headers the header texts of the file in any order
 * @returns "shape-<count>-<8 hex digits>"
 */
export function fileShapeSignature(headers: readonly string[]): string {
  const norm = headers
    .map((h) =>
      h
        .replace(/^\uFEFF/, "")
        .trim()
        .toLowerCase()
        .replace(/\s+/g, " "),
    )
    .sort();
  const text = norm.join("\n");
  let hash = 0x811c9dc5;
  for (let i = 0; i < text.length; i += 1) {
    hash ^= text.charCodeAt(i);
    hash = Math.imul(hash, 0x01000193) >>> 0;
  }
  return `shape-${norm.length}-${hash.toString(16).padStart(8, "0")}`;
}

/**
 * Picks a saved mapping made for the same file shape.
 *
 * @param headers the new file's headers
 * @param saved mappings saved earlier
 * @returns the first saved mapping whose shape matches, or undefined
 */
export function findSavedMapping<T extends { shape: string }>(
  headers: readonly string[],
  saved: readonly T[],
): T | undefined {
  const shape = fileShapeSignature(headers);
  return saved.find((m) => m.shape === shape);
}
