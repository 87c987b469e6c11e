/**
 * Deterministic JSON text in the layout the project's formatter (Prettier, printWidth 120)
 * gives JSON files: 2-space indentation, objects expanded, an array of primitives on one line
 * as `[a, b]` when that line fits in 120 characters, otherwise one element per line.
 * Coordinate pairs therefore stay on one line.
 */

const WIDTH = 120;

type Json = null | boolean | number | string | Json[] | { [key: string]: Json };

function isPrimitive(v: unknown): boolean {
  return v === null || typeof v !== "object";
}

function write(value: Json, indent: string, prefixLength: number): string {
  if (value === null || typeof value !== "object") return JSON.stringify(value);
  const inner = `${indent}  `;
  if (Array.isArray(value)) {
    if (value.length === 0) return "[]";
    if (value.every(isPrimitive)) {
      const oneLine = `[${value.map((v) => JSON.stringify(v)).join(", ")}]`;
      if (prefixLength + oneLine.length + 1 <= WIDTH) return oneLine;
    }
    return `[\n${value.map((v) => inner + write(v, inner, inner.length)).join(",\n")}\n${indent}]`;
  }
  const entries = Object.entries(value as { [key: string]: Json });
  if (entries.length === 0) return "{}";
  const lines = entries.map(([k, v]) => {
    const head = `${inner}${JSON.stringify(k)}: `;
    return head + write(v, inner, head.length);
  });
  return `{\n${lines.join(",\n")}\n${indent}}`;
}

/**
 * Serialises a JSON-compatible value (a round trip through JSON first drops undefined members).
 *
 * @returns the text with a final newline
 */
export function stableJson(value: unknown): string {
  const plain = JSON.parse(JSON.stringify(value)) as Json;
  return `${write(plain, "", 0)}\n`;
}
