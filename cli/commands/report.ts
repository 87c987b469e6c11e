import type { Command } from "../command.ts";
import type { ProvenanceFile } from "../../analysis/index.ts";
import { buildBriefing, renderBriefingHtml, SCREENING_CAUTION } from "../../analysis/index.ts";
import { InputError, UsageError } from "../exitCodes.ts";
import { checkOut, readBytes, writeOut } from "../files.ts";
import { CHOICE_HELP, DISCHARGE_HELP, INPUT_OPTIONS, parseCommandLine, workspaceSettings } from "../options.ts";
import { analyzeFiles, EXIT_CANCELLED, provenanceOf } from "./compare.ts";
import { POOL_HELP, POOL_OPTION_NAMES, startWorkersEarly } from "../archive/poolAnalysis.ts";
import { CancelledError } from "../archive/workerPool.ts";
import { loadWorkspaceOnWorkers } from "../archive/parallelRead.ts";

/** A map file read for the briefing, with its provenance. */
export interface MapFile {
  geojson: { type?: unknown; features?: unknown; disclaimer?: unknown };
  file: ProvenanceFile;
}

/** Reads a GeoJSON map file (basemap) with its size and SHA-256; it must be a FeatureCollection of features. */
export function readGeoJsonFile(path: string, role: ProvenanceFile["role"]): MapFile {
  const bytes = readBytes(path, role);
  let geojson: MapFile["geojson"];
  try {
    geojson = JSON.parse(new TextDecoder().decode(bytes).replace(/^\uFEFF/, "")) as MapFile["geojson"];
  } catch (error) {
    throw new InputError(`${path}: row 1: not valid JSON (${(error as Error).message})`);
  }
  const features = geojson?.features;
  if (geojson === null || typeof geojson !== "object" || !Array.isArray(features))
    throw new InputError(`${path}: expected a GeoJSON FeatureCollection with a "features" array`);
  const bad = features.findIndex((f: unknown) => f === null || typeof f !== "object");
  if (bad >= 0)
    throw new InputError(
      `${path}: features[${bad}] is ${JSON.stringify(features[bad])}; expected a GeoJSON Feature object`,
    );
  return { geojson, file: provenanceOf(path, role) };
}

const help = `brackline report <survey files...> --out <briefing.html> [--centerline <line.geojson>] [options]

Writes a stakeholder briefing as ONE self-contained HTML file (inline styles and vector
graphics, no scripts, nothing loaded from elsewhere) that prints cleanly to A4 PDF: summary,
map, mixing and channel plots, results table, plain-language findings with their uncertainty,
the survey comparison when there are several surveys, data provenance, methods with citations
and cautions.

Options:
  --centerline <file.geojson>  channel centerline (default: one built from the station positions,
                               as in analyze; the choice is stated on stderr)
  --basemap <file.geojson>     offline basemap polygons (properties.kind land/water/marsh) and named points
  --out <file.html>            where to write the briefing (required)
  --title <text>               title (default "Estuarine mixing briefing")
  --date <text>                date printed on the briefing (none by default: output is byte-identical
                               for identical input and seed)
  --mouth start|end|lon,lat    which end of the main stem is the mouth (default: a "mouth" point in the file)
  --stations <table.csv>       station table joined by station id
  --mapping <mapping.json>     a saved column mapping (a partial one is merged with the suggestion)
  --layer shallowest|surface|bottom|average|all|<min>-<max>  one value per station and survey
${CHOICE_HELP}
${DISCHARGE_HELP}
  --draws <n>                  bootstrap draws (default 2000, at most 100000)
  --seed <n>                   bootstrap seed (default 1)
${POOL_HELP}
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
      .map((f) => f?.properties?.note)
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
    const { values, positionals } = parseCommandLine(args, [
      ...INPUT_OPTIONS,
      ...POOL_OPTION_NAMES,
      "basemap",
      "out",
      "title",
      "date",
    ]);
    workspaceSettings(values);
    if (positionals.length === 0) throw new UsageError("give at least one survey file");
    if (!values.out) throw new UsageError("missing --out <briefing.html>");
    if (values.out !== undefined) checkOut(values.out);
    const basemap = values.basemap ? readGeoJsonFile(values.basemap, "basemap") : undefined;
    // Several surveys go through the worker pool; its threads start loading while the files are read.
    let analysed: Awaited<ReturnType<typeof analyzeFiles>>;
    try {
      const started = startWorkersEarly(positionals, values);
      // The survey files are parsed on those workers when there are several.
      const inputs = await loadWorkspaceOnWorkers(positionals, values, io, started);
      analysed = await analyzeFiles(positionals, values, io, false, inputs, started);
    } catch (error) {
      if (!(error instanceof CancelledError)) throw error;
      io.err(`cancelled after ${error.done} surveys`);
      return EXIT_CANCELLED;
    }
    const { inputs, analyses, files, draws, seed } = analysed;
    const channel = inputs.channel;
    // Without --centerline the channel is the one built from the stations (as in analyze and the
    // dashboard, with the notice readInputs gives); the provenance table then lists the files given.
    const centerline: MapFile | undefined =
      values.centerline === undefined || !channel
        ? undefined
        : { geojson: channel.geojson as MapFile["geojson"], file: provenanceOf(values.centerline, "centerline") };
    const network = channel?.network;
    const maps = [...(centerline ? [centerline] : []), ...(basemap ? [basemap] : [])];
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
    writeOut(values.out, renderBriefingHtml(doc));
    io.err(`wrote ${values.out}`);
    return 0;
  },
};
