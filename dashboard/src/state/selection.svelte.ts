/**
 * Shared selection state of the dashboard: which survey, constituent and
 * stations are selected, and any brushed salinity range. Every panel reads and
 * writes this one object so selections link both ways (map ⇄ plots ⇄ table).
 */
export class Selection {
  /** Index of the active survey in the workspace's survey list. */
  surveyIndex = $state(0);
  /** Name of the selected constituent (e.g. "Fe"). */
  constituent = $state("Fe");
  /** Ids of the selected stations; survives switching constituent and survey. */
  stationIds = $state<ReadonlySet<string>>(new Set());
  /** Brushed salinity interval [min, max], or null. */
  salinityBrush = $state<[number, number] | null>(null);
  /** Names of the surveys chosen for Compare and the Briefing (two or more; empty: the default choice). */
  comparedSurveys = $state.raw<string[]>([]);
  /** Station under the pointer (hover), or null. */
  hoveredStationId = $state<string | null>(null);

  /** Replaces the selection with the given station ids. */
  selectStations(ids: Iterable<string>): void {
    this.stationIds = new Set(ids);
  }

  /** Adds or removes one station (shift-click style). */
  toggleStation(id: string): void {
    const next = new Set(this.stationIds);
    if (next.has(id)) next.delete(id);
    else next.add(id);
    this.stationIds = next;
  }

  clear(): void {
    this.stationIds = new Set();
    this.salinityBrush = null;
  }

  isSelected(id: string): boolean {
    return this.stationIds.has(id);
  }
}
