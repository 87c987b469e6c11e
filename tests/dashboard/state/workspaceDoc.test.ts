import { describe, expect, it } from "vitest";
import { exportWorkspace, importWorkspace } from "../../../analysis/index.ts";
import {
  fromWorkspaceDocument,
  toWorkspaceDocument,
  type WorkspaceParts,
} from "../../../dashboard/src/state/workspaceDoc.ts";

const PARTS: WorkspaceParts = {
  surveys: [],
  centerline: null,
  demoBasemap: false,
  mappings: [],
  mappingDates: {},
  imports: [],
  colouring: "salinity",
  tileUrl: "",
  useTiles: false,
  worldLand: false,
  analysis: {
    endmemberOverrides: {},
    precisionPercent: {},
    riverDischargeM3s: undefined,
    constantSet: "default",
    saltIntrusionSalinity: 2,
  },
};

/** Through the versioned JSON text and its schema check, as a saved workspace goes. */
function roundTrip(parts: WorkspaceParts): WorkspaceParts {
  const text = exportWorkspace(toWorkspaceDocument(parts, "2026-01-01T00:00:00Z"));
  const { workspace, issues } = importWorkspace(text);
  expect(issues).toEqual([]);
  return fromWorkspaceDocument(workspace!);
}

describe("workspace document: the world-land setting (Settings → Basemap)", () => {
  it("is saved and comes back, off or on", () => {
    expect(roundTrip(PARTS).worldLand).toBe(false);
    expect(roundTrip({ ...PARTS, worldLand: true }).worldLand).toBe(true);
  });

  it("an older workspace without it opens with the world land on (the default)", () => {
    const doc = toWorkspaceDocument(PARTS, "2026-01-01T00:00:00Z");
    delete (doc.settings as Record<string, unknown>).worldLand;
    const { workspace } = importWorkspace(exportWorkspace(doc));
    expect(fromWorkspaceDocument(workspace!).worldLand).toBe(true);
  });
});
