/**
 * App lifecycle: quit when the last window closes (except on macOS, where apps stay in the Dock),
 * reopen a window from the Dock, and let pending writes (window state, recovery clean-up) finish before
 * the process exits.
 */
import { app, BrowserWindow } from 'electron';
import type { AppContext } from './context.ts';
import { createMainWindow } from './window.ts';

export function setupLifecycle(context: AppContext): void {
  app.on('before-quit', () => {
    context.quitting = true;
  });
  app.on('window-all-closed', () => {
    if (process.platform !== 'darwin' || context.quitting) app.quit();
  });
  app.on('activate', () => {
    if (app.isReady() && BrowserWindow.getAllWindows().length === 0) void createMainWindow(context);
  });
  let flushed = false;
  app.on('will-quit', (event) => {
    if (flushed) return;
    event.preventDefault();
    void context.flushWrites().finally(() => {
      flushed = true;
      app.quit();
    });
  });
}
