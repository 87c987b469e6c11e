import { randomLcg } from "d3-random";
import { describe, expect, it } from "vitest";
import { readSurveyStream, readSurveyText } from "../../analysis/io/readSurvey.ts";
import { expectWithin } from "../helpers/tolerance.ts";

function bigCsv(rows: number): string {
  const rnd = randomLcg(42);
  const lines = ['survey,station,date_time,latitude,longitude,salinity,"Fe (nmol/L)",note'];
  for (let i = 0; i < rows; i += 1) {
    const s = (rnd() * 35).toFixed(3);
    lines.push(
      `S${Math.floor(i / 500)},ST${i},2025-03-${String(1 + (Math.floor(i / 500) % 28)).padStart(2, "0")}T10:00:00Z,45.${i % 1000},-1.${i % 997},${s},${i % 7 === 0 ? "<0.05" : (rnd() * 100).toFixed(2)},"quoted, with ""comma"" and\nnewline"`,
    );
  }
  return `${lines.join("\n")}\n`;
}

function* chunksOf(text: string, size: number): Generator<string> {
  for (let i = 0; i < text.length; i += size) yield text.slice(i, i + size);
}

describe("readSurveyStream (papaparse chunked parsing with progress)", () => {
  const text = bigCsv(3000);

  it("readSurveyStream() over 997-character chunks (split inside quoted fields) gives the same stations as readSurveyText()", async () => {
    const whole = readSurveyText(text, { fileName: "big.csv" });
    const streamed = await readSurveyStream(chunksOf(text, 997), { fileName: "big.csv" });
    expect(streamed.summary).toEqual(whole.summary);
    expect(streamed.surveys).toEqual(whole.surveys);
    expect(streamed.issues).toEqual(whole.issues);
    expect(whole.summary.rowsAccepted).toBe(3000);
  });

  it("readSurveyStream() reads a WHATWG ReadableStream of UTF-8 bytes (multi-byte µ split across chunks) and reports monotonic progress ending at 1", async () => {
    const small = "station,salinity,Si (µmol/L)\nA,1,2\nB,3,4\n";
    const bytes = new TextEncoder().encode(`\uFEFF${small}${text.split("\n").slice(1).join("\n")}`);
    const stream = new ReadableStream<Uint8Array>({
      start(controller) {
        for (let i = 0; i < bytes.length; i += 4099) controller.enqueue(bytes.slice(i, i + 4099));
        controller.close();
      },
    });
    const progress: number[] = [];
    const r = await readSurveyStream(stream, {
      fileName: "bytes.csv",
      totalSize: bytes.length,
      onProgress: (f) => progress.push(f),
    });
    expect(r.headers).toEqual(["station", "salinity", "Si (µmol/L)"]);
    expect(r.surveys[0].constituents[0].unit).toBe("µmol/L");
    expect(progress.length).toBeGreaterThan(10);
    for (let i = 1; i < progress.length; i += 1) expect(progress[i]).toBeGreaterThanOrEqual(progress[i - 1]);
    expectWithin(progress[progress.length - 1], 1, 0, "final progress");
    expect(r.summary.rowsRead).toBe(r.summary.rowsAccepted + r.summary.rowsRejected);
  });

  it("readSurveyStream() handles an empty source without throwing", async () => {
    const r = await readSurveyStream([], { fileName: "none.csv" });
    expect(r.summary.rowsRead).toBe(0);
    expect(r.issues.some((i) => i.severity === "error" && i.file === "none.csv")).toBe(true);
  });
});
