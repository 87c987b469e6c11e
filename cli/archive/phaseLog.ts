/**
 * A timeline of a CLI run for profiling (`BRACKLINE_PHASES=1`): each thread writes one stderr line
 * per mark, `phase <ms since the epoch> <thread id> <label>`, so the main thread's and the workers'
 * marks can be put on one time axis (the bench's phase rows read them). Nothing is written, and
 * nothing measured, without the variable.
 */
import { threadId } from "node:worker_threads";

/** True when the run writes its timeline. */
export const PHASES_ON = process.env.BRACKLINE_PHASES === "1";

/** Writes one mark of the timeline (no-op unless {@link PHASES_ON}). */
export function phaseMark(label: string): void {
  if (!PHASES_ON) return;
  process.stderr.write(`phase ${(performance.timeOrigin + performance.now()).toFixed(1)} ${threadId} ${label}\n`);
}
