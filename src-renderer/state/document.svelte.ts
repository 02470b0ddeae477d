/**
 * The open design document: the draft being edited (which may be invalid), its validation problems,
 * the last valid design (what the results show), undo/redo for every edit, the unsaved marker, the
 * file name and path. Every change goes through `commit`, so nothing escapes undo.
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
  /** The newest design that passed validation: the results are computed from it. */
  lastValid: Design = $state.raw() as Design;
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
    this.editedPath = pathKey(path);
    this.commit(setAt(this.design, path, value), label, mergeKey);
  }

  /** Records a whole new draft as one undo step. */
  commit(next: Design, label: string, mergeKey: string | null = null): void {
    if (!this.#history.apply(next, label, mergeKey)) return;
    performance.mark('wattledger:edit');
    this.#sync();
  }

  seal(): void {
    this.#history.seal();
  }

  undo(): boolean {
    if (this.#history.undo() === null) return false;
    this.#sync();
    return true;
  }

  redo(): boolean {
    if (this.#history.redo() === null) return false;
    this.#sync();
    return true;
  }

  /** Replaces the document (new, open, restore): fresh history. `dirty` marks a restored draft. */
  load(design: Design, fileName: string, filePath: string | null, dirty = false): void {
    this.editedPath = null;
    this.#history.reset(design);
    this.fileName = fileName;
    this.filePath = filePath;
    this.#sync();
    this.savedRevision = dirty ? -1 : this.revision;
    // A restored draft that fails validation keeps the previous results (or, at start, shows none valid).
    if (!this.valid && this.lastValid === undefined) this.lastValid = design;
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

  #sync(): void {
    const design = this.#history.present;
    const check = validateDesign(design);
    this.design = design;
    this.problems = check.ok ? [] : check.problems;
    if (check.ok) this.lastValid = check.design;
    this.revision = this.#history.revision;
    this.canUndo = this.#history.canUndo;
    this.canRedo = this.#history.canRedo;
    this.undoLabel = this.#history.undoLabel;
    this.redoLabel = this.#history.redoLabel;
  }
}
