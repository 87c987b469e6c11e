// @vitest-environment jsdom
import { afterEach, describe, expect, it, vi } from "vitest";
import { fireEvent, render, waitFor } from "@testing-library/svelte";
import Papa from "papaparse";
import MixingPlot from "../../../dashboard/src/panels/MixingPlot.svelte";
import ExportMenu from "../../../dashboard/src/panels/ExportMenu.svelte";
import { Selection } from "../../../dashboard/src/state/selection.svelte.ts";
import { csvField, toCsv } from "../../../analysis/index.ts";
import {
  deviationsCsv,
  exportFileName,
  mapCanvasToPngBlob,
  resultsCsv,
  resultsJson,
  serializeSvg,
  slug,
  svgToPngBlob,
} from "../../../dashboard/src/panels/lib/export.ts";
import { fixtureAnalysis } from "./fixtures.ts";

afterEach(() => vi.restoreAllMocks());

describe("csv", () => {
  it("csvField() quotes commas, quotes and line breaks and doubles inner quotes (RFC 4180 §2.6–2.7)", () => {
    expect(csvField("plain")).toBe("plain");
    expect(csvField("a,b")).toBe('"a,b"');
    expect(csvField('say "hi"')).toBe('"say ""hi"""');
    expect(csvField("two\nlines")).toBe('"two\nlines"');
    expect(csvField("cr\rhere")).toBe('"cr\rhere"');
    expect(csvField(" padded")).toBe('" padded"');
    expect(csvField(-1.5)).toBe("-1.5");
    expect(csvField(NaN)).toBe("");
    expect(csvField(undefined)).toBe("");
    expect(csvField(true)).toBe("true");
  });

  it("toCsv() ends every line with CRLF and refuses ragged rows (RFC 4180 §2.1)", () => {
    expect(toCsv(["a", "b"], [[1, "x,y"]])).toBe('a,b\r\n1,"x,y"\r\n');
    expect(() => toCsv(["a", "b"], [[1]])).toThrow(/row 0 has 1 fields/);
  });
});

describe("export", () => {
  it("exportFileName() builds brackline-<survey>-<constituent>-<panel>.<ext> with plain slugs", () => {
    expect(exportFileName("Wet season 2025-03", "mixing", "svg", "Fe")).toBe(
      "brackline-wet-season-2025-03-fe-mixing.svg",
    );
    expect(exportFileName("Été à Brest", "results", "csv")).toBe("brackline-ete-a-brest-results.csv");
    expect(slug("///")).toBe("survey");
  });

  it("resultsCsv() round-trips through a CSV parser (papaparse) with every constituent, value and warning intact", () => {
    const a = fixtureAnalysis();
    a.constituents[0].warnings.push({ code: "quote-test", message: 'Contains "quotes", commas\nand a line break' });
    const parsed = Papa.parse<Record<string, string>>(resultsCsv(a), { header: true, skipEmptyLines: true });
    expect(parsed.errors).toEqual([]);
    expect(parsed.data.map((r) => r.constituent)).toEqual(["Fe", "Ba", "Si"]);
    const fe = parsed.data[0];
    expect(Number(fe.percent_change)).toBe(-69.6);
    expect(Number(fe.effective_river_endmember_lower)).toBe(221);
    expect(fe.zone_km).toBe("24-38");
    expect(fe.warning_count).toBe("3");
    expect(fe.warnings).toContain('Contains "quotes", commas\nand a line break');
    expect(parsed.data[2].effective_river_endmember).toBe("");
    expect(parsed.data[1].maximum_km).toBe("28");
  });

  it("deviationsCsv() has one row per constituent and analysed station, with distance from the mouth", () => {
    const a = fixtureAnalysis();
    const parsed = Papa.parse<Record<string, string>>(deviationsCsv(a), { header: true, skipEmptyLines: true });
    expect(parsed.data).toHaveLength(a.constituents.reduce((n, c) => n + c.deviations.length, 0));
    const s05 = parsed.data.find((r) => r.constituent === "Fe" && r.station === "S05")!;
    expect(Number(s05.along_channel_km)).toBe(28);
    expect(s05.below_detection).toBe("false");
  });

  it("resultsJson() is the analysis result with the caution, parseable, non-finite numbers as null", () => {
    const a = fixtureAnalysis();
    a.constituents[2].deviations[0].deviationPercent = Infinity;
    const doc = JSON.parse(resultsJson(a));
    expect(doc.generator).toBe("Brackline");
    expect(doc.caution).toContain("Screening analysis");
    expect(doc.constituents.map((c: { name: string }) => c.name)).toEqual(["Fe", "Ba", "Si"]);
    expect(doc.constituents[2].deviations[0].deviationPercent).toBeNull();
    expect(doc.constituents[0].effectiveEndmember).toEqual(a.constituents[0].effectiveEndmember);
  });

  it("serializeSvg() writes a standalone SVG document with size, namespace and inline styles, no tabindex", () => {
    const selection = new Selection();
    const { container } = render(MixingPlot, { analysis: fixtureAnalysis(), selection, idPrefix: "x" });
    const svg = container.querySelector("svg")!;
    const text = serializeSvg(svg);
    expect(text.startsWith('<?xml version="1.0" encoding="UTF-8"?>\n<svg')).toBe(true);
    const doc = new DOMParser().parseFromString(text, "image/svg+xml");
    expect(doc.querySelector("parsererror")).toBeNull();
    const root = doc.documentElement;
    expect(root.getAttribute("xmlns")).toBe("http://www.w3.org/2000/svg");
    expect(root.getAttribute("width")).toBe("640");
    expect(root.getAttribute("height")).toBe("420");
    expect(text).not.toContain("tabindex");
    expect(text).toContain("Salinity (PSS-78)");
  });

  it("svgToPngBlob() draws the SVG at 2× on a white canvas and encodes PNG", async () => {
    const selection = new Selection();
    const { container } = render(MixingPlot, { analysis: fixtureAnalysis(), selection, idPrefix: "x" });
    const svg = container.querySelector("svg")!;
    const calls: string[] = [];
    const ctx = {
      fillStyle: "",
      fillRect: () => calls.push("fillRect"),
      drawImage: (_img: unknown, _x: number, _y: number, w: number, h: number) => calls.push(`drawImage ${w}x${h}`),
    };
    vi.spyOn(HTMLCanvasElement.prototype, "getContext").mockReturnValue(ctx as unknown as CanvasRenderingContext2D);
    const toBlob = vi.spyOn(HTMLCanvasElement.prototype, "toBlob").mockImplementation(function (
      this: HTMLCanvasElement,
      cb,
      type,
    ) {
      calls.push(`toBlob ${type} ${this.width}x${this.height}`);
      cb(new Blob(["png"], { type: "image/png" }));
    });
    // jsdom does not decode images: fire load as soon as a source is set
    vi.spyOn(HTMLImageElement.prototype, "src", "set").mockImplementation(function (this: HTMLImageElement) {
      queueMicrotask(() => this.onload?.(new Event("load")));
    });
    const blob = await svgToPngBlob(svg);
    expect(blob.type).toBe("image/png");
    expect(toBlob).toHaveBeenCalledOnce();
    expect(calls).toEqual(["fillRect", "drawImage 1280x840", "toBlob image/png 1280x840"]);
  });

  it("mapCanvasToPngBlob() composites the map canvases in order at the first one's size", async () => {
    const drawn: Array<[unknown, number, number]> = [];
    const ctx = {
      fillStyle: "",
      fillRect: () => undefined,
      drawImage: (c: unknown, _x: number, _y: number, w: number, h: number) => drawn.push([c, w, h]),
    };
    vi.spyOn(HTMLCanvasElement.prototype, "getContext").mockReturnValue(ctx as unknown as CanvasRenderingContext2D);
    vi.spyOn(HTMLCanvasElement.prototype, "toBlob").mockImplementation((cb) =>
      cb(new Blob(["png"], { type: "image/png" })),
    );
    const base = Object.assign(document.createElement("canvas"), { width: 800, height: 600 });
    const overlay = Object.assign(document.createElement("canvas"), { width: 800, height: 600 });
    const blob = await mapCanvasToPngBlob([base, overlay]);
    expect(blob.type).toBe("image/png");
    expect(drawn).toEqual([
      [base, 800, 600],
      [overlay, 800, 600],
    ]);
    await expect(mapCanvasToPngBlob([])).rejects.toThrow(/no canvas/);
  });
});

