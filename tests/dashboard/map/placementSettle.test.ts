// settleStalePlacement / settlePlacements (dashboard/src/map/placementSettle.ts): after a frame whose
// fade-free label placement was made in full, the stale mark MapLibre puts on it is cleared when it is
// the only reason left for another frame, and only then. Checked on a stand-in for the MapLibre map
// state the module reads (MapLibre GL JS 6.x field names; common practice: no redraw of an unchanged
// picture). The real map is driven by the browser tests (labels placed and drawn, map idle).
import { describe, expect, it } from "vitest";
import {
  settlePlacements,
  settleStalePlacement,
  type SettlingMap,
} from "../../../dashboard/src/map/placementSettle.ts";
import { FakeEvents } from "./helpers/fakeEvents.ts";

/** The render-time state of a MapLibre map just after a frame that took in new label tiles. */
class FakeMap extends FakeEvents {
  _placementDirty = true;
  _sourcesDirty = false;
  _styleDirty = false;
  moving = false;
  done = true;
  painter = { renderToTexture: undefined as { needsFollowUpFrame: boolean } | undefined };
  style = {
    pauseablePlacement: { isDone: () => this.done },
    placement: { stale: true, fadeDuration: 0 },
  };
  isMoving() {
    return this.moving;
  }
}

const asMap = (m: FakeMap | object) => m as unknown as SettlingMap;

describe("settleStalePlacement()", () => {
  it("clears the stale mark of a finished, fade-free placement that is the only reason for a frame", () => {
    const m = new FakeMap();
    expect(settleStalePlacement(asMap(m))).toBe(true);
    expect(m.style.placement.stale).toBe(false);
    expect(m._placementDirty).toBe(false);
  });

  it("leaves a placement whose labels fade alone (a map with a fade, after its first idle)", () => {
    const m = new FakeMap();
    m.style.placement.fadeDuration = 300;
    expect(settleStalePlacement(asMap(m))).toBe(false);
    expect(m.style.placement.stale).toBe(true);
    expect(m._placementDirty).toBe(true);
  });

  it.each([
    ["a source change is pending", (m: FakeMap) => (m._sourcesDirty = true)],
    ["a style change is pending", (m: FakeMap) => (m._styleDirty = true)],
    ["the placement is not finished", (m: FakeMap) => (m.done = false)],
    ["the camera moves", (m: FakeMap) => (m.moving = true)],
    ["the placement is not stale", (m: FakeMap) => (m.style.placement.stale = false)],
    ["nothing asks for a frame", (m: FakeMap) => (m._placementDirty = false)],
    [
      "a render-to-texture pass asks for one more frame",
      (m: FakeMap) => (m.painter.renderToTexture = { needsFollowUpFrame: true }),
    ],
  ])("keeps the follow-up frame when %s", (_why, set) => {
    const m = new FakeMap();
    set(m);
    const before = { stale: m.style.placement.stale, dirty: m._placementDirty };
    expect(settleStalePlacement(asMap(m))).toBe(false);
    expect({ stale: m.style.placement.stale, dirty: m._placementDirty }).toEqual(before);
  });

  it("does nothing on a map whose internals have another shape", () => {
    const other = { on: () => undefined, off: () => undefined, isMoving: () => false, style: {} };
    expect(settleStalePlacement(asMap(other))).toBe(false);
    const noStyle = { on: () => undefined, off: () => undefined, isMoving: () => false };
    expect(settleStalePlacement(asMap(noStyle))).toBe(false);
  });
});

describe("settlePlacements()", () => {
  it("settles after each render until stopped", () => {
    const m = new FakeMap();
    const stop = settlePlacements(asMap(m));
    m.fire("render");
    expect(m._placementDirty).toBe(false);
    m._placementDirty = true;
    m.style.placement.stale = true;
    stop();
    m.fire("render");
    expect(m._placementDirty).toBe(true);
  });
});
