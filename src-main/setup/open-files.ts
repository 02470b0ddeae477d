/**
 * Files opened from outside the window: the command-line argument, a second launch (its arguments are
 * forwarded to this instance), macOS's open-file (drag onto the Dock icon, Finder), and the recent
 * menu. Each is read in main and handed to the renderer through onOpenFile; a read error is shown in a
 * native error box. Dropping a file INTO the window is the renderer's (it reads the File object);
 * main only makes sure such a drop can never navigate the page (navigateOnDragDrop off, navigation denied).
 */
import { app } from 'electron';
import type { OpenedFile } from '../../shared-model/index.ts';
import { designFileFromArgv } from '../launch/argv.ts';
import { EVENT_CHANNELS } from '../ipc/channels.ts';
import type { AppContext } from './context.ts';
import { sendToRenderer } from './window.ts';

type Opener = (path: string) => Promise<OpenedFile | { error: string }>;

/** Must run before the app is ready (open-file can arrive during launch on macOS). */
export function setupFileOpening(context: AppContext): void {
  // Until the handlers exist, paths wait in a queue (connectFileOpening drains it).
  context.openFromOutside = async (path) => {
    context.queuedPaths.push(path);
  };
  const argvFile = designFileFromArgv(process.argv, { packaged: context.packaged, cwd: process.cwd() });
  if (argvFile) context.queuedPaths.push(argvFile);

  app.on('open-file', (event, path) => {
    event.preventDefault();
    void context.openFromOutside(path);
  });
  app.on('second-instance', (_event, argv, workingDirectory) => {
    const window = context.window;
    if (window) {
      if (window.isMinimized()) window.restore();
      window.focus();
    }
    const path = designFileFromArgv(argv, { packaged: context.packaged, cwd: workingDirectory });
    if (path) void context.openFromOutside(path);
  });
}

/** Connects outside openings to the IPC handlers' reader once they exist. */
export function connectFileOpening(context: AppContext, open: Opener, showError: (message: string) => Promise<void>): void {
  context.openFromOutside = async (path) => {
    const opened = await open(path);
    if ('error' in opened) {
      await showError(opened.error);
      context.rebuildMenu(await context.recent.remove(path));
      return;
    }
    if (context.rendererLoaded) sendToRenderer(context, EVENT_CHANNELS.openFile, opened);
    else context.pendingFiles.push(opened);
  };
  for (const path of context.queuedPaths.splice(0)) void context.openFromOutside(path);
}
