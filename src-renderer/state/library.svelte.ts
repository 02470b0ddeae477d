/**
 * The open part libraries (issue 17 §1). The first is the app's own library, kept in localStorage
 * (browser and Electron renderer alike) and started from the invented demo parts; the others are the
 * user's library files, opened, created or saved as documents of their own (shared-model/design/
 * parts-library.ts). One of them is shown in the library screen (`shown`); the part commands
 * (add, edit, duplicate, delete, import) act on it. Designs link their parts to a library by its id.
 */
import { applyImport, freeId, idFromName, parsePartsLibraryText, serializePartsLibrary } from '../../shared-model/index.ts';
import type { ImportApplied, Part, PartKind, PartsLibrary } from '../../shared-model/index.ts';
import { APP_LIBRARY, duplicatePart, idsOf, libraryFileText, mergeParts, partsOfKind, readLibraryText, uniqueId } from './library-data.ts';

export const LIBRARY_KEY = 'wattledger.library.v1';

/** One open library: the document, where it lives, and whether it has changes not yet saved to its file. */
export interface LibraryBook {
  library: PartsLibrary;
  /** `app`: kept in this app's storage; `file`: a file (path null until first saved). */
  place: { kind: 'app' } | { kind: 'file'; path: string | null; fileName: string };
  dirty: boolean;
}

export type LibraryOpened = { ok: true; book: LibraryBook; message: string } | { ok: false; message: string; details: string[] };

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
  books: LibraryBook[] = $state.raw([]);
  /** Id of the library the library screen shows and the part commands change. */
  shownId: string = $state(APP_LIBRARY.id);
  readonly demoParts: readonly Part[];
  /** Set when the app's library could not be written (storage full or refused). */
  storageProblem: string | null = $state(null);

  constructor(demoParts: readonly Part[]) {
    this.demoParts = demoParts;
    this.books = [{ library: { ...APP_LIBRARY, parts: loadStored() ?? [...demoParts] }, place: { kind: 'app' }, dirty: false }];
  }

  get shown(): LibraryBook {
    return this.books.find((b) => b.library.id === this.shownId) ?? this.books[0]!;
  }

  /** Every open library document, for the design's link status. */
  get libraries(): PartsLibrary[] {
    return this.books.map((b) => b.library);
  }

  get parts(): Part[] {
    return this.shown.library.parts;
  }

  book(libraryId: string): LibraryBook | undefined {
    return this.books.find((b) => b.library.id === libraryId);
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

  /** Adds the parts of a JSON file to the shown library; returns what to tell the user. */
  importText(text: string, fileName: string): { ok: boolean; message: string; details: string[] } {
    const read = readLibraryText(text, fileName);
    if (!read.ok) return read;
    this.#set(mergeParts(this.parts, read.parts));
    const skipped = read.skipped.length > 0 ? `; entries with problems were left out` : '';
    return { ok: true, message: `Imported ${read.parts.length} part${read.parts.length === 1 ? '' : 's'} from ${fileName} into “${this.shown.library.name}”${skipped}.`, details: read.skipped };
  }

  /** The shown library as a file (the app's library under its own id and name). */
  exportText(): string {
    return this.textOf(this.shown.library.id);
  }

  /** Puts back any demo part that was deleted from the shown library (other parts are kept). */
  restoreDemoParts(): number {
    const ids = idsOf(this.parts);
    const missing = this.demoParts.filter((p) => !ids.has(p.id));
    this.#set([...this.parts, ...missing]);
    return missing.length;
  }

  /**
   * Opens a library file as a library of its own (validated and migrated by the engine) and shows it.
   * The same file opened again is read again; another library with the same id is refused, because
   * designs tell libraries apart by id.
   */
  openText(text: string, file: { path: string; name: string }): LibraryOpened {
    const read = parsePartsLibraryText(text);
    if (!read.ok) return { ok: false, message: `${file.name} is not a part library WattLedger can read, so nothing was opened.`, details: read.problems.map((p) => p.message) };
    const library = read.library;
    const existing = this.book(library.id);
    const samePath = existing?.place.kind === 'file' && existing.place.path === file.path;
    if (existing && !samePath) {
      return { ok: false, message: `${file.name} holds the library “${library.name}” with the id “${library.id}”, which the open library “${existing.library.name}” already has; close that one first (designs tell libraries apart by id).`, details: [] };
    }
    const book: LibraryBook = { library, place: { kind: 'file', path: file.path, fileName: file.name }, dirty: false };
    this.books = existing ? this.books.map((b) => (b === existing ? book : b)) : [...this.books, book];
    this.shownId = library.id;
    const notes = read.notices.map((n) => n.message);
    return { ok: true, book, message: `Opened “${library.name}” (${library.parts.length} part${library.parts.length === 1 ? '' : 's'}) from ${file.name}${notes.length > 0 ? '; ' + notes.join(' ') : ''}.` };
  }

  /** A new empty library file (not yet saved), shown. */
  create(name: string): LibraryBook {
    const id = freeId(idFromName(name), idsOf(this.libraries));
    const book: LibraryBook = { library: { ...APP_LIBRARY, id, name, notes: '', parts: [] }, place: { kind: 'file', path: null, fileName: `${id}.json` }, dirty: true };
    this.books = [...this.books, book];
    this.shownId = id;
    return book;
  }

  /** Closes a library file (the app's own library stays open). */
  close(libraryId: string): void {
    const book = this.book(libraryId);
    if (!book || book.place.kind === 'app') return;
    this.books = this.books.filter((b) => b !== book);
    if (this.shownId === libraryId) this.shownId = this.books[0]!.library.id;
  }

  /** Records that a library was written to `path` (a file library becomes clean and takes the path). */
  saved(libraryId: string, path: string, fileName: string): void {
    this.books = this.books.map((b) => (b.library.id === libraryId && b.place.kind === 'file' ? { ...b, place: { kind: 'file', path, fileName }, dirty: false } : b));
  }

  /** The canonical text of an open library (engine serializePartsLibrary). */
  textOf(libraryId: string): string {
    const library = this.book(libraryId)?.library ?? this.shown.library;
    const written = serializePartsLibrary(library);
    return written.ok ? written.text : libraryFileText(library.parts, library);
  }

  #set(parts: Part[]): void {
    const shown = this.shown;
    const next: LibraryBook = { ...shown, library: { ...shown.library, parts }, dirty: shown.place.kind === 'file' };
    this.books = this.books.map((b) => (b === shown ? next : b));
    if (shown.place.kind !== 'app') return;
    try {
      localStorage.setItem(LIBRARY_KEY, libraryFileText(parts));
      this.storageProblem = null;
    } catch (error) {
      this.storageProblem = `The part library could not be stored in this browser (${(error as Error).message}); save it as a file to keep your changes.`;
    }
  }
}
