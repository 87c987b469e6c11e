// @vitest-environment jsdom
import { describe, expect, it } from "vitest";
import { fireEvent, render } from "@testing-library/svelte";
import { flushSync } from "svelte";
import ImportReport from "../../../dashboard/src/import/ImportReport.svelte";
import MappingDialog from "../../../dashboard/src/import/MappingDialog.svelte";
import DropZone from "../../../dashboard/src/import/DropZone.svelte";
import { inspectFile } from "../../../dashboard/src/worker/inspectFile.ts";
import { importFile } from "../../../dashboard/src/worker/importFile.ts";
import type { ColumnMapping } from "../../../analysis/index.ts";
import { QUIRKY_CSV, file } from "./fixtures.ts";

// jsdom has no <dialog> modal support; a minimal stand-in so the component can open and close it.
HTMLDialogElement.prototype.showModal ??= function (this: HTMLDialogElement) {
  this.setAttribute("open", "");
};
HTMLDialogElement.prototype.close ??= function (this: HTMLDialogElement) {
  this.removeAttribute("open");
};

describe("ImportReport shows every problem with file, row, column, value and what was expected (common practice)", () => {
  it("lists counts and each problem; the filter narrows the table", async () => {
    const i = await inspectFile(file("quirky.csv", QUIRKY_CSV));
    const mapping = structuredClone(i.suggested!);
    mapping.columns[5].role = "salinity";
    const outcome = await importFile(file("quirky.csv", QUIRKY_CSV), { kind: "surveyText", mapping });
    const r = render(ImportReport, { entries: [{ outcome, reusedFrom: "2026-01-05T10:00:00Z" }] });
    expect(r.container.querySelector('[data-count="rejected"]')?.textContent).toBe("1 rejected");
    expect(r.getByTestId("mapping-reused").textContent).toBe("mapping reused from 2026-01-05 10:00 UTC");
    const rows = () => [...r.container.querySelectorAll("tbody tr")];
    expect(rows().length).toBe(outcome.issues.length);
    const bad = r.container.querySelector('tr[data-row="4"][data-column="Fe (nmol/L)"]');
    expect(bad?.textContent).toContain("abc");
    await fireEvent.input(r.getByTestId("issue-filter"), { target: { value: "station id" } });
    flushSync();
    expect(rows().map((tr) => tr.getAttribute("data-row"))).toEqual(["5"]);
  });
});

describe("MappingDialog lets the user correct a role and confirm", () => {
  it("changing S_field to salinity is in the confirmed mapping; the other columns stay as suggested", async () => {
    const inspection = await inspectFile(file("quirky.csv", QUIRKY_CSV));
    let answer: ColumnMapping | undefined;
    const question = {
      inspection,
      mapping: inspection.suggested!,
      answer: (m: ColumnMapping | undefined) => (answer = m),
    };
    const r = render(MappingDialog, { question });
    const select = r.container.querySelector('tr[data-header="S_field"] select') as HTMLSelectElement;
    expect(r.getByLabelText("Role of column S_field")).toBe(select);
    await fireEvent.change(select, { target: { value: "salinity" } });
    await fireEvent.click(r.getByTestId("mapping-confirm"));
    expect(answer?.columns.map((c) => c.role)).toEqual([
      "survey",
      "station",
      "date",
      "latitude",
      "longitude",
      "salinity",
      "constituent",
      "constituent",
    ]);
    expect(answer?.columns[6]).toMatchObject({ name: "Fe", unit: "nmol/L" });
    expect(answer?.shape).toBe(inspection.suggested?.shape);
  });
  it("shows role names in plain words, not internal ids (dateTime, depthLabel, rowFlag)", async () => {
    const inspection = await inspectFile(file("quirky.csv", QUIRKY_CSV));
    const r = render(MappingDialog, { question: { inspection, mapping: inspection.suggested!, answer: () => {} } });
    const select = r.container.querySelector('tr[data-header="S_field"] select') as HTMLSelectElement;
    const shown = [...select.options].map((o) => o.textContent?.trim());
    expect(shown).toContain("Date and time");
    expect(shown).toContain("Quality flag of the row");
    for (const id of ["dateTime", "depthLabel", "rowFlag"]) expect(shown).not.toContain(id);
  });
});

describe("DropZone is keyboard accessible", () => {
  it("has a labelled group, a real button and a file input that hands files over", async () => {
    const got: string[] = [];
    const r = render(DropZone, { onFiles: (files: Array<{ name: string }>) => got.push(...files.map((f) => f.name)) });
    expect(r.getByRole("group").getAttribute("aria-label")).toMatch(/^Import files/);
    expect(r.getByRole("button", { name: "Import files…" })).toBeTruthy();
    const input = r.getByTestId("import-input") as HTMLInputElement;
    Object.defineProperty(input, "files", { value: [file("a.csv", "x")], configurable: true });
    await fireEvent.change(input);
    expect(got).toEqual(["a.csv"]);
  });
});
