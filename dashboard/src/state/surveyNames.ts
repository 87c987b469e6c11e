/** Survey names made unique for the survey switcher. */
import type { Survey } from "../../../analysis/index.ts";

/**
 * Gives every survey a distinct name: a repeated name gets " (2)", " (3)", ...
 *
 * @param surveys surveys in switcher order
 * @returns the same surveys, renamed copies where a name repeats
 */
export function uniqueSurveyNames(surveys: Survey[]): Survey[] {
  const seen = new Set<string>();
  return surveys.map((s) => {
    let name = s.name;
    for (let n = 2; seen.has(name); n++) name = `${s.name} (${n})`;
    seen.add(name);
    return name === s.name ? s : { ...s, name };
  });
}
