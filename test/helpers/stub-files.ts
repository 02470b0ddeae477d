/**
 * A desktop adapter (src-renderer/desktop/file-access.ts) that opens nothing, cancels every save and
 * export and keeps no recovery snapshot; a test overrides only what it watches.
 */
import type { OpenedFile, SaveOutcome } from '../../shared-model/index.ts';
import type { FileAccess } from '../../src-renderer/desktop/file-access.ts';

const cancelled = async (): Promise<SaveOutcome> => ({ ok: false, cancelled: true, message: '' });
const nothing = async (): Promise<OpenedFile | null> => null;

export function stubFiles<T extends Partial<FileAccess>>(overrides: T): FileAccess & T {
  return {
    kind: 'electron',
    open: nothing,
    openSpreadsheet: nothing,
    openLibrary: nothing,
    openRecentLibrary: async (path: string) => ({ error: `no ${path}` }),
    listRecentLibraries: async () => [],
    save: cancelled,
    saveLibrary: cancelled,
    exportFile: cancelled,
    readRecovery: async () => null,
    writeRecovery: async () => undefined,
    clearRecovery: async () => undefined,
    setDocumentState: () => undefined,
    onMenuCommand: () => () => undefined,
    onOpenFile: () => () => undefined,
    ...overrides,
  };
}
