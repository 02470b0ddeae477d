/**
 * What the results are shown for: always the last valid design (so an invalid entry leaves the
 * previous results on screen; `stale` says so), at the load and input voltage the user picked (rated
 * load and nominal Vin unless chosen). The results area (results/) computes from this.
 */
import type { Warning } from '../../shared-model/index.ts';
import type { DocumentStore } from './document.svelte.ts';

export class ResultsState {
  readonly doc: DocumentStore;
  /** Chosen load current in A; null means the design's rated load. */
  loadA: number | null = $state(null);
  /** Chosen input voltage in V; null means the design's nominal Vin. */
  vinV: number | null = $state(null);
  /** True while the draft is invalid: the results belong to the last valid design. */
  stale = $derived.by(() => !this.doc.valid);
  /** The warnings of the shown evaluation (set by the results area), so a field can show those about itself. */
  warnings: readonly Warning[] = $state.raw([]);

  constructor(doc: DocumentStore) {
    this.doc = doc;
  }

  reset(): void {
    this.loadA = null;
    this.vinV = null;
  }
}
