/**
 * The briefing, built in the worker: the same document model and HTML that
 * `brackline report` writes (analysis/report buildBriefing + renderBriefingHtml),
 * from the surveys the worker analysed and the channel it holds.
 */
import {
  buildBriefing,
  provenanceRoleOf,
  renderBriefingHtml,
  type ArchiveSummary,
  type InputFileKind,
  type ProvenanceFile,
  type SurveyAnalysis,
} from "../../../analysis/index.ts";
import type { SourceFile, TextFile } from "./protocol.ts";
import type { ChannelNetwork } from "../../../analysis/index.ts";

/** Same software line and bootstrap settings as the command line's defaults (analyzeSurvey: 2000 draws, seed 1). */
const SOFTWARE = "Brackline 0.1.0";
const BOOTSTRAP = { draws: 2000, seed: 1 };

async function sha256Hex(bytes: Uint8Array): Promise<string | undefined> {
  const subtle = globalThis.crypto?.subtle;
  if (!subtle) return undefined;
  const digest = await subtle.digest("SHA-256", bytes as BufferSource);
  return [...new Uint8Array(digest)].map((b) => b.toString(16).padStart(2, "0")).join("");
}

/** Name, role, size and SHA-256 of the files behind the analysis, for the provenance table. */
export async function fileProvenance(
  surveys: SourceFile[],
  centerline: TextFile | undefined,
  kinds: ReadonlyArray<{ file: string; kind: InputFileKind }> = [],
): Promise<ProvenanceFile[]> {
  const encoder = new TextEncoder();
  const out: ProvenanceFile[] = [];
  // Each file in the role readInputs recognised (a station table is not a survey).
  const kindOf = new Map(kinds.map((k) => [k.file, k.kind]));
  const entries: Array<[SourceFile, ProvenanceFile["role"]]> = surveys.map((f) => [
    f,
    kindOf.has(f.name) ? provenanceRoleOf(kindOf.get(f.name)) : "survey",
  ]);
  if (centerline) entries.push([centerline, "centerline"]);
  for (const [file, role] of entries) {
    const bytes = "text" in file ? encoder.encode(file.text) : file.bytes;
    const sha256 = await sha256Hex(bytes);
    out.push({ name: file.name, role, bytes: bytes.length, ...(sha256 ? { sha256 } : {}) });
  }
  return out;
}

/**
 * The self-contained HTML briefing of the analysed surveys (the first is the comparison's reference).
 * `archive`: the archive summary the archive view shows (the user's seasons and discharge table), so the
 * briefing's archive section states the same numbers; without it the briefing summarises with defaults.
 */
export function briefingHtml(
  analyses: SurveyAnalysis[],
  network: ChannelNetwork | undefined,
  files: ProvenanceFile[],
  basemap: unknown,
  dataNotice: string | undefined,
  archive?: ArchiveSummary,
): string {
  const doc = buildBriefing({
    analyses,
    ...(archive ? { archive } : {}),
    ...(network ? { network } : {}),
    ...(basemap ? { basemap } : {}),
    files,
    ...(dataNotice ? { dataNotice } : {}),
    software: SOFTWARE,
    bootstrap: BOOTSTRAP,
  });
  return renderBriefingHtml(doc);
}
