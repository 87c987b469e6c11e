/**
 * Drawing and editing a channel centerline on the MapLibre map: click to add
 * vertices (mouth to head), drag a vertex to move it, double-click or Enter to
 * finish, Backspace to remove the last vertex, Escape to cancel. The line and
 * its vertex handles are a MapLibre GeoJSON source; km ticks come from
 * analysis/geometry (see drawnLine.ts) and update as the line changes.
 */
import * as maplibregl from "maplibre-gl";
import type { Map as MapLibreMap, MapLayerMouseEvent, MapMouseEvent } from "maplibre-gl";
import type { FeatureCollection } from "geojson";
import { DRAWN_FILE_NAME, dedupeVertices, drawnCenterlineGeoJson, type MouthEnd } from "./drawnLine.ts";
import type { LonLat } from "../worker/overlay.ts";
import type { TextFile } from "../worker/protocol.ts";
import type { DrawnPreview } from "../worker/drawnPreview.ts";
import { setSourceData } from "../map/sourceData.ts";

export type DrawMode = "idle" | "drawing" | "editing";

const SOURCE = "brackline-draw";
const TICK_SOURCE = "brackline-draw-ticks";
const LINE_LAYER = "brackline-draw-line";
const VERTEX_LAYER = "brackline-draw-vertices";
const TICK_LAYER = "brackline-draw-ticks";
/** Okabe & Ito (2008) vermillion for the line being drawn, blue for the mouth handle. */
const LINE_COLOUR = "#D55E00";
const MOUTH_COLOUR = "#0072B2";

export class DrawController {
  mode = $state<DrawMode>("idle");
  vertices = $state.raw<LonLat[]>([]);
  mouth = $state<MouthEnd>("start");
  /** Km ticks of the drawn line, placed by the worker, updated as the line changes. */
  drawn = $state.raw<DrawnPreview>({ ticks: [], lengthKm: 0 });
  #previewKey = "";
  /** Called when a line is finished or edited (dragged) while editing. */
  onChange: ((vertices: LonLat[], mouth: MouthEnd) => void) | undefined;

  /** @param preview asks the worker for the ticks of a drawn centerline file */
  constructor(readonly preview?: (file: TextFile) => Promise<DrawnPreview>) {}

  #map: MapLibreMap | undefined;
  #dragIndex: number | null = null;
  #markers: maplibregl.Marker[] = [];
  #detach: Array<() => void> = [];

