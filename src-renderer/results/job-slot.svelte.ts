/**
 * One result computed away from the keystroke (in the engine worker, or synchronously when that is
 * fast enough): its value, the inputs it belongs to, a busy flag and an error as data. A newer run
 * replaces an older one; a late answer to an old run is dropped (the worker client also supersedes it).
 */
import type { EngineError, EngineOutcome, JobKind } from '../workers/engine-messages.ts';

export class JobSlot<T> {
  value: T | null = $state.raw(null);
  /** The inputs (design, options) the value was computed for. */
  inputs: unknown = $state.raw(null);
  busy = $state(false);
  error: EngineError | null = $state.raw(null);
  /** Milliseconds the last computation took (in the worker or here). */
  elapsedMs = $state(0);
  #ticket = 0;
  /** Inputs of the run in flight, or of the value held. */
  #wanted: Record<string, unknown> | null = null;

  /**
   * Starts a run, unless the same inputs (compared field by field) are already computed or on their
   * way; resolves with the outcome (also when superseded), or null when nothing had to run.
   */
  async run<K extends JobKind>(
    inputs: Record<string, unknown>,
    start: () => Promise<EngineOutcome<K>>,
    pick: (output: EngineOutcome<K> & { status: 'done' }) => T,
  ): Promise<EngineOutcome<K> | null> {
    if (this.error === null && sameInputs(inputs, this.#wanted)) return null;
    this.#wanted = inputs;
    const ticket = ++this.#ticket;
    this.busy = true;
    const outcome = await start();
    if (ticket !== this.#ticket) return outcome;
    if (outcome.status === 'done') this.set(inputs, pick(outcome), outcome.elapsedMs);
    else if (outcome.status === 'error') {
      this.error = outcome.error;
      this.#wanted = null;
      this.busy = false;
    }
    return outcome;
  }

  /** Records a value computed here (synchronously), replacing any run still pending. */
  set(inputs: Record<string, unknown>, value: T, elapsedMs: number): void {
    this.#ticket++;
    this.#wanted = inputs;
    this.value = value;
    this.inputs = inputs;
    this.error = null;
    this.busy = false;
    this.elapsedMs = elapsedMs;
  }

  fail(message: string): void {
    this.#ticket++;
    this.#wanted = null;
    this.error = { message, problems: [] };
    this.busy = false;
  }

  clear(): void {
    this.#ticket++;
    this.#wanted = null;
    this.value = null;
    this.inputs = null;
    this.error = null;
    this.busy = false;
  }
}

/** Same keys and the same values (by identity; arrays element by element): a design object is the same design. */
function sameInputs(a: Record<string, unknown>, b: Record<string, unknown> | null): boolean {
  if (b === null) return false;
  const keys = Object.keys(a);
  if (keys.length !== Object.keys(b).length) return false;
  return keys.every((k) => {
    const x = a[k];
    const y = b[k];
    if (Array.isArray(x) && Array.isArray(y)) return x.length === y.length && x.every((v, i) => v === y[i]);
    return x === y;
  });
}
