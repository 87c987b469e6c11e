import { describe, it, expect } from "vitest";
import { classWords, constituentWords, fractionInWords, multipleInWords } from "../../analysis/report/wording.ts";
import { escapeHtml, html } from "../../analysis/report/html.ts";

describe("wording (common practice of plain-language reporting)", () => {
  it("fractionInWords() names simple fractions within ±0.03 (0.925 → nine tenths, 0.40 → two fifths, 0.35 → a third) and falls back to a percentage", () => {
    expect(fractionInWords(0.925)).toBe("about nine tenths");
    expect(fractionInWords(0.4)).toBe("about two fifths");
    expect(fractionInWords(0.35)).toBe("about a third");
    expect(fractionInWords(0.5)).toBe("about half");
    expect(fractionInWords(0.57)).toBe("about 57 %");
    expect(fractionInWords(0.99)).toBe("nearly all");
    expect(() => fractionInWords(1.2)).toThrow(/fractionInWords: f must lie in/);
  });

  it("multipleInWords() says 'about three times as much' for 3.0 and a fraction more below 1.9", () => {
    expect(multipleInWords(3)).toBe("about three times as much");
    expect(multipleInWords(2.08)).toBe("about twice as much");
    expect(multipleInWords(1.23)).toBe("about a quarter more");
    expect(multipleInWords(2.6)).toBe("about 2.6 times as much");
    expect(() => multipleInWords(0.5)).toThrow(RangeError);
  });

  it("constituentWords() and classWords() give plain names", () => {
    expect(constituentWords("Fe")).toBe("dissolved iron (Fe)");
    expect(constituentWords("Xy")).toBe("Xy");
    expect(classWords("maximum-then-conservative")).toBe("mid-estuarine maximum, then conservative");
  });
});

describe("html escaping (WHATWG HTML Living Standard §13.1)", () => {
  it("escapeHtml() escapes & < > \" ' and html`` escapes every interpolated text", () => {
    expect(escapeHtml(`<a href="x">'&'</a>`)).toBe("&lt;a href=&quot;x&quot;&gt;&#39;&amp;&#39;&lt;/a&gt;");
    const id = "<script>alert(1)</script>";
    expect(html`<td title="${id}">${id}</td>`.markup).toBe(
      '<td title="&lt;script&gt;alert(1)&lt;/script&gt;">&lt;script&gt;alert(1)&lt;/script&gt;</td>',
    );
    expect(html`<p>${[id, html`<b>x</b>`]}</p>`.markup).toBe("<p>&lt;script&gt;alert(1)&lt;/script&gt;<b>x</b></p>");
  });
});
