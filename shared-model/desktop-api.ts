/**
 * The one narrow API the Electron preload exposes to the renderer as `window.wattledger`.
 * Types only: the preload implements it, the renderer calls it, main's IPC handlers validate every
 * payload with zod and check the sender. Computation never crosses this boundary: only what needs the
 * operating system (open, save, export, print, recovery, window title).
 * In browser mode (no Electron runtime) `window.wattledger` is absent and the renderer uses browser file
 * input and download instead.
 */

export type MenuCommand =
  | 'new'
  | 'open'
  | 'save'
  | 'save-as'
  | 'export-report'
  | 'print-report'
  | 'undo'
  | 'redo'
  | 'open-library';

export interface OpenedFile {
  path: string;
  /** File name without folders, for the title bar. */
  name: string;
  text: string;
}

export type SaveOutcome =
  | { ok: true; path: string; name: string }
  /** `readOnly`: the file exists but may not be written; the renderer offers Save As. */
  | { ok: false; cancelled: boolean; message: string; readOnly?: boolean };

export interface SaveRequest {
  /** Existing path to overwrite atomically, or null to ask with a native dialog. */
  path: string | null;
  suggestedName: string;
  text: string;
}

export interface ExportRequest {
  suggestedName: string;
  /** Text content (CSV, JSON, HTML) or base64 for binary (PNG). */
  content: string;
  encoding: 'utf8' | 'base64';
  filterName: string;
  extensions: string[];
}

export interface PdfRequest {
  suggestedName: string;
  pageSize: 'A4' | 'Letter';
}

export interface DocumentState {
  /** File name (or "Untitled") shown in the title bar. */
  name: string;
  dirty: boolean;
}

export interface DesktopApi {
  readonly kind: 'electron';
  openDesign(): Promise<OpenedFile | null>;
  openRecent(path: string): Promise<OpenedFile | { error: string }>;
  listRecent(): Promise<string[]>;
  saveDesign(request: SaveRequest): Promise<SaveOutcome>;
  /** Parts library files (design/parts-library.ts): open with a dialog, reopen from their own recent list, save (atomic, with .bak). */
  openLibrary(): Promise<OpenedFile | null>;
  openRecentLibrary(path: string): Promise<OpenedFile | { error: string }>;
  listRecentLibraries(): Promise<string[]>;
  saveLibrary(request: SaveRequest): Promise<SaveOutcome>;
  /** A spreadsheet saved as CSV or tab-separated text, for the part import (read only; not a recent file). */
  openSpreadsheet(): Promise<OpenedFile | null>;
  exportFile(request: ExportRequest): Promise<SaveOutcome>;
  /** Prints the current window (the report view) to a PDF file chosen by the user. */
  printToPdf(request: PdfRequest): Promise<SaveOutcome>;
  writeRecovery(text: string): Promise<void>;
  readRecovery(): Promise<{ text: string; savedAt: string } | null>;
  clearRecovery(): Promise<void>;
  setDocumentState(state: DocumentState): void;
  /** Menu commands and files opened from outside (argument, drag onto the dock, recent list). */
  onMenuCommand(listener: (command: MenuCommand) => void): () => void;
  onOpenFile(listener: (file: OpenedFile) => void): () => void;
}
