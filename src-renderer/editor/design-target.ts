/**
 * The design document as an edit target: every set is one undo step (keystrokes merge per field); a
 * number being typed is previewed and enters the history on Enter, on leaving the field or after a pause.
 */
import type { Warning } from '../../shared-model/index.ts';
import type { DocumentStore } from '../state/document.svelte.ts';
import { getAt, pathKey } from '../state/paths.ts';
import type { EditTarget } from './edit-target.ts';

/** `warnings`: the shown results' warnings (state/results.svelte.ts), read when a field asks. */
export function designTarget(doc: DocumentStore, warnings: () => readonly Warning[] = () => []): EditTarget {
  return {
    idPrefix: 'design',
    get: (path) => getAt(doc.design, path),
    set: (path, value, label) => doc.edit(path, value, label),
    seal: () => doc.seal(),
    preview: (path, value, label) => doc.preview(path, value, label),
    commit: () => doc.commitPreview(),
    problems: (path) => doc.shownAt(path).own,
    related: (path) => doc.shownAt(path).related,
    cautions: (path) => {
      const key = pathKey(path);
      return warnings().filter((w) => w.path === key).map((w) => w.message);
    },
  };
}
