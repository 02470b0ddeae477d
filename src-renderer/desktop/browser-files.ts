/**
 * Browser mode (no Electron runtime): open through a file input, save and export as downloads,
 * recovery snapshots in localStorage, the unsaved marker in the tab title, and the names of the files
 * opened or downloaded (recent-names.ts; what browser mode can and cannot do: shell/BrowserModeNote).
 */
import type { ExportRequest, OpenedFile, SaveOutcome } from '../../shared-model/index.ts';
import type { FileAccess, RecoverySnapshot } from './file-access.ts';
import { recordRecentName, type RecentName } from './recent-names.ts';

export const RECOVERY_KEY = 'wattledger.recovery.v1';

function pickFile(accept = '.json,application/json'): Promise<File | null> {
  return new Promise((resolve) => {
    const input = document.createElement('input');
    input.type = 'file';
    input.accept = accept;
    input.addEventListener('change', () => resolve(input.files?.[0] ?? null), { once: true });
    input.addEventListener('cancel', () => resolve(null), { once: true });
    input.click();
  });
}

export async function readFile(file: File): Promise<OpenedFile> {
  return { path: file.name, name: file.name, text: await file.text() };
}

function download(name: string, blob: Blob): SaveOutcome {
  const url = URL.createObjectURL(blob);
  const link = document.createElement('a');
  link.href = url;
  link.download = name;
  link.rel = 'noopener';
  document.body.append(link);
  link.click();
  link.remove();
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
  return { ok: true, path: name, name };
}

function exportBlob(request: ExportRequest): Blob {
  if (request.encoding === 'utf8') return new Blob([request.content], { type: 'text/plain' });
  const bytes = Uint8Array.from(atob(request.content), (c) => c.charCodeAt(0));
  return new Blob([bytes], { type: 'application/octet-stream' });
}

function storage(): Storage | null {
  try {
    return window.localStorage;
  } catch {
    return null;
  }
}

/** Notes a file's name in browser mode's recent list (shell/BrowserModeNote.svelte). */
function remember(name: string, action: RecentName['action'], kind: RecentName['kind']): void {
  recordRecentName(storage(), { name, action, kind, at: new Date().toISOString() });
}

export function createBrowserFileAccess(): FileAccess {
  return {
    kind: 'browser',
    async open() {
      const file = await pickFile();
      if (file) remember(file.name, 'opened', 'design');
      return file ? readFile(file) : null;
    },
    async openSpreadsheet() {
      const file = await pickFile('.csv,.tsv,.txt,text/csv,text/tab-separated-values,text/plain');
      return file ? readFile(file) : null;
    },
    async save(request) {
      remember(request.suggestedName, 'downloaded', 'design');
      return download(request.suggestedName, new Blob([request.text], { type: 'application/json' }));
    },
    async openLibrary() {
      const file = await pickFile();
      if (file) remember(file.name, 'opened', 'library');
      return file ? readFile(file) : null;
    },
    async openRecentLibrary(path) {
      return { error: `A browser cannot reopen ${path} by its path; open the file again.` };
    },
    async listRecentLibraries() {
      return [];
    },
    async saveLibrary(request) {
      remember(request.suggestedName, 'downloaded', 'library');
      return download(request.suggestedName, new Blob([request.text], { type: 'application/json' }));
    },
    async exportFile(request) {
      return download(request.suggestedName, exportBlob(request));
    },
    async readRecovery() {
      const raw = storage()?.getItem(RECOVERY_KEY);
      if (!raw) return null;
      try {
        const snapshot = JSON.parse(raw) as RecoverySnapshot;
        return typeof snapshot.text === 'string' && typeof snapshot.savedAt === 'string' ? snapshot : null;
      } catch {
        return null;
      }
    },
    async writeRecovery(text) {
      const snapshot: RecoverySnapshot = { text, savedAt: new Date().toISOString() };
      storage()?.setItem(RECOVERY_KEY, JSON.stringify(snapshot));
    },
    async clearRecovery() {
      storage()?.removeItem(RECOVERY_KEY);
    },
    setDocumentState(state) {
      document.title = `${state.dirty ? '● ' : ''}${state.name} — WattLedger`;
    },
    onMenuCommand: () => () => {},
    onOpenFile: () => () => {},
  };
}
