/**
 * What each DesktopApi call does in main. Everything the operating system provides (dialogs, printing,
 * the files on disk) comes in through `HandlerDeps`, so these handlers are unit-tested with fakes and
 * real temporary folders. The handlers trust their arguments' shapes (register.ts has validated them)
 * but not their meaning: a path the user never picked is refused.
 */
import nodePath from 'node:path';
import type { DocumentState, ExportRequest, OpenedFile, PdfRequest, SaveOutcome, SaveRequest } from '../../shared-model/index.ts';
import { saveAtomically, type SaveFs } from '../files/atomic-save.ts';
import { SerialQueue } from '../files/serial-queue.ts';
import { readTextFile, type ReadFs } from '../files/read-text.ts';
import type { GrantedPaths } from '../files/granted-paths.ts';
import type { RecentFiles } from '../files/recent-files.ts';
import type { RecoveryStore } from '../files/recovery.ts';
import { INVOKE_CHANNELS, SEND_CHANNELS } from './channels.ts';
import { INVOKE_PAYLOADS, SEND_PAYLOADS } from './payloads.ts';
import type { Route } from './register.ts';

export interface FileFilter {
  name: string;
  extensions: string[];
}

export const DESIGN_FILTERS: FileFilter[] = [{ name: 'WattLedger design', extensions: ['json'] }];
export const LIBRARY_FILTERS: FileFilter[] = [{ name: 'WattLedger parts library', extensions: ['json'] }];
export const SPREADSHEET_FILTERS: FileFilter[] = [{ name: 'Spreadsheet as CSV or tab-separated text', extensions: ['csv', 'tsv', 'txt'] }];

export interface HandlerDeps<S> {
  chooseFileToOpen(sender: S, filters: FileFilter[]): Promise<string | null>;
  chooseSavePath(sender: S, suggestedName: string, filters: FileFilter[]): Promise<string | null>;
  showError(sender: S, message: string): Promise<void>;
  /** Renders the sender's page to PDF bytes. */
  printPage(sender: S, request: PdfRequest): Promise<Uint8Array>;
  grants: GrantedPaths;
  recent: Pick<RecentFiles, 'list' | 'add' | 'remove' | 'has'>;
  /** The recent parts libraries: a list of its own, so designs and libraries do not crowd each other out. */
  recentLibraries: Pick<RecentFiles, 'list' | 'add' | 'remove' | 'has'>;
  recovery: Pick<RecoveryStore, 'write' | 'read' | 'clear'>;
  /** Called after every design save attempt (title, close-after-save, menu). */
  designSaved(sender: S, outcome: SaveOutcome): void;
  documentStateChanged(sender: S, state: DocumentState): void;
  /** The recent list changed (rebuild the menu). */
  recentChanged(list: string[]): void;
  saveFs?: SaveFs;
  readFs?: ReadFs;
}

const UNSAVED_NOTE = 'Your changes are still open and unsaved.';

function withExtension(name: string, extension: string): string {
  return nodePath.extname(name).toLowerCase() === `.${extension.toLowerCase()}` ? name : `${name}.${extension}`;
}

