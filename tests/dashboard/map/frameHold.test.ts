// holdFrames / retiled (dashboard/src/map/frameHold.ts): a map's repaint requests are noted, not
// drawn, until what it should draw is tiled (or the user moves it, or it is resized, or the hold's
// time is up); then one frame is drawn. Checked on a stand-in for MapLibre's map (its event methods,
// tile state and triggerRepaint); common practice: coalescing redraw requests.
import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import { FakeEvents } from "./helpers/fakeEvents.ts";
import { holdFrames, retiled, type HoldableMap } from "../../../dashboard/src/map/frameHold.ts";

class FakeMap extends FakeEvents {
  frames = 0;
  sourceLoaded = true;
  tilesLoaded = true;
  isSourceLoaded() {
    return this.sourceLoaded;
  }
  areTilesLoaded() {
    return this.tilesLoaded;
  }
  triggerRepaint() {
    this.frames++;
  }
}

const asMap = (m: FakeMap) => m as unknown as HoldableMap;
const flush = () => Promise.resolve();

describe("holdFrames()", () => {
  beforeEach(() => vi.useFakeTimers());
  afterEach(() => vi.useRealTimers());

  it("notes repaint requests while held and draws one frame once the source is tiled", async () => {
    const m = new FakeMap();
    const tiled = retiled(asMap(m), "marks");
    tiled.since();
    m.sourceLoaded = false;
    const hold = holdFrames(asMap(m), tiled.done, 600)!;
    m.triggerRepaint();
    m.triggerRepaint();
    expect(m.frames).toBe(0);
    // The source's content event starts its reload; its tiles then come back.
    m.fire("sourcedata", { sourceId: "marks", sourceDataType: "content" });
    await flush();
    expect(hold.holding).toBe(true);
    m.sourceLoaded = true;
    m.fire("sourcedata", { sourceId: "marks", tile: {} });
    await flush();
    expect(hold.holding).toBe(false);
    expect(m.frames).toBe(1);
    // MapLibre's own method is back.
    m.triggerRepaint();
    expect(m.frames).toBe(2);
  });

  it("a source loaded before its new data's content event is not yet tiled", async () => {
    const m = new FakeMap();
    const tiled = retiled(asMap(m), "marks");
    tiled.since();
    const hold = holdFrames(asMap(m), tiled.done, 600)!;
    m.fire("sourcedata", { sourceId: "marks", sourceDataType: "metadata" });
    m.fire("sourcedata", { sourceId: "other", sourceDataType: "content" });
    await flush();
    expect(hold.holding).toBe(true);
  });

  it("the user's move or a resize ends the hold at once; the map's own move does not", async () => {
    const m = new FakeMap();
    const hold = holdFrames(asMap(m), () => false, 600)!;
    m.triggerRepaint();
    m.fire("movestart", {});
    expect(hold.holding).toBe(true);
    m.fire("movestart", { originalEvent: {} });
    expect(hold.holding).toBe(false);
    expect(m.frames).toBe(1);
    const again = holdFrames(asMap(m), () => false, 600)!;
    m.fire("resize");
    expect(again.holding).toBe(false);
    // Nothing was asked for during the second hold: no frame.
    expect(m.frames).toBe(1);
  });

  it("ends after maxMs at the latest; a held map is not held twice", () => {
    const m = new FakeMap();
    const hold = holdFrames(asMap(m), () => false, 600)!;
    expect(holdFrames(asMap(m), () => false, 600)).toBeUndefined();
    m.triggerRepaint();
    vi.advanceTimersByTime(599);
    expect(hold.holding).toBe(true);
    vi.advanceTimersByTime(1);
    expect(hold.holding).toBe(false);
    expect(m.frames).toBe(1);
  });

  it("drawOnceWhen lets one frame through the first time it holds, and the hold goes on", async () => {
    const m = new FakeMap();
    let basemapIn = false;
    const hold = holdFrames(
      asMap(m),
      () => false,
      600,
      () => basemapIn,
    )!;
    m.triggerRepaint();
    m.fire("sourcedata", { sourceId: "basemap", tile: {} });
    await flush();
    expect(m.frames).toBe(0);
    basemapIn = true;
    m.fire("sourcedata", { sourceId: "basemap", tile: {} });
    await flush();
    expect(m.frames).toBe(1);
    expect(hold.holding).toBe(true);
    // Only once; requests after it are held again, and the release draws one more frame.
    m.triggerRepaint();
    m.fire("sourcedata", { sourceId: "basemap", tile: {} });
    await flush();
    expect(m.frames).toBe(1);
    hold.release();
    expect(m.frames).toBe(2);
  });
});
