/**
 * A part being edited in the library as an edit target: changes go to a draft, checked with the
 * engine's parts-library validator on every change; the library itself changes only on "Save changes".
 */
import type { Part, Problem } from '../../shared-model/index.ts';
import { partWordsByPath } from '../editor/problem-words.ts';
import type { EditTarget } from '../editor/edit-target.ts';
import { partProblems } from '../state/library-data.ts';
import { getAt, pathKey, setAt } from '../state/paths.ts';

export class PartDraft {
  part: Part = $state.raw() as Part;
  /** Problems by dotted path. */
  problems: ReadonlyMap<string, Problem[]> = $derived(partProblems(this.part));
  /** The same problems in the part editor's words (field labels, not keys). */
  words: ReadonlyMap<string, string[]> = $derived(partWordsByPath(this.problems, this.part.kind));
  valid = $derived(this.problems.size === 0);
  changed = $state(false);

  constructor(part: Part) {
    this.part = part;
  }

  target(): EditTarget {
    return {
      idPrefix: 'library',
      get: (path) => getAt(this.part, path),
      set: (path, value) => {
        this.part = setAt(this.part, path, value);
        this.changed = true;
      },
      seal: () => {},
      problems: (path) => this.words.get(pathKey(path)) ?? [],
    };
  }
}
