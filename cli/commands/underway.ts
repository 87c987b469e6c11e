import { createReadStream, statSync } from "node:fs";
import { basename } from "node:path";
import type { Command } from "../command.ts";
import type { CsvValue, UnderwayBins, UnderwayImport } from "../../analysis/index.ts";
import {
  analyzeSurvey,
  binUnderway,
  binsToSurvey,
  projectUnderway,
  readCenterline,
  readUnderwayStream,
  toCsv,
  SCREENING_CAUTION,
  type ChannelNetwork,
} from "../../analysis/index.ts";
import { parseCommandLine, parseCount, parseFormat, parseMouth, MAX_DRAWS } from "../options.ts";
import { checkOut, readBytes, writeOut } from "../files.ts";
import { surveyJson } from "./analyze.ts";
import { issueText } from "../workspace.ts";
import { InputError, UsageError } from "../exitCodes.ts";

const help = `brackline underway <log.csv> [options]

Reads an underway (flow-through) log of any length as a stream: time, latitude, longitude,
salinity (or conductivity + temperature, converted with PSS-78), temperature, fluorescence and
turbidity are recognised from the headers. Places every record on the channel (km from the mouth,
cross-channel offset) and bins the log along the channel or in salinity classes, giving per bin
the number of records and the mean, standard deviation, minimum and maximum of every variable.

Options:
  --centerline <file.geojson>  channel centerline; needed for --bin km
  --mouth start|end|lon,lat    which end of the main stem is the mouth (default: first vertex, with a warning)
  --bin km|salinity            bin along the channel [km] or in salinity classes (default: km with a
                               centerline, else salinity)
  --width <w>                  bin width in km or salinity units (default 1)
  --max-offset <m>             leave out records farther than this from the channel [m]
  --mixing                     run the mixing analysis on the bins (one station per bin; fluorescence,
                               turbidity, ... as constituents against salinity)
  --draws <n>, --seed <n>      bootstrap draws (default 2000) and seed (default 1) for --mixing
  --format json|csv            output format (default json; csv = one row per bin)
  --out <file>                 write to a file instead of standard output

Nothing is dropped silently: every unreadable cell is reported (file, row, column, value, expected;
the first 1,000 listed in the JSON, all counted by reason) and rejected records are counted by reason.
Identical input gives byte-identical output. Exit codes: 0 ok, 2 bad input, 64 usage, 70 internal error.
${SCREENING_CAUTION}`;

function positiveNumber(name: string, text: string | undefined, fallback: number | undefined): number | undefined {
  if (text === undefined) return fallback;
  const x = Number(text);
  if (text.trim() === "" || !Number.isFinite(x) || x <= 0)
    throw new UsageError(`--${name}: expected a number > 0; got "${text}"`);
  return x;
}

async function readLog(path: string, err: (t: string) => void): Promise<UnderwayImport> {
  let size: number;
  try {
    const st = statSync(path);
    if (!st.isFile()) throw new InputError(`${path}: the underway log is not a file`);
    size = st.size;
  } catch (error) {
    if (error instanceof InputError) throw error;
    throw new InputError(
      `${path}: cannot read the underway log (${(error as NodeJS.ErrnoException).code ?? (error as Error).message})`,
    );
  }
  let shown = 0;
  return readUnderwayStream(createReadStream(path, { highWaterMark: 1 << 20 }), {
    fileName: basename(path),
    totalSize: size,
    onProgress: (f) => {
      const step = Math.floor(f * 10);
      if (step > shown) {
        shown = step;
        err(`reading ${basename(path)}: ${step * 10} %`);
      }
    },
  });
}

const STAT_KEYS = ["n", "mean", "sd", "min", "max"] as const;

function binsCsv(b: UnderwayBins): string {
  const names = Object.keys(b.units);
  const header = [
    `${b.by}_lower`,
    `${b.by}_upper`,
    "n",
    "mean_km",
    "mean_lon",
    "mean_lat",
    "start",
    "end",
    ...names.flatMap((v) => STAT_KEYS.map((k) => `${v}_${k}`)),
  ];
  const rows = b.bins.map((x): CsvValue[] => [
    x.lower,
    x.upper,
    x.n,
    x.meanKm,
    x.meanLonLat[0],
    x.meanLonLat[1],
    x.startMs === undefined ? "" : new Date(x.startMs).toISOString(),
    x.endMs === undefined ? "" : new Date(x.endMs).toISOString(),
    ...names.flatMap((v) => STAT_KEYS.map((k) => x.stats[v]?.[k])),
  ]);
  return toCsv(header, rows);
}

