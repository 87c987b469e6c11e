import { writeFileSync } from "node:fs";
import { parseArgs } from "node:util";
import type { Command } from "../command.ts";
import type { ProvenanceFile } from "../../analysis/index.ts";
import { buildBriefing, renderBriefingHtml, SCREENING_CAUTION } from "../../analysis/index.ts";
import { InputError, UsageError } from "../exitCodes.ts";
import { CHOICE_HELP } from "../inputChoices.ts";
import { analyzeFiles, readGeoJsonFile, SURVEY_OPTIONS, type MapFile } from "./compare.ts";

const help = `brackline report <survey files...> --centerline <line.geojson> --out <briefing.html> [options]

Writes a stakeholder briefing as ONE self-contained HTML file (inline styles and vector
graphics, no scripts, nothing loaded from elsewhere) that prints cleanly to A4 PDF: summary,
map, mixing and channel plots, results table, plain-language findings with their uncertainty,
the survey comparison when there are several surveys, data provenance, methods with citations
and cautions.

Options:
  --centerline <file.geojson>  channel centerline (required)
  --basemap <file.geojson>     offline basemap polygons (properties.kind land/water/marsh) and named points
  --out <file.html>            where to write the briefing (required)
  --title <text>               title (default "Estuarine mixing briefing")
  --date <text>                date printed on the briefing (none by default: output is byte-identical
                               for identical input and seed)
  --mouth start|end|lon,lat    which end of the main stem is the mouth (default: a "mouth" point in the
                               file, else suggested from salinity and stated in a notice)
  --stations <table.csv>       station table joined by station id
${CHOICE_HELP}
  --discharge <Q | name=Q,...> river discharge [m³/s] for all surveys or per survey name (for fluxes)
  --draws <n>                  bootstrap draws (default 2000)
  --seed <n>                   bootstrap seed (default 1)
To make a PDF: open the file in a browser and print, or
  chromium --headless --no-pdf-header-footer --print-to-pdf=briefing.pdf file:///path/briefing.html
${SCREENING_CAUTION}`;

/** The invented-data or other disclaimer carried by a GeoJSON file (top-level "disclaimer", else an "INVENTED" note). */
export function dataNoticeOf(maps: readonly MapFile[]): string | undefined {
  for (const m of maps)
    if (typeof m.geojson.disclaimer === "string" && m.geojson.disclaimer.trim()) return m.geojson.disclaimer.trim();
  for (const m of maps) {
    const fs = Array.isArray(m.geojson.features)
      ? (m.geojson.features as Array<{ properties?: { note?: unknown } | null }>)
      : [];
    const note = fs
      .map((f) => f.properties?.note)
      .find((n): n is string => typeof n === "string" && /invented/i.test(n));
    if (note) return note;
  }
  return undefined;
}

export const reportCommand: Command = {
  name: "report",
  summary: "write a self-contained HTML stakeholder briefing (prints to A4 PDF)",
  help,
  async run(args, io) {
    const { values, positionals } = parseArgs({
      args,
      allowPositionals: true,
      options: {
        ...SURVEY_OPTIONS,
        basemap: { type: "string" },
        out: { type: "string" },
        title: { type: "string" },
        date: { type: "string" },
      },
    });
    if (positionals.length === 0) throw new UsageError("give at least one survey file");
    if (!values.centerline) throw new UsageError("missing --centerline <line.geojson>");
    if (!values.out) throw new UsageError("missing --out <briefing.html>");
    const centerline = readGeoJsonFile(values.centerline, "centerline");
    const basemap = values.basemap ? readGeoJsonFile(values.basemap, "basemap") : undefined;
    const { analyses, files, draws, seed, network } = analyzeFiles(
      positionals,
      values,
      { path: values.centerline, geojson: centerline.geojson },
      io,
    );
    if (network === undefined) throw new InputError(`${values.centerline}: no usable centerline`);
    const maps = [centerline, ...(basemap ? [basemap] : [])];
    const notice = dataNoticeOf(maps);
    const provenance: ProvenanceFile[] = [...files, ...maps.map((m) => m.file)];
    io.err(`building the briefing (${analyses.length} survey${analyses.length === 1 ? "" : "s"})`);
    const doc = buildBriefing({
      analyses,
      network,
      ...(basemap ? { basemap: basemap.geojson } : {}),
      files: provenance,
      ...(notice ? { dataNotice: notice } : {}),
      ...(values.title ? { title: values.title } : {}),
      ...(values.date ? { dateText: values.date } : {}),
      software: "Brackline 0.1.0",
      bootstrap: { draws, seed },
    });
    writeFileSync(values.out, renderBriefingHtml(doc));
    io.err(`wrote ${values.out}`);
    return 0;
  },
};
