/**
 * The analysis panels, picked up from dashboard/src/panels/ by file name so
 * the shell builds whether or not a panel exists yet. Each takes
 * `{ analysis, selection }`.
 */
import type { Component } from "svelte";
import type { PanelProps } from "../panels/lib/types.ts";

export interface PanelEntry {
  /** File name without extension, e.g. "MixingPlot". */
  id: string;
  title: string;
  component: Component<PanelProps> | undefined;
}

const modules = import.meta.glob("../panels/*.svelte", { eager: true, import: "default" }) as Record<
  string,
  Component<PanelProps>
>;

/** The panels in display order, with human titles for placeholders. */
export const PANEL_ORDER: Array<{ id: string; title: string }> = [
  { id: "MixingPlot", title: "Mixing plot" },
  { id: "ChannelProfile", title: "Along-channel profile" },
  { id: "BehaviourTable", title: "Behaviour by constituent" },
  { id: "SpeciationPanel", title: "Speciation context" },
  { id: "ExportMenu", title: "Export" },
];

export function panelEntries(): PanelEntry[] {
  return PANEL_ORDER.map(({ id, title }) => ({ id, title, component: modules[`../panels/${id}.svelte`] }));
}