export const underwayCommand: Command = {
  name: "underway",
  summary: "bin an underway (flow-through) log along the channel or in salinity classes",
  help,
  async run(args, io) {
    const { values, positionals } = parseCommandLine(args, [
      "centerline",
      "mouth",
      "bin",
      "width",
      "max-offset",
      "mixing",
      "draws",
      "seed",
      "format",
      "out",
    ]);
    const format = parseFormat(values.format);
    const draws = parseCount("draws", values.draws, 2000, MAX_DRAWS);
    const seed = parseCount("seed", values.seed, 1);
    const mouth = parseMouth(values.mouth);
    if (values.out !== undefined) checkOut(values.out);
    if (positionals.length !== 1) throw new UsageError(`expected one underway log, got ${positionals.length}`);
    const by = values.bin ?? (values.centerline ? "km" : "salinity");
    if (by !== "km" && by !== "salinity") throw new UsageError(`--bin: expected km or salinity; got "${by}"`);
    if (by === "km" && !values.centerline) throw new UsageError("--bin km needs --centerline");
    const width = positiveNumber("width", values.width, 1)!;
    const maxOffsetM = positiveNumber("max-offset", values["max-offset"], undefined);
    let network: ChannelNetwork | undefined;
    if (values.centerline !== undefined) {
      const read = readCenterline(readBytes(values.centerline, "centerline"), {
        fileName: values.centerline,
        ...(mouth !== undefined ? { mouth } : {}),
      });
      if (!read.channel)
        throw new InputError(read.issues[0] ? issueText(read.issues[0]) : `${values.centerline}: no usable centerline`);
      io.err(read.channel.mouth.statement);
      network = read.channel.network;
    }
    const file = positionals[0]!;
    const read = await readLog(file, io.err);
    const s = read.summary;
    const reasons = Object.entries(s.rejectedByReason).map(([r, n]) => `${n} ${r}`);
    io.err(
      `import: ${s.rowsRead} records read, ${s.rowsAccepted} accepted, ${s.rowsRejected} rejected${reasons.length ? ` (${reasons.join("; ")})` : ""}; ${s.issueCount} problems`,
    );
    for (const i of read.issues.slice(0, 20)) io.err(`  ${i.severity}: ${issueText(i)}`);
    if (s.rowsAccepted === 0) {
      const first = read.issues.find((i) => i.severity === "error");
      throw new InputError(first ? issueText(first) : `${file}: no record with a position`);
    }
    const projection = network ? projectUnderway(read.data, network) : undefined;
    const bins = binUnderway(read.data, projection, { by, width, ...(maxOffsetM !== undefined ? { maxOffsetM } : {}) });
    io.err(
      `binned ${s.rowsAccepted - bins.recordsOutside} records into ${bins.bins.length} ${by} bins of width ${width}`,
    );
    let text: string;
    if (format === "csv") text = binsCsv(bins);
    else {
      const mixing = values.mixing
        ? surveyJson(
            analyzeSurvey(binsToSurvey(bins, { fileName: read.data.file }), {
              ...(network ? { network } : {}),
              bootstrapDraws: draws,
              seed,
            }),
          )
        : undefined;
      const doc = {
        caution: SCREENING_CAUTION,
        import: {
          file: read.data.file,
          summary: read.summary,
          columns: read.headers.map((header, i) => ({ header, role: read.roles[i] })),
          issues: read.issues,
        },
        bins: {
          ...bins,
          bins: bins.bins.map((b) => ({
            ...b,
            start: b.startMs === undefined ? null : new Date(b.startMs).toISOString(),
            end: b.endMs === undefined ? null : new Date(b.endMs).toISOString(),
          })),
        },
        ...(mixing ? { mixing } : {}),
      };
      text = `${JSON.stringify(doc, null, 2)}\n`;
    }
    if (values.out !== undefined) writeOut(values.out, text);
    else io.out(text);
    return 0;
  },
};