describe("ExportMenu", () => {
  function setup(withMap = false) {
    const selection = new Selection();
    const analysis = fixtureAnalysis();
    const saved: Array<{ name: string; blob: Blob }> = [];
    const host = render(MixingPlot, { analysis, selection, idPrefix: "m" });
    const menu = render(ExportMenu, {
      analysis,
      selection,
      root: host.container,
      save: (blob: Blob, name: string) => saved.push({ blob, name }),
      ...(withMap ? { mapCanvases: () => [document.createElement("canvas")] } : {}),
    });
    return { saved, menu, selection };
  }

  async function openMenu(menu: { container: HTMLElement }) {
    const details = menu.container.querySelector("details")!;
    details.open = true;
    await fireEvent(details, new Event("toggle"));
  }

  it("ExportMenu lists the panels on the page and saves the mixing plot as SVG named after survey and constituent", async () => {
    const { saved, menu } = setup();
    await openMenu(menu);
    const button = await menu.findByRole("button", { name: "Mixing plot as SVG" });
    await fireEvent.click(button);
    await waitFor(() => expect(saved).toHaveLength(1));
    expect(saved[0].name).toBe("brackline-invented-test-survey-fe-mixing.svg");
    expect(saved[0].blob.type).toBe("image/svg+xml");
    expect(await saved[0].blob.text()).toContain("<title");
    expect(menu.getByRole("status").textContent).toContain("Saved brackline-invented-test-survey-fe-mixing.svg");
  });

  it("ExportMenu saves results as CSV and JSON, and offers the map only when given its canvases", async () => {
    const { saved, menu } = setup();
    await openMenu(menu);
    await fireEvent.click(menu.getByRole("button", { name: "Results table (CSV)" }));
    await fireEvent.click(menu.getByRole("button", { name: "Full results (JSON)" }));
    await waitFor(() => expect(saved).toHaveLength(2));
    expect(saved.map((s) => s.name)).toEqual([
      "brackline-invented-test-survey-results.csv",
      "brackline-invented-test-survey-results.json",
    ]);
    expect((await saved[0].blob.text()).split("\r\n")[0]).toMatch(/^survey,constituent,unit,class/);
    expect(menu.queryByRole("button", { name: "Map view (PNG)" })).toBeNull();
    menu.unmount();
    const withMap = setup(true);
    expect(withMap.menu.getByRole("button", { name: "Map view (PNG)" })).toBeTruthy();
  });

  it("ExportMenu reports a failed export in its status line instead of throwing", async () => {
    const { menu } = setup(true);
    // jsdom has no 2D canvas context
    vi.spyOn(HTMLCanvasElement.prototype, "getContext").mockReturnValue(null);
    await fireEvent.click(menu.getByRole("button", { name: "Map view (PNG)" }));
    await waitFor(() =>
      expect(menu.getByRole("status").textContent).toMatch(
        /^Could not export brackline-invented-test-survey-map\.png: .*no 2D canvas context/,
      ),
    );
  });
});
