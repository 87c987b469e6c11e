// The event methods of a MapLibre map (on, off) for stand-in maps in the map tests, with `fire` to
// raise an event as MapLibre would. Listeners run in the order added; one removed while an event is
// being fired still runs for that event (as MapLibre's Evented does).

/** A listener of a stand-in map's event. */
export type Listener = (e: Record<string, unknown>) => void;

export class FakeEvents {
  private listeners = new Map<string, Set<Listener>>();
  on(type: string, f: Listener) {
    if (!this.listeners.has(type)) this.listeners.set(type, new Set());
    this.listeners.get(type)!.add(f);
    return this;
  }
  off(type: string, f: Listener) {
    this.listeners.get(type)?.delete(f);
    return this;
  }
  fire(type: string, e: Record<string, unknown> = {}) {
    for (const f of [...(this.listeners.get(type) ?? [])]) f(e);
  }
}
