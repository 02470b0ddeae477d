/**
 * Undo and redo over immutable document snapshots.
 *
 * Every edit pushes a snapshot with a label ("Edit switching frequency"). Edits that carry the same
 * `key` one after another (the keystrokes typed into one field) merge into one step until `seal()` is
 * called (the field loses focus) or another key arrives, so one undo reverts one field entry.
 * Each snapshot has a revision number; the document is unsaved when the present revision differs from
 * the revision last saved, so undoing back to the saved state clears the unsaved marker.
 */
export interface HistoryEntry<T> {
  value: T;
  label: string;
  key: string | null;
  revision: number;
}

export class History<T> {
  #past: HistoryEntry<T>[] = [];
  #future: HistoryEntry<T>[] = [];
  #present: HistoryEntry<T>;
  #sealed = true;
  #nextRevision = 1;
  readonly limit: number;

  constructor(initial: T, limit = 300) {
    this.limit = limit;
    this.#present = { value: initial, label: 'Start', key: null, revision: 0 };
  }

  get present(): T {
    return this.#present.value;
  }
  get revision(): number {
    return this.#present.revision;
  }
  get canUndo(): boolean {
    return this.#past.length > 0;
  }
  get canRedo(): boolean {
    return this.#future.length > 0;
  }
  /** Label of the step undo would revert, or null. */
  get undoLabel(): string | null {
    return this.canUndo ? this.#present.label : null;
  }
  get redoLabel(): string | null {
    return this.#future.at(-1)?.label ?? null;
  }

  /** Records an edit. Returns false (and records nothing) when the value is the present one. */
  apply(value: T, label: string, key: string | null = null): boolean {
    if (value === this.#present.value) return false;
    const entry = { value, label, key, revision: this.#nextRevision++ };
    const merge = key !== null && !this.#sealed && this.#present.key === key && this.#past.length > 0;
    if (!merge) {
      this.#past.push(this.#present);
      if (this.#past.length > this.limit) this.#past.shift();
    }
    this.#present = entry;
    this.#future = [];
    this.#sealed = key === null;
    return true;
  }

  /** Ends the current merge run: the next edit becomes its own undo step. */
  seal(): void {
    this.#sealed = true;
  }

  undo(): T | null {
    const previous = this.#past.pop();
    if (!previous) return null;
    this.#future.push(this.#present);
    this.#present = previous;
    this.#sealed = true;
    return previous.value;
  }

  redo(): T | null {
    const next = this.#future.pop();
    if (!next) return null;
    this.#past.push(this.#present);
    this.#present = next;
    this.#sealed = true;
    return next.value;
  }

  /** Starts a fresh history (new or opened document). */
  reset(value: T): void {
    this.#past = [];
    this.#future = [];
    this.#sealed = true;
    this.#present = { value, label: 'Start', key: null, revision: this.#nextRevision++ };
  }
}
