/**
 * Where the live load sweep runs: here, on the page's own thread, so the efficiency chart follows a
 * keystroke within the same task (no worker round trip, no copy of the result), or in the engine worker
 * when sweeps of this design take too long to run here without making typing feel sticky.
 *
 * The decision uses the median of the last three measured sweeps (one slow sweep, say a garbage
 * collection, does not move it): here while that median is within the budget; back from the worker
 * once the worker's own times are within three quarters of it (the gap stops it flapping at the line).
 * It starts here: at page load the worker would first have to load and compile the engine.
 */
export type SweepPlace = 'here' | 'worker';

export class SweepPace {
  readonly budgetMs: number;
  #place: SweepPlace = 'here';
  #recent: number[] = [];

  constructor(budgetMs: number) {
    this.budgetMs = budgetMs;
  }

  /** True when the next sweep should run on this thread. */
  here(): boolean {
    return this.#place === 'here';
  }

  get place(): SweepPlace {
    return this.#place;
  }

  /** Records how long a sweep took, and where it ran. */
  record(ms: number, where: SweepPlace): void {
    if (!Number.isFinite(ms) || ms < 0) return;
    if (where !== this.#place) return; // a late answer from the other place says nothing about this one
    this.#recent.push(ms);
    if (this.#recent.length > 3) this.#recent.shift();
    if (this.#recent.length < (where === 'here' ? 3 : 1)) return;
    const median = [...this.#recent].sort((a, b) => a - b)[Math.floor(this.#recent.length / 2)];
    const next: SweepPlace = where === 'here' ? (median > this.budgetMs ? 'worker' : 'here') : median <= 0.75 * this.budgetMs ? 'here' : 'worker';
    if (next !== this.#place) {
      this.#place = next;
      this.#recent = [];
    }
  }
}
