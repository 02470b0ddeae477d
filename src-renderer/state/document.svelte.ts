/**
 * The open design document: the draft being edited (which may be invalid), its validation problems,
 * the last valid design, undo/redo for every edit, the unsaved marker, the file name and path. Every
 * change goes through `commit`, so nothing escapes undo.
 *
 * Half-typed values (issue 16 §3): a number field previews what is being typed (`preview`): the draft,
 * its problems and the results (`shown`) follow each keystroke, but the history, `committed`, `lastValid`
 * and so the recovery snapshot, Save and the report take the value only when the user means it
 * (`commitPreview`: Enter, leaving the field, a pause, or any other edit, undo or save).
 */
import { validateDesign } from '../../shared-model/index.ts';
import type { Design, Problem } from '../../shared-model/index.ts';
import { groupPlaced, NOT_SHOWN, placeProblems, type PlacedProblem, type ShownAtField } from '../editor/problem-words.ts';
import { History } from './history.ts';
import { groupByPath, pathKey, setAt, type Path } from './paths.ts';

export const UNTITLED = 'Untitled design';

export class DocumentStore {
  #history: History<Design>;

  /** The draft being edited; may hold values the validator refuses. */
  design: Design = $state.raw() as Design;
  /** The draft as the history holds it: no half-typed value (Save and recovery snapshots write it). */
  committed: Design = $state.raw() as Design;
  /** The newest committed design that passed validation (the report's design). */
  lastValid: Design = $state.raw() as Design;
  /** What the results show: the previewed draft when it is valid, else the last valid design. */
  shown: Design = $state.raw() as Design;
  /** The field whose half-typed value is previewed (dotted path), or null. */
  previewPath: string | null = $state(null);
  /** Counts every change of `shown` (commits and previews): the results' "newer than" mark. */
  shownRevision = $state(0);
  #previewLabel = '';
  problems: Problem[] = $state.raw([]);
  fileName = $state(UNTITLED);
  /** Where the file lives (Electron) or its name (browser); null for a new design. */
  filePath: string | null = $state(null);
  revision = $state(0);
  savedRevision = $state(0);
  canUndo = $state(false);
  canRedo = $state(false);
  undoLabel: string | null = $state(null);
  redoLabel: string | null = $state(null);

  /** False from loading an invalid draft (a blank design) until it first validates: no results to show yet. */
  validSinceLoad = $state(true);
  dirty = $derived(this.revision !== this.savedRevision);
  valid = $derived(this.problems.length === 0);
  /** Validation problems by dotted field path, for showing them in place. */
  problemsByPath = $derived(groupByPath(this.problems));
  /** The field edited last: a rule relating two fields is shown on the one the user touched. */
  editedPath: string | null = $state(null);
  /** Every problem in the user's words (field labels, not paths), placed on the field it is shown at. */
  placed: PlacedProblem[] = $derived(placeProblems(this.problems, this.design, this.editedPath));
  #shownAt = $derived(groupPlaced(this.placed));

  constructor(initial: Design, fileName = UNTITLED, filePath: string | null = null) {
    this.#history = new History(initial);
    this.load(initial, fileName, filePath);
  }

  /** Sets one field (one undo step; keystrokes into the same field merge until `seal`). */
  edit(path: Path, value: unknown, label: string, mergeKey: string | null = pathKey(path)): void {
    this.commitPreview();
    this.editedPath = pathKey(path);
    this.commit(setAt(this.design, path, value), label, mergeKey);
  }

  /** Records a whole new draft as one undo step (a pending preview is committed first, as its own step). */
  commit(next: Design, label: string, mergeKey: string | null = null): void {
    this.commitPreview();
    if (!this.#history.apply(next, label, mergeKey)) return;
    performance.mark('wattledger:edit');
    this.#sync();
  }

  /**
   * Shows a half-typed value of one field: the draft, its problems and the results follow it; the
   * history does not, until `commitPreview`. A preview of another field commits the pending one first.
   */
  preview(path: Path, value: unknown, label: string): void {
    const key = pathKey(path);
    if (this.previewPath !== null && this.previewPath !== key) this.commitPreview();
    this.editedPath = key;
    this.previewPath = key;
    this.#previewLabel = label;
    performance.mark('wattledger:edit');
    const draft = setAt(this.committed, path, value);
    const check = validateDesign(draft);
    this.design = draft;
    this.problems = check.ok ? [] : check.problems;
    this.shown = check.ok ? check.design : this.lastValid;
    this.shownRevision++;
  }

  /** The user means the previewed value: it enters the history (keystrokes of one field merge until `seal`). */
  commitPreview(): void {
    const key = this.previewPath;
    if (key === null) return;
    this.previewPath = null;
    // A valid preview was validated at its last keystroke: the results already show it, keep that record.
    const validated = this.problems.length === 0 ? this.shown : undefined;
    this.#history.apply(this.design, this.#previewLabel, key);
    this.#sync(validated);
  }

  seal(): void {
    this.commitPreview();
    this.#history.seal();
  }

  undo(): boolean {
    this.commitPreview();
    this.#history.seal();
    if (this.#history.undo() === null) return false;
    this.#sync();
    return true;
  }

  redo(): boolean {
    this.commitPreview();
    if (this.#history.redo() === null) return false;
    this.#sync();
    return true;
  }

  /** Replaces the document (new, open, restore): fresh history. `dirty` marks a restored draft. */
  load(design: Design, fileName: string, filePath: string | null, dirty = false): void {
    this.editedPath = null;
    this.previewPath = null;
    this.#history.reset(design);
    this.fileName = fileName;
    this.filePath = filePath;
    this.#sync();
    this.savedRevision = dirty ? -1 : this.revision;
    this.validSinceLoad = this.valid;
    // A restored draft that fails validation keeps the previous results (or, at start, shows none valid).
    if (!this.valid && this.lastValid === undefined) this.lastValid = this.shown = design;
  }

  /** Records a successful save of the draft as it was at `revision`. */
  markSaved(fileName: string, filePath: string | null, revision = this.revision): void {
    this.fileName = fileName;
    this.filePath = filePath;
    this.savedRevision = revision;
  }

  problemsAt(path: Path | string): Problem[] {
    return this.problemsByPath.get(pathKey(path)) ?? [];
  }

  /** The sentences shown at a field, and the labels of the fields whose problem concerns it too. */
  shownAt(path: Path | string): ShownAtField {
    return this.#shownAt.get(pathKey(path)) ?? NOT_SHOWN;
  }

  /** Takes the history's present; `validated` is its validated record when the caller already has it. */
  #sync(validated?: Design): void {
    const design = this.#history.present;
    const check = validated ? { ok: true as const, design: validated } : validateDesign(design);
    this.design = design;
    this.committed = design;
    this.problems = check.ok ? [] : check.problems;
    if (check.ok) {
      this.lastValid = check.design;
      this.validSinceLoad = true;
    }
    if (this.shown !== this.lastValid) {
      this.shown = this.lastValid;
      this.shownRevision++;
    }
    this.revision = this.#history.revision;
    this.canUndo = this.#history.canUndo;
    this.canRedo = this.#history.canRedo;
    this.undoLabel = this.#history.undoLabel;
    this.redoLabel = this.#history.redoLabel;
  }
}
