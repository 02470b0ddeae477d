/**
 * What a field component edits: the design document (through the undo history) or a part being
 * edited in the library. Paths are absolute within the target.
 */
import type { Path } from '../state/paths.ts';

export interface EditTarget {
  /** Prefix that keeps element ids unique when two targets are on screen. */
  readonly idPrefix: string;
  get(path: Path): unknown;
  set(path: Path, value: unknown, label: string): void;
  /** The user left a field: the next keystroke starts a new undo step. */
  seal(): void;
  /**
   * A half-typed value: shown (draft, problems, results) but not yet in the history; `commit` (or
   * `seal`, or another edit) takes it. Targets without a preview take every value at once.
   */
  preview?(path: Path, value: unknown, label: string): void;
  /** The user means the previewed value (Enter or a pause): it enters the history. */
  commit?(): void;
  /** Validation sentences for exactly this field. */
  problems(path: Path): string[];
  /** Labels of fields whose problem concerns this field too (a rule relating two fields). */
  related?(path: Path): string[];
  /** Warnings of the shown results about exactly this field (a curve read outside its table). */
  cautions?(path: Path): string[];
}

export function fieldId(target: EditTarget, path: Path): string {
  return `${target.idPrefix}-${path.join('-')}`.replace(/[^A-Za-z0-9_-]/g, '_');
}
