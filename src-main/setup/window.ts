/**
 * The main window: restored size and position, secure options, title from the document state, and the
 * unsaved-changes guard on close (Electron glue around window/*.ts and security/window-options.ts).
 */
import nodePath from 'node:path';
import { app, BrowserWindow, dialog, nativeTheme, screen } from 'electron';
import type { DocumentState, SaveOutcome } from '../../shared-model/index.ts';
import { readJsonFile, writeJsonFile } from '../files/json-file.ts';
import { EVENT_CHANNELS } from '../ipc/channels.ts';
import { APP_ENTRY_URL } from '../security/app-scheme.ts';
import { secureWindowOptions } from '../security/window-options.ts';
import { afterSaveOutcome, applyChoice, choiceFromResponse, onCloseRequested, unsavedChangesDialog } from '../window/close-guard.ts';
import { windowTitle } from '../window/title.ts';
import { restoreWindowState, storedWindowState } from '../window/window-state.ts';
import type { AppContext } from './context.ts';

function stateFile(context: AppContext): string {
  return nodePath.join(context.paths.userData, 'window-state.json');
}

function rememberBounds(context: AppContext, window: BrowserWindow): void {
  const stored = storedWindowState({ bounds: window.getNormalBounds(), maximized: window.isMaximized() });
  context.track(writeJsonFile(context.paths.userData, stateFile(context), stored));
}

export function documentStateChanged(context: AppContext, state: DocumentState): void {
  context.guard = { ...context.guard, document: state };
  const window = context.window;
  if (!window || window.isDestroyed()) return;
  window.setTitle(windowTitle(state));
  if (process.platform === 'darwin') window.setDocumentEdited(state.dirty);
}

/** Called by the saveDesign handler: completes a "save, then close" chosen in the close dialog. */
export function designSaved(context: AppContext, outcome: SaveOutcome): void {
  const closeWasWaiting = context.guard.closeAfterSave;
  const { state, closeNow } = afterSaveOutcome(context.guard, outcome.ok);
  context.guard = state;
  // A cancelled or failed save also cancels the quit it was part of.
  if (closeWasWaiting && !closeNow) context.quitting = false;
  if (closeNow) setImmediate(() => context.window?.close());
}

export function sendToRenderer(context: AppContext, channel: string, value: unknown): void {
  const window = context.window;
  if (window && !window.isDestroyed()) window.webContents.send(channel, value);
}

export async function createMainWindow(context: AppContext): Promise<BrowserWindow> {
  const displays = [screen.getPrimaryDisplay(), ...screen.getAllDisplays()].map((display) => ({ workArea: display.workArea }));
  const state = restoreWindowState(await readJsonFile(stateFile(context)), displays);
  // security-scan-allow SANDBOX_JS_CHECK CONTEXT_ISOLATION_JS_CHECK AUXCLICK_JS_CHECK: the scanner cannot see
  // options built by a function; secureWindowOptions sets sandbox and contextIsolation true and disables
  // Auxclick, each asserted in test/src-main/security/window-options.test.ts.
  const window = new BrowserWindow(
    secureWindowOptions({
      preloadPath: context.paths.preload,
      state,
      devTools: !context.packaged,
      backgroundColor: nativeTheme.shouldUseDarkColors ? '#1e1e1e' : '#ffffff',
    }),
  );
  context.window = window;
  window.setTitle(windowTitle(context.guard.document));
  // The page's <title> must not replace the file name and unsaved marker.
  window.on('page-title-updated', (event) => event.preventDefault());
  window.once('ready-to-show', () => {
    if (state.maximized) window.maximize();
    window.show();
  });

  window.webContents.on('did-finish-load', () => {
    context.rendererLoaded = true;
    for (const file of context.pendingFiles.splice(0)) sendToRenderer(context, EVENT_CHANNELS.openFile, file);
  });
  // After a renderer crash nobody can answer "save?": close without asking and keep the recovery
  // snapshot, which the next start offers to restore.
  let rendererGone = false;
  window.webContents.on('render-process-gone', (_event, details) => {
    rendererGone = details.reason !== 'clean-exit';
    context.log(`renderer ended (${details.reason}); the last recovery snapshot is kept for the next start`);
  });

  let asking = false;
  window.on('close', (event) => {
    if (rendererGone) {
      rememberBounds(context, window);
      return;
    }
    if (onCloseRequested(context.guard) === 'allow') {
      rememberBounds(context, window);
      if (!context.guard.document.dirty || context.guard.closeApproved) context.track(context.recovery.clear());
      return;
    }
    event.preventDefault();
    if (asking) return;
    asking = true;
    void dialog
      .showMessageBox(window, unsavedChangesDialog(context.guard.document, context.quitting))
      .then(({ response }) => {
        const choice = choiceFromResponse(response);
        context.guard = applyChoice(context.guard, choice);
        if (choice === 'discard') window.close();
        else if (choice === 'save') sendToRenderer(context, EVENT_CHANNELS.menuCommand, 'save');
        else context.quitting = false;
      })
      .finally(() => {
        asking = false;
      });
  });
  window.on('closed', () => {
    context.window = null;
    context.rendererLoaded = false;
    if (context.quitting) app.quit();
  });

  await window.loadURL(APP_ENTRY_URL);
  return window;
}
