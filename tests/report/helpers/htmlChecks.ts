/** Checks of a briefing HTML file: well-formed (parse5), no scripts, no external requests. */
import { parse, type ParserError } from "parse5";

/** Parse errors of the HTML as reported by parse5 (the WHATWG parser). */
export function parseErrors(text: string): ParserError[] {
  const errors: ParserError[] = [];
  parse(text, { onParseError: (e) => errors.push(e) });
  return errors;
}

/** Every attribute/URL reference that would make a browser fetch something from elsewhere, or run script. */
export function externalReferences(text: string): string[] {
  const hits: string[] = [];
  const patterns = [
    /<script\b/gi,
    /<link\b/gi,
    /<iframe\b/gi,
    /<img\b/gi,
    /<object\b/gi,
    /<embed\b/gi,
    /\s(?:src|href|xlink:href|action|poster|data)\s*=\s*["']?\s*(?:https?:|\/\/|javascript:)/gi,
    /url\(\s*["']?\s*(?:https?:|\/\/)/gi,
    /@import/gi,
    /\son[a-z]+\s*=/gi,
    /https?:\/\//gi,
  ];
  for (const p of patterns) for (const m of text.matchAll(p)) hits.push(m[0]);
  return hits;
}
