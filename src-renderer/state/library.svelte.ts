/**
 * The user's part library: starts with the invented demo parts, then holds whatever the user adds,
 * edits, duplicates, deletes or imports. Kept in localStorage (browser and Electron renderer alike).
 */
import { applyImport, type ImportApplied, type Part, type PartKind } from '../../shared-model/index.ts';
import { duplicatePart, idsOf, libraryFileText, mergeParts, partsOfKind, readLibraryText, uniqueId } from './library-data.ts';

export const LIBRARY_KEY = 'wattledger.library.v1';

function loadStored(): Part[] | null {
  try {
    const text = localStorage.getItem(LIBRARY_KEY);
    if (!text) return null;
    const read = readLibraryText(text, 'the saved library');
    return read.ok ? read.parts : null;
  } catch {
    return null;
  }
}

export class PartLibrary {
  parts: Part[] = $state.raw([]);
  readonly demoParts: readonly Part[];
  /** Set when the saved library could not be written (storage full or refused). */
  storageProblem: string | null = $state(null);

  constructor(demoParts: readonly Part[]) {
    this.demoParts = demoParts;
    this.parts = loadStored() ?? [...demoParts];
  }

  ofKind<K extends PartKind>(kind: K): Extract<Part, { kind: K }>[] {
    return partsOfKind(this.parts, kind);
  }

  find(id: string): Part | undefined {
    return this.parts.find((p) => p.id === id);
  }

  /** Adds a part; its id is made unique. Returns the stored part. */
  add(part: Part): Part {
    const stored = { ...part, id: uniqueId(part.id, idsOf(this.parts)) };
    this.#set([...this.parts, stored]);
    return stored;
  }

  /** Adds imported parts at the end, all of them; ids made unique and every renamed part listed (engine applyImport). */
  addImported(parts: readonly Part[]): ImportApplied {
    const applied = applyImport(this.parts, parts);
    this.#set(applied.parts);
    return applied;
  }

  update(id: string, part: Part): void {
    this.#set(this.parts.map((p) => (p.id === id ? part : p)));
  }

  duplicate(id: string): Part | undefined {
    const source = this.find(id);
    if (!source) return undefined;
    const copy = duplicatePart(source, this.parts);
    const index = this.parts.indexOf(source);
    this.#set([...this.parts.slice(0, index + 1), copy, ...this.parts.slice(index + 1)]);
    return copy;
  }

  remove(id: string): void {
    this.#set(this.parts.filter((p) => p.id !== id));
  }

  /** Imports parts from a JSON file; returns what to tell the user. */
  importText(text: string, fileName: string): { ok: boolean; message: string; details: string[] } {
    const read = readLibraryText(text, fileName);
    if (!read.ok) return read;
    this.#set(mergeParts(this.parts, read.parts));
    const skipped = read.skipped.length > 0 ? `; entries with problems were left out` : '';
    return { ok: true, message: `Imported ${read.parts.length} part${read.parts.length === 1 ? '' : 's'} from ${fileName}${skipped}.`, details: read.skipped };
  }

  exportText(): string {
    return libraryFileText(this.parts);
  }

  /** Puts back any demo part that was deleted (user parts are kept). */
  restoreDemoParts(): number {
    const ids = idsOf(this.parts);
    const missing = this.demoParts.filter((p) => !ids.has(p.id));
    this.#set([...this.parts, ...missing]);
    return missing.length;
  }

  #set(parts: Part[]): void {
    this.parts = parts;
    try {
      localStorage.setItem(LIBRARY_KEY, libraryFileText(parts));
      this.storageProblem = null;
    } catch (error) {
      this.storageProblem = `The part library could not be stored in this browser (${(error as Error).message}); export it to keep your changes.`;
    }
  }
}
