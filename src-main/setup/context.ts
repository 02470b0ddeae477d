/**
 * State shared by the setup functions of the main process: the window, the document state the
 * renderer reports, the close guard, and the stores. Created once in main.ts.
 */
import nodePath from 'node:path';
import type { BrowserWindow } from 'electron';
import type { OpenedFile } from '../../shared-model/index.ts';
import { GrantedPaths } from '../files/granted-paths.ts';
import { RecentFiles } from '../files/recent-files.ts';
import { RecoveryStore } from '../files/recovery.ts';
import { initialCloseGuard, type CloseGuardState } from '../window/close-guard.ts';

export interface AppPaths {
  /** Folder holding package.json (app.getAppPath(): the repo in development, app.asar when packaged). */
  appRoot: string;
  rendererRoot: string;
  preload: string;
  userData: string;
}

export interface AppContext {
  paths: AppPaths;
  packaged: boolean;
  window: BrowserWindow | null;
  guard: CloseGuardState;
  /** app.quit() was requested; the window close is part of quitting. */
  quitting: boolean;
  grants: GrantedPaths;
  recent: RecentFiles;
  recentLibraries: RecentFiles;
  recovery: RecoveryStore;
  /** Paths opened from outside before the IPC handlers existed. */
  queuedPaths: string[];
  /** Files to hand to the renderer once its page has loaded. */
  pendingFiles: OpenedFile[];
  rendererLoaded: boolean;
  /** Opens a file picked outside the renderer (argument, dock, recent menu) and delivers it. */
  openFromOutside: (path: string) => Promise<void>;
  rebuildMenu: (recent: string[]) => void;
  /** Writes that must finish before the process exits. */
  track: (work: Promise<unknown>) => void;
  flushWrites: () => Promise<void>;
  log: (message: string) => void;
}

export function createContext(appRoot: string, userData: string, packaged: boolean): AppContext {
  const pending = new Set<Promise<unknown>>();
  return {
    paths: {
      appRoot,
      rendererRoot: nodePath.join(appRoot, 'out', 'renderer'),
      preload: nodePath.join(appRoot, 'out', 'preload', 'preload.cjs'),
      userData,
    },
    packaged,
    window: null,
    guard: initialCloseGuard(),
    quitting: false,
    grants: new GrantedPaths(),
    recent: new RecentFiles(userData),
    recentLibraries: new RecentFiles(userData, { fileName: 'recent-libraries.json' }),
    recovery: new RecoveryStore(userData),
    queuedPaths: [],
    pendingFiles: [],
    rendererLoaded: false,
    openFromOutside: async () => undefined,
    rebuildMenu: () => undefined,
    track(work) {
      const settled = work.catch(() => undefined).finally(() => pending.delete(settled));
      pending.add(settled);
    },
    async flushWrites() {
      await Promise.allSettled([...pending]);
    },
    log: (message) => console.warn(`[wattledger] ${message}`),
  };
}
