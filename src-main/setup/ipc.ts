/**
 * IPC: one handler per DesktopApi method, each behind the sender check and its payload schema
 * (Electron glue around ipc/handlers.ts and ipc/register.ts).
 */
import nodePath from 'node:path';
import { app, BrowserWindow, dialog, ipcMain, type WebContents } from 'electron';
import { createHandlers, type FileFilter } from '../ipc/handlers.ts';
import { registerInvoke, registerSend, type IpcMainLike } from '../ipc/register.ts';
import type { AppContext } from './context.ts';
import { designSaved, documentStateChanged } from './window.ts';

let lastFolder: string | null = null;

function parentOf(sender: WebContents): BrowserWindow | null {
  return BrowserWindow.fromWebContents(sender);
}

async function chooseFileToOpen(sender: WebContents, filters: FileFilter[]): Promise<string | null> {
  const parent = parentOf(sender);
  const options = { properties: ['openFile' as const], filters, ...(lastFolder ? { defaultPath: lastFolder } : {}) };
  const result = parent ? await dialog.showOpenDialog(parent, options) : await dialog.showOpenDialog(options);
  const chosen = result.canceled ? null : (result.filePaths[0] ?? null);
  if (chosen) lastFolder = nodePath.dirname(chosen);
  return chosen;
}

async function chooseSavePath(sender: WebContents, suggestedName: string, filters: FileFilter[]): Promise<string | null> {
  const parent = parentOf(sender);
  const options = { defaultPath: nodePath.join(lastFolder ?? app.getPath('documents'), suggestedName), filters };
  const result = parent ? await dialog.showSaveDialog(parent, options) : await dialog.showSaveDialog(options);
  const chosen = result.canceled || !result.filePath ? null : result.filePath;
  if (chosen) lastFolder = nodePath.dirname(chosen);
  return chosen;
}

export async function showError(sender: WebContents | null, message: string): Promise<void> {
  const parent = sender ? parentOf(sender) : null;
  const options = { type: 'error' as const, message, buttons: ['OK'], noLink: true };
  await (parent ? dialog.showMessageBox(parent, options) : dialog.showMessageBox(options));
}

export function setupIpc(context: AppContext): ReturnType<typeof createHandlers<WebContents>> {
  const handlers = createHandlers<WebContents>({
    chooseFileToOpen,
    chooseSavePath,
    showError,
    printPage: async (sender, request) =>
      new Uint8Array(await sender.printToPDF({ pageSize: request.pageSize, printBackground: true, preferCSSPageSize: true, generateDocumentOutline: false })),
    grants: context.grants,
    recent: context.recent,
    recentLibraries: context.recentLibraries,
    recovery: context.recovery,
    designSaved: (_sender, outcome) => designSaved(context, outcome),
    documentStateChanged: (_sender, state) => documentStateChanged(context, state),
    recentChanged: (list) => context.rebuildMenu(list),
  });
  const ipc: IpcMainLike<WebContents> = ipcMain;
  const { invoke, send } = handlers.routes();
  registerInvoke(ipc, invoke, context.log);
  registerSend(ipc, send, context.log);
  return handlers;
}
