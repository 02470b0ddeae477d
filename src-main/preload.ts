/**
 * The preload: exposes exactly DesktopApi as `window.wattledger` through contextBridge, and nothing
 * else — ipcRenderer, its events and Electron objects never reach the page. Runs sandboxed, so it is
 * bundled to one CommonJS file whose only require is 'electron' (out/preload/preload.cjs).
 */
import { contextBridge, ipcRenderer, type IpcRendererEvent } from 'electron';
import type { DesktopApi, MenuCommand, OpenedFile } from '../shared-model/index.ts';
import { EVENT_CHANNELS, INVOKE_CHANNELS, SEND_CHANNELS } from './ipc/channels.ts';
import { cleanInvokeError } from './ipc/invoke-error.ts';

async function invoke<T>(channel: string, ...args: unknown[]): Promise<T> {
  try {
    return (await ipcRenderer.invoke(channel, ...args)) as T;
  } catch (error) {
    throw cleanInvokeError(error);
  }
}

function subscribe<T>(channel: string, listener: (value: T) => void): () => void {
  // The event object (which carries the ipcRenderer) is dropped; only the value crosses the bridge.
  const forward = (_event: IpcRendererEvent, value: T): void => listener(value);
  ipcRenderer.on(channel, forward);
  return () => {
    ipcRenderer.removeListener(channel, forward);
  };
}

const desktopApi: DesktopApi = {
  kind: 'electron',
  openDesign: () => invoke(INVOKE_CHANNELS.openDesign),
  openRecent: (path) => invoke(INVOKE_CHANNELS.openRecent, path),
  listRecent: () => invoke(INVOKE_CHANNELS.listRecent),
  saveDesign: (request) => invoke(INVOKE_CHANNELS.saveDesign, request),
  openLibrary: () => invoke(INVOKE_CHANNELS.openLibrary),
  openRecentLibrary: (path) => invoke(INVOKE_CHANNELS.openRecentLibrary, path),
  listRecentLibraries: () => invoke(INVOKE_CHANNELS.listRecentLibraries),
  saveLibrary: (request) => invoke(INVOKE_CHANNELS.saveLibrary, request),
  openSpreadsheet: () => invoke(INVOKE_CHANNELS.openSpreadsheet),
  exportFile: (request) => invoke(INVOKE_CHANNELS.exportFile, request),
  printToPdf: (request) => invoke(INVOKE_CHANNELS.printToPdf, request),
  writeRecovery: (text) => invoke(INVOKE_CHANNELS.writeRecovery, text),
  readRecovery: () => invoke(INVOKE_CHANNELS.readRecovery),
  clearRecovery: () => invoke(INVOKE_CHANNELS.clearRecovery),
  setDocumentState: (state) => ipcRenderer.send(SEND_CHANNELS.setDocumentState, state),
  onMenuCommand: (listener) => subscribe<MenuCommand>(EVENT_CHANNELS.menuCommand, listener),
  onOpenFile: (listener) => subscribe<OpenedFile>(EVENT_CHANNELS.openFile, listener),
};

contextBridge.exposeInMainWorld('wattledger', desktopApi);
