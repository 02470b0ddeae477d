/**
 * IPC channel names, declared once for main and preload. One channel per DesktopApi method;
 * the type checks below fail to compile if a method is added to DesktopApi without a channel.
 */
import type { DesktopApi } from '../../shared-model/index.ts';

type Method = Exclude<keyof DesktopApi, 'kind'>;
/** Methods the renderer calls and awaits (ipcRenderer.invoke ↔ ipcMain.handle). */
export type InvokeMethod = Exclude<Method, 'setDocumentState' | 'onMenuCommand' | 'onOpenFile'>;
/** Methods the renderer fires without an answer (ipcRenderer.send ↔ ipcMain.on). */
export type SendMethod = 'setDocumentState';

export const INVOKE_CHANNELS = {
  openDesign: 'wattledger:open-design',
  openRecent: 'wattledger:open-recent',
  listRecent: 'wattledger:list-recent',
  saveDesign: 'wattledger:save-design',
  openLibrary: 'wattledger:open-library',
  openRecentLibrary: 'wattledger:open-recent-library',
  listRecentLibraries: 'wattledger:list-recent-libraries',
  saveLibrary: 'wattledger:save-library',
  openSpreadsheet: 'wattledger:open-spreadsheet',
  exportFile: 'wattledger:export-file',
  printToPdf: 'wattledger:print-to-pdf',
  writeRecovery: 'wattledger:write-recovery',
  readRecovery: 'wattledger:read-recovery',
  clearRecovery: 'wattledger:clear-recovery',
} as const satisfies Record<InvokeMethod, string>;

export const SEND_CHANNELS = {
  setDocumentState: 'wattledger:document-state',
} as const satisfies Record<SendMethod, string>;

/** Main → renderer events. */
export const EVENT_CHANNELS = {
  menuCommand: 'wattledger:menu-command',
  openFile: 'wattledger:open-file',
} as const;
