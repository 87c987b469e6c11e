// @vitest-environment jsdom
// fitText (dashboard/src/panels/lib/fitText.ts): a chart title is measured on an offscreen canvas in
// the chart's font (no page layout), then shrunk, then shortened with an ellipsis and the whole title
// as its tooltip. The canvas is a stand-in whose text is 0.5 em per character, so the expected sizes
// follow by arithmetic (common practice: SVG text cannot wrap, titles are fitted).
import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";

const SVG = "http://www.w3.org/2000/svg";
/** The fonts the stand-in canvas was asked for, in order. */
let fonts: string[] = [];

class FakeOffscreenCanvas {
  getContext() {
    let font = "";
    return {
      set font(f: string) {
        font = f;
        fonts.push(f);
      },
      get font() {
        return font;
      },
      measureText(text: string) {
        const px = Number(/(\d+(?:\.\d+)?)px/.exec(font)?.[1] ?? 0);
        return { width: text.length * px * 0.5 };
      },
    };
  }
}

/** A title inside an SVG that gives the chart's font, as the charts do. */
function title(size = 14): SVGTextElement {
  const svg = document.createElementNS(SVG, "svg");
  svg.setAttribute("font-family", "system-ui, sans-serif");
  const text = document.createElementNS(SVG, "text");
  text.setAttribute("font-size", String(size));
  text.setAttribute("font-weight", "600");
  svg.append(text);
  document.body.append(svg);
  return text;
}

async function load() {
  vi.resetModules();
  return (await import("../../../dashboard/src/panels/lib/fitText.ts")).fitText;
}

describe("fitText()", () => {
  beforeEach(() => {
    fonts = [];
    vi.stubGlobal("OffscreenCanvas", FakeOffscreenCanvas);
  });
  afterEach(() => {
    vi.unstubAllGlobals();
    document.body.innerHTML = "";
  });

  it("sets a title that fits as given, measured in the chart's font", async () => {
    const fitText = await load();
    const t = title();
    fitText(t, { text: "Fe against salinity", maxWidth: 200 }); // 19 × 7 = 133 px
    expect(t.textContent).toBe("Fe against salinity");
    expect(t.getAttribute("font-size")).toBe("14");
    expect(t.querySelector("title")).toBeNull();
    expect(fonts[0]).toBe("600 14px system-ui, sans-serif");
  });

  it("lowers the font size to fit, no lower than the smallest size", async () => {
    const fitText = await load();
    const t = title();
    // 20 characters: 140 px at 14 px; 120 px wide → 14·120/140 = 12 px
    fitText(t, { text: "abcdefghijklmnopqrst", maxWidth: 120 });
    expect(t.getAttribute("font-size")).toBe("12");
    expect(t.textContent?.startsWith("abcdefghijklmnopqrst")).toBe(true);
    expect(t.querySelector("title")?.textContent).toBe("abcdefghijklmnopqrst");
  });

  it("shortens with an ellipsis at the smallest size and keeps the whole title as its tooltip", async () => {
    const fitText = await load();
    const t = title();
    const text = "a very long chart title that cannot fit";
    // at the 11 px floor a character is 5.5 px: 60 px hold 10 characters, the ellipsis one of them
    fitText(t, { text, maxWidth: 60 });
    expect(t.getAttribute("font-size")).toBe("11");
    const shown = t.firstChild?.textContent ?? "";
    expect(shown.endsWith("…")).toBe(true);
    expect(shown.length * 5.5).toBeLessThanOrEqual(60);
    expect(t.querySelector("title")?.textContent).toBe(text);
  });

  it("fits again on update, from the full size", async () => {
    const fitText = await load();
    const t = title();
    const action = fitText(t, { text: "abcdefghijklmnopqrst", maxWidth: 120 });
    action.update({ text: "short", maxWidth: 120 });
    expect(t.textContent).toBe("short");
    expect(t.getAttribute("font-size")).toBe("14");
  });

  it("sets the text as given where there is no canvas to measure with (and no layout)", async () => {
    vi.unstubAllGlobals();
    vi.stubGlobal("OffscreenCanvas", undefined);
    const fitText = await load();
    const t = title();
    fitText(t, { text: "a very long chart title that cannot fit", maxWidth: 60 });
    expect(t.textContent).toBe("a very long chart title that cannot fit");
    expect(t.getAttribute("font-size")).toBe("14");
  });
});
