/**
 * HTML/SVG markup built as strings with escaping by construction: text from data
 * (station ids, names, file names) can only enter markup through {@link html}, which
 * escapes every interpolated value that is not already {@link SafeHtml}.
 */

/** Markup known to be safe (built by this module, every data text escaped). */
export class SafeHtml {
  constructor(readonly markup: string) {}
  toString(): string {
    return this.markup;
  }
}

/**
 * Escapes text for HTML and XML text and attribute values (& < > " ').
 *
 * @param text any text
 * @returns text safe inside elements and quoted attributes
 * @see WHATWG HTML Living Standard §13.1 (syntax of text and attribute values).
 */
export function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (c) => ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" })[c]!);
}

/** A value that may be interpolated into {@link html}. */
export type HtmlValue = SafeHtml | string | number | undefined | null | false | readonly HtmlValue[];

function render(v: HtmlValue): string {
  if (v === undefined || v === null || v === false) return "";
  if (v instanceof SafeHtml) return v.markup;
  if (Array.isArray(v)) return (v as readonly HtmlValue[]).map(render).join("");
  return escapeHtml(String(v));
}

/**
 * Tagged template for markup: literal parts are kept, interpolations are escaped unless
 * they are SafeHtml (arrays are joined; undefined, null and false vanish).
 *
 * @returns the markup as SafeHtml
 */
export function html(strings: TemplateStringsArray, ...values: HtmlValue[]): SafeHtml {
  let out = strings[0]!;
  for (let i = 0; i < values.length; i++) out += render(values[i]!) + strings[i + 1]!;
  return new SafeHtml(out);
}

/** Joins markup pieces into one SafeHtml (escaping plain strings). */
export function joinHtml(parts: readonly HtmlValue[], separator = ""): SafeHtml {
  return new SafeHtml(parts.map(render).join(separator));
}