export function createHandlers<S>(deps: HandlerDeps<S>) {
  const saveFs = deps.saveFs ? { fs: deps.saveFs } : {};
  /** Every write of a user's file, one after another in the order asked (the newest edit lands last). */
  const writes = new SerialQueue();

  /** Writes a file the user chose, after any write still running; the outcome says read-only. */
  async function writeUserFile(target: string, data: string | Uint8Array, backup: boolean): Promise<SaveOutcome> {
    const result = await writes.run(() => saveAtomically(target, data, { backup, ...saveFs }));
    if (result.ok) return { ok: true, path: target, name: nodePath.basename(target) };
    return result.readOnly ? { ok: false, cancelled: false, readOnly: true, message: result.message } : { ok: false, cancelled: false, message: result.message };
  }

  /** A spreadsheet is only read: it is neither granted for writing nor listed as recent. */
  type Kind = 'design' | 'library' | 'spreadsheet';
  const recentOf = (kind: Kind) => (kind === 'design' ? deps.recent : deps.recentLibraries);

  /** A path enters the grants and a recent list only here: after the user opened or saved it. */
  async function remember(path: string, kind: Kind = 'design'): Promise<void> {
    if (kind === 'spreadsheet') return;
    deps.grants.grant(path);
    const list = await recentOf(kind).add(path);
    if (kind === 'design') deps.recentChanged(list);
  }

  async function open(path: string, kind: Kind = 'design'): Promise<OpenedFile | { error: string }> {
    const read = await readTextFile(path, deps.readFs);
    if (!read.ok) return { error: read.message };
    await remember(path, kind);
    return { path: read.path, name: read.name, text: read.text };
  }

  async function openChosen(sender: S, filters: FileFilter[], kind: Kind): Promise<OpenedFile | null> {
    const path = await deps.chooseFileToOpen(sender, filters);
    if (path === null) return null;
    const opened = await open(path, kind);
    if ('error' in opened) {
      await deps.showError(sender, opened.error);
      return null;
    }
    return opened;
  }

  async function openFromRecent(path: string, kind: Kind): Promise<OpenedFile | { error: string }> {
    const recent = recentOf(kind);
    if (!(await recent.has(path))) return { error: `"${nodePath.basename(path)}" is not in the recent ${kind === 'design' ? 'files' : 'libraries'} list.` };
    const opened = await open(path, kind);
    if ('error' in opened) {
      const list = await recent.remove(path);
      if (kind === 'design') deps.recentChanged(list);
    }
    return opened;
  }

  /**
   * Saves a document (design, or any other kind a caller passes filters for): to `request.path` when the
   * user opened or chose it in this session, else to a path chosen in the save dialog; a failure keeps
   * the edit open and says so. Reusable for other document kinds (part libraries).
   */
  async function saveDocument(sender: S, request: SaveRequest, filters: FileFilter[], extension: string, kind: Kind = 'design'): Promise<SaveOutcome> {
    let target = request.path;
    if (target !== null && !deps.grants.has(target)) {
      return { ok: false, cancelled: false, message: `Refused to save to "${nodePath.basename(target)}": WattLedger only writes files you opened or chose in this session. Use Save As.` };
    }
    target ??= await deps.chooseSavePath(sender, withExtension(request.suggestedName, extension), filters);
    if (target === null) return { ok: false, cancelled: true, message: 'Save cancelled.' };
    const outcome = await writeUserFile(target, request.text, true);
    if (!outcome.ok) return { ...outcome, message: `${outcome.message} ${UNSAVED_NOTE}` };
    await remember(target, kind);
    return outcome;
  }

  async function saveChosen(sender: S, suggestedName: string, filters: FileFilter[], data: string | Uint8Array): Promise<SaveOutcome> {
    const target = await deps.chooseSavePath(sender, suggestedName, filters);
    if (target === null) return { ok: false, cancelled: true, message: 'Export cancelled.' };
    return writeUserFile(target, data, false);
  }

  const invoke = {
    /** A file that cannot be read is reported in a native error box (the contract returns null). */
    openDesign: (sender: S): Promise<OpenedFile | null> => openChosen(sender, DESIGN_FILTERS, 'design'),
    openRecent: (_sender: S, path: string): Promise<OpenedFile | { error: string }> => openFromRecent(path, 'design'),
    /** The list only: a recent path becomes writable when it is opened again (openRecent), not by being listed. */
    listRecent: (): Promise<string[]> => deps.recent.list(),
    async saveDesign(sender: S, request: SaveRequest): Promise<SaveOutcome> {
      const outcome = await saveDocument(sender, request, DESIGN_FILTERS, 'json');
      if (outcome.ok) await deps.recovery.clear().catch(() => undefined);
      deps.designSaved(sender, outcome);
      return outcome;
    },
    /** Parts libraries: the same safe reads and atomic writes as designs, with their own recent list. */
    openLibrary: (sender: S): Promise<OpenedFile | null> => openChosen(sender, LIBRARY_FILTERS, 'library'),
    openRecentLibrary: (_sender: S, path: string): Promise<OpenedFile | { error: string }> => openFromRecent(path, 'library'),
    listRecentLibraries: (): Promise<string[]> => deps.recentLibraries.list(),
    saveLibrary: (sender: S, request: SaveRequest): Promise<SaveOutcome> => saveDocument(sender, request, LIBRARY_FILTERS, 'json', 'library'),
    openSpreadsheet: (sender: S): Promise<OpenedFile | null> => openChosen(sender, SPREADSHEET_FILTERS, 'spreadsheet'),
    async exportFile(sender: S, request: ExportRequest): Promise<SaveOutcome> {
      const data = request.encoding === 'base64' ? new Uint8Array(Buffer.from(request.content, 'base64')) : request.content;
      const name = withExtension(request.suggestedName, request.extensions[0] ?? 'txt');
      return saveChosen(sender, name, [{ name: request.filterName, extensions: request.extensions }], data);
    },
    async printToPdf(sender: S, request: PdfRequest): Promise<SaveOutcome> {
      const target = await deps.chooseSavePath(sender, withExtension(request.suggestedName, 'pdf'), [{ name: 'PDF document', extensions: ['pdf'] }]);
      if (target === null) return { ok: false, cancelled: true, message: 'Print to PDF cancelled.' };
      let pdf: Uint8Array;
      try {
        pdf = await deps.printPage(sender, request);
      } catch (error) {
        return { ok: false, cancelled: false, message: `Could not print the report to PDF: ${error instanceof Error ? error.message : String(error)}.` };
      }
      return writeUserFile(target, pdf, false);
    },
    async writeRecovery(_sender: S, text: string): Promise<void> {
      const result = await deps.recovery.write(text);
      if (!result.ok) throw new Error(result.message);
    },
    readRecovery: (): Promise<{ text: string; savedAt: string } | null> => deps.recovery.read(),
    clearRecovery: (): Promise<void> => deps.recovery.clear(),
  };

  const send = {
    setDocumentState(sender: S, state: DocumentState): void {
      deps.documentStateChanged(sender, state);
    },
  };

  /** Routes for register.ts: every DesktopApi method, its channel, its schema, its handler. */
  function routes(): { invoke: Route<S>[]; send: Route<S>[] } {
    const invokeRoutes = (Object.keys(INVOKE_CHANNELS) as (keyof typeof INVOKE_CHANNELS)[]).map((method) => ({
      method,
      channel: INVOKE_CHANNELS[method],
      schema: INVOKE_PAYLOADS[method],
      run: (sender: S, args: never[]) => (invoke[method] as (sender: S, ...rest: never[]) => unknown)(sender, ...args),
    }));
    const sendRoutes = [{ method: 'setDocumentState', channel: SEND_CHANNELS.setDocumentState, schema: SEND_PAYLOADS.setDocumentState, run: (sender: S, args: never[]) => send.setDocumentState(sender, args[0] as DocumentState) }];
    return { invoke: invokeRoutes, send: sendRoutes };
  }

  return { invoke, send, routes, open, saveDocument, writeUserFile };
}
