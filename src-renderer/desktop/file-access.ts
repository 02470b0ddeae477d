/**
 * What the renderer needs from the operating system, in one interface with two implementations:
 * the Electron preload API (window.wattledger, contract in shared-model/desktop-api.ts) or, in a plain
 * browser, a file input, a download and localStorage.
 */
import type {
  DocumentState,
  ExportRequest,
  MenuCommand,
  OpenedFile,
  SaveOutcome,
  SaveRequest,
} from '../../shared-model/index.ts';
import { createBrowserFileAccess } from './browser-files.ts';

export interface RecoverySnapshot {
  text: string;
  /** ISO 8601 time the snapshot was written. */
  savedAt: string;
}

export interface FileAccess {
  readonly kind: 'electron' | 'browser';
  /** Asks the user for a design file; null when cancelled. */
  open(): Promise<OpenedFile | null>;
  /** Asks the user for a spreadsheet saved as CSV or tab-separated text; null when cancelled. */
  openSpreadsheet(): Promise<OpenedFile | null>;
  /** Saves to request.path (Electron, atomically) or asks / downloads. */
  save(request: SaveRequest): Promise<SaveOutcome>;
  /** Part library files: open with a dialog (browser: a file input), reopen a recent one, save (browser: a download). */
  openLibrary(): Promise<OpenedFile | null>;
  openRecentLibrary(path: string): Promise<OpenedFile | { error: string }>;
  /** Recently used library files, newest first (always empty in a browser, which cannot reopen a path). */
  listRecentLibraries(): Promise<string[]>;
  saveLibrary(request: SaveRequest): Promise<SaveOutcome>;
  exportFile(request: ExportRequest): Promise<SaveOutcome>;
  readRecovery(): Promise<RecoverySnapshot | null>;
  writeRecovery(text: string): Promise<void>;
  clearRecovery(): Promise<void>;
  setDocumentState(state: DocumentState): void;
  onMenuCommand(listener: (command: MenuCommand) => void): () => void;
  onOpenFile(listener: (file: OpenedFile) => void): () => void;
}

export function createFileAccess(): FileAccess {
  const api = typeof window === 'undefined' ? undefined : window.wattledger;
  if (!api) return createBrowserFileAccess();
  return {
    kind: 'electron',
    open: () => api.openDesign(),
    openSpreadsheet: () => api.openSpreadsheet(),
    save: (request) => api.saveDesign(request),
    openLibrary: () => api.openLibrary(),
    openRecentLibrary: (path) => api.openRecentLibrary(path),
    listRecentLibraries: () => api.listRecentLibraries(),
    saveLibrary: (request) => api.saveLibrary(request),
    exportFile: (request) => api.exportFile(request),
    readRecovery: () => api.readRecovery(),
    writeRecovery: (text) => api.writeRecovery(text),
    clearRecovery: () => api.clearRecovery(),
    setDocumentState: (state) => api.setDocumentState(state),
    onMenuCommand: (listener) => api.onMenuCommand(listener),
    onOpenFile: (listener) => api.onOpenFile(listener),
  };
}
