/**
 * State of the archive view, owned by the app root: the worker's archive summary of the analysed
 * surveys (analysis/archive, computed in the worker) and the brushed date range. Which surveys are
 * chosen is the shared Selection (`comparedSurveys`), not kept here.
 */
import type { Season } from "../../../analysis/index.ts";
import type { ArchiveAnswer } from "../worker/archive.ts";

/** What the state needs from the worker. */
export type ArchiveSource = () => { archive(seasons?: Season[]): Promise<ArchiveAnswer> };

export class ArchiveState {
  /** The worker's answer: the summary, or why there is none (undefined until asked). */
  answer = $state.raw<ArchiveAnswer | undefined>(undefined);
  /** True while the worker makes the summary. */
  loading = $state(false);
  /** Brushed dates [from, to] in UTC milliseconds, or null. */
  brushMs = $state.raw<[number, number] | null>(null);
  readonly #source: ArchiveSource;
  #ask = 0;

  constructor(source: ArchiveSource) {
    this.#source = source;
  }

  /** Asks the worker for the archive of the analysed surveys; a newer request wins. */
  async refresh(seasons?: Season[]): Promise<void> {
    const ask = ++this.#ask;
    this.loading = true;
    try {
      const answer = await this.#source().archive(seasons);
      if (ask === this.#ask) this.answer = answer;
    } catch (error) {
      if (ask === this.#ask) this.answer = { reason: `The archive could not be made: ${String(error)}` };
    } finally {
      if (ask === this.#ask) this.loading = false;
    }
  }
}