  /** Attaches to a map (again after a style change); returns a function that detaches. */
  attach(map: MapLibreMap): () => void {
    this.detach();
    this.#map = map;
    const on = <T extends keyof maplibregl.MapEventType>(type: T, fn: (e: maplibregl.MapEventType[T]) => void) => {
      map.on(type, fn);
      this.#detach.push(() => map.off(type, fn));
    };
    on("click", (e) => this.#onClick(e));
    on("dblclick", (e) => this.#onDoubleClick(e));
    on("mousedown", (e) => this.#onMouseDown(e));
    on("mousemove", (e) => this.#onMouseMove(e));
    on("mouseup", () => this.#onMouseUp());
    on("styledata", () => this.#ensureLayers());
    this.#ensureLayers();
    this.render();
    return () => this.detach();
  }

  detach(): void {
    for (const off of this.#detach.splice(0)) off();
    this.#clearMarkers();
    this.#map = undefined;
  }

  start(): void {
    this.vertices = [];
    this.mode = "drawing";
    this.#map?.doubleClickZoom.disable();
    this.#ensureLayers();
    this.render();
  }

  /**
   * Opens an existing line (e.g. the centerline built from the station positions) in editing mode
   * with its vertices: drag a vertex to edit it; the edited line is handed on at the end of each drag.
   * Not handed on here: the line is already the active channel.
   */
  edit(vertices: readonly LonLat[], mouth: MouthEnd): void {
    const v = dedupeVertices(vertices);
    if (v.length < 2) return;
    this.vertices = v;
    this.mouth = mouth;
    this.mode = "editing";
    this.#map?.doubleClickZoom.enable();
    this.#ensureLayers();
    this.render();
  }

  /** Ends drawing; with ≥ 2 distinct vertices the line is kept for editing and handed on. */
  finish(): void {
    const v = dedupeVertices(this.vertices);
    this.vertices = v;
    if (v.length < 2) {
      this.cancel();
      return;
    }
    this.mode = "editing";
    this.#map?.doubleClickZoom.enable();
    this.render();
    this.onChange?.(v, this.mouth);
  }

  cancel(): void {
    this.vertices = [];
    this.mode = "idle";
    this.#map?.doubleClickZoom.enable();
    this.render();
  }

  removeLast(): void {
    if (this.vertices.length === 0) return;
    this.vertices = this.vertices.slice(0, -1);
    this.render();
  }

  setMouth(mouth: MouthEnd): void {
    this.mouth = mouth;
    this.render();
    if (this.mode === "editing") this.onChange?.(this.vertices, mouth);
  }

  /** Keyboard while drawing: Enter finishes, Escape cancels, Backspace removes the last vertex. */
  handleKey(e: KeyboardEvent): void {
    if (this.mode !== "drawing") return;
    const t = e.target as HTMLElement | null;
    if (t && (t.tagName === "INPUT" || t.tagName === "TEXTAREA" || t.tagName === "SELECT")) return;
    if (e.key === "Enter") this.finish();
    else if (e.key === "Escape") this.cancel();
    else if (e.key === "Backspace") this.removeLast();
    else return;
    e.preventDefault();
  }

  #hitVertex(e: MapMouseEvent): number | null {
    const map = this.#map;
    if (!map || !map.getLayer(VERTEX_LAYER)) return null;
    const box: [maplibregl.PointLike, maplibregl.PointLike] = [
      [e.point.x - 6, e.point.y - 6],
      [e.point.x + 6, e.point.y + 6],
    ];
    const hit = map.queryRenderedFeatures(box, { layers: [VERTEX_LAYER] })[0];
    const i = hit?.properties?.index;
    return typeof i === "number" ? i : null;
  }

  #onClick(e: MapMouseEvent): void {
    if (this.mode !== "drawing" || this.#hitVertex(e) !== null) return;
    this.vertices = [...this.vertices, [e.lngLat.lng, e.lngLat.lat]];
    this.render();
  }

  #onDoubleClick(e: MapMouseEvent): void {
    if (this.mode !== "drawing") return;
    e.preventDefault();
    this.finish();
  }

  #onMouseDown(e: MapLayerMouseEvent | MapMouseEvent): void {
    if (this.mode === "idle") return;
    const i = this.#hitVertex(e);
    if (i === null) return;
    e.preventDefault();
    this.#dragIndex = i;
    this.#map?.dragPan.disable();
  }

  #onMouseMove(e: MapMouseEvent): void {
    const map = this.#map;
    if (!map) return;
    if (this.#dragIndex === null) {
      if (this.mode !== "idle") map.getCanvas().style.cursor = this.#hitVertex(e) !== null ? "move" : "crosshair";
      return;
    }
    const next = [...this.vertices];
    next[this.#dragIndex] = [e.lngLat.lng, e.lngLat.lat];
    this.vertices = next;
    this.render();
  }

  #onMouseUp(): void {
    if (this.#dragIndex === null) return;
    this.#dragIndex = null;
    this.#map?.dragPan.enable();
    if (this.mode === "editing") this.onChange?.(this.vertices, this.mouth);
  }

  #retryPending = false;

  /**
   * Adds the draw tool's sources and layers when the map's style lacks them: when the tool is first used
   * (drawing or editing; not at attach, so the cold start tiles and draws none of them), and again after
   * every style change while it is in use. The map view's `setStyle` (diffed) removes every source and layer its style does
   * not name, ours included, and fires "styledata" while its own sources are still loading, so
   * `isStyleLoaded()` is false then; waiting for it dropped the layers for good (the vertex hit test then
   * found nothing to drag). The layers are added as soon as the style itself is parsed, else once the map
   * is idle.
   */
  #ensureLayers(): void {
    const map = this.#map;
    if (!map || this.mode === "idle" || map.getSource(SOURCE)) return;
    try {
      this.#addLayers(map);
    } catch {
      // The style is not parsed yet (a new style is loading): try again when the map is idle.
      if (this.#retryPending) return;
      this.#retryPending = true;
      map.once("idle", () => {
        this.#retryPending = false;
        if (this.#map === map) this.#ensureLayers();
      });
    }
  }

  #addLayers(map: MapLibreMap): void {
    const empty: FeatureCollection = { type: "FeatureCollection", features: [] };
    map.addSource(SOURCE, { type: "geojson", data: empty });
    map.addSource(TICK_SOURCE, { type: "geojson", data: empty });
    map.addLayer({
      id: LINE_LAYER,
      type: "line",
      source: SOURCE,
      filter: ["==", ["geometry-type"], "LineString"],
      paint: { "line-color": LINE_COLOUR, "line-width": 3, "line-dasharray": [2, 1] },
    });
    map.addLayer({
      id: TICK_LAYER,
      type: "circle",
      source: TICK_SOURCE,
      paint: { "circle-radius": 3, "circle-color": "#25292e" },
    });
    map.addLayer({
      id: VERTEX_LAYER,
      type: "circle",
      source: SOURCE,
      filter: ["==", ["geometry-type"], "Point"],
      paint: {
        "circle-radius": ["case", ["get", "mouth"], 8, 6],
        "circle-color": ["case", ["get", "mouth"], MOUTH_COLOUR, "#ffffff"],
        "circle-stroke-color": LINE_COLOUR,
        "circle-stroke-width": 2,
      },
    });
    this.render();
  }

  #clearMarkers(): void {
    for (const m of this.#markers.splice(0)) m.remove();
  }

  /** Asks the worker for the ticks when the line or its mouth changed; a newer line wins. */
  #refreshPreview(): void {
    const v = dedupeVertices(this.vertices);
    const key = JSON.stringify([v, this.mouth]);
    if (key === this.#previewKey) return;
    this.#previewKey = key;
    if (v.length < 2 || !this.preview) {
      this.drawn = { ticks: [], lengthKm: 0 };
      return;
    }
    const file = { name: DRAWN_FILE_NAME, text: JSON.stringify(drawnCenterlineGeoJson(v, this.mouth)) };
    this.preview(file).then(
      (preview) => {
        if (key !== this.#previewKey) return;
        this.drawn = preview;
        this.render();
      },
      () => {
        if (key === this.#previewKey) this.drawn = { ticks: [], lengthKm: 0 };
      },
    );
  }

  /** Pushes the line, handles, ticks and km labels into MapLibre. */
  render(): void {
    this.#refreshPreview();
    const map = this.#map;
    if (!map) return;
    const v = this.vertices;
    const show = this.mode !== "idle";
    const mouthIndex = this.mouth === "start" ? 0 : v.length - 1;
    const features: FeatureCollection["features"] = [];
    if (show && v.length >= 2)
      features.push({ type: "Feature", properties: {}, geometry: { type: "LineString", coordinates: v } });
    if (show)
      v.forEach((p, index) =>
        features.push({
          type: "Feature",
          properties: { index, mouth: index === mouthIndex },
          geometry: { type: "Point", coordinates: p },
        }),
      );
    const ticks = show ? this.drawn.ticks : [];
    setSourceData(map, SOURCE, { type: "FeatureCollection", features });
    setSourceData(map, TICK_SOURCE, {
      type: "FeatureCollection",
      features: ticks.map((t) => ({
        type: "Feature",
        properties: { km: t.km },
        geometry: { type: "Point", coordinates: t.lonLat },
      })),
    });
    this.#clearMarkers();
    for (const t of ticks) {
      const el = document.createElement("span");
      el.className = "brackline-draw-km";
      el.dataset.km = String(t.km);
      el.textContent = t.km === 0 ? "mouth" : t.label;
      el.style.cssText =
        "font: 600 11px system-ui, sans-serif; color: #25292e; background: rgba(250,250,247,0.85); padding: 0 3px; border-radius: 3px; pointer-events: none;";
      this.#markers.push(
        new maplibregl.Marker({ element: el, anchor: "left", offset: [8, 0] }).setLngLat(t.lonLat).addTo(map),
      );
    }
  }
}
