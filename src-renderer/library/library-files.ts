/**
 * Part libraries as the user's own files (issue 17 §1): open (dialog or recent list in Electron, a file
 * input in a browser), new, save, save as, close. Saving goes through DesktopApi.saveLibrary (atomic,
 * with .bak) or, in a browser, a download. The app's own library is kept in this app's storage; "save a
 * copy" writes it to a file and it stays the app's library.
 */
import type { OpenedFile } from '../../shared-model/index.ts';
import type { Workspace } from '../state/workspace.svelte.ts';

function opened(ws: Workspace, file: OpenedFile): void {
  const result = ws.library.openText(file.text, file);
  if (result.ok) ws.messages.success(result.message);
  else ws.messages.error(result.message, result.details);
}

export async function openLibraryFile(ws: Workspace): Promise<void> {
  try {
    const file = await ws.files.openLibrary();
    if (file) opened(ws, file);
  } catch (error) {
    ws.messages.error('The library file could not be read; nothing was opened.', [(error as Error).message]);
  }
}

export async function openRecentLibraryFile(ws: Workspace, path: string): Promise<void> {
  const file = await ws.files.openRecentLibrary(path).catch((error: Error) => ({ error: error.message }));
  if ('error' in file) ws.messages.error(`The library ${path} could not be opened.`, [file.error]);
  else opened(ws, file);
}

/** A new empty library, shown, with a name not yet taken ("Library 2"...). */
export function newLibrary(ws: Workspace): void {
  const names = new Set(ws.library.books.map((b) => b.library.name));
  let n = ws.library.books.length;
  while (names.has(`Library ${n}`)) n++;
  const book = ws.library.create(`Library ${n}`);
  ws.messages.info(`Created “${book.library.name}”; add or import parts, then save it as a file.`);
}

/** Saves library `libraryId` to its file, or asks where (`as`, a new library, or the app's own library). */
export async function saveLibraryFile(ws: Workspace, libraryId: string, as: boolean): Promise<void> {
  const book = ws.library.book(libraryId);
  if (!book) return;
  const path = book.place.kind === 'file' && !as ? book.place.path : null;
  const suggestedName = book.place.kind === 'file' ? book.place.fileName : `${book.library.id}.json`;
  const outcome = await ws.files
    .saveLibrary({ path, suggestedName, text: ws.library.textOf(libraryId) })
    .catch((error: Error) => ({ ok: false as const, cancelled: false, message: error.message, readOnly: false }));
  if (outcome.ok) {
    ws.library.saved(libraryId, outcome.path, outcome.name);
    ws.messages.success(`Saved “${book.library.name}” (${book.library.parts.length} parts) to ${outcome.name}.`);
  } else if (outcome.readOnly) {
    ws.messages.error(`${suggestedName} may not be written; use “Save as…” to choose another file.`, [outcome.message]);
  } else if (!outcome.cancelled) {
    ws.messages.error(`The library “${book.library.name}” was not saved.`, [outcome.message]);
  }
}

/** Closes a library file; one with unsaved changes only after the user agrees. */
export function closeLibrary(ws: Workspace, libraryId: string, confirm: (question: string) => boolean): void {
  const book = ws.library.book(libraryId);
  if (!book || book.place.kind === 'app') return;
  if (book.dirty && !confirm(`“${book.library.name}” has changes that are not saved. Close it anyway?`)) return;
  ws.library.close(libraryId);
  ws.messages.info(`Closed “${book.library.name}”. Designs keep their own copies of its parts.`);
}
