import { randomLcg } from "d3-random";

/** A seeded uniform generator in [0, 1) (d3-random's linear congruential generator). */
export type Rnd = () => number;

/** A seeded generator: the same seed gives the same cases on every machine. */
export function seeded(seed: number): Rnd {
  return randomLcg(seed);
}

/** One element of xs. */
export function pick<T>(r: Rnd, xs: readonly T[]): T {
  return xs[Math.floor(r() * xs.length)] as T;
}

/** An integer in [0, n). */
export function int(r: Rnd, n: number): number {
  return Math.floor(r() * n);
}

/** Text hostile to parsers, terminals, spreadsheets and HTML. */
export const HOSTILE_TEXT: readonly string[] = [
  "<script>alert(1)</script>",
  '=HYPERLINK("http://example.invalid","x")',
  "+SUM(A1:A9)",
  "-2+3",
  "@SUM(1)",
  "\t=1+1",
  "\r=1+1",
  "\u001b[31mred\u001b[0m",
  "\u001b]0;title\u0007",
  "\u009b31m",
  "\u0000\u0001\u0002",
  "\u202Eevil",
  "\uFEFF",
  "'; DROP TABLE s;--",
  "NaN",
  "Infinity",
  "1e999",
  "-0",
  "0x1F",
  "١٢٣",
];
