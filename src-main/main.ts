/**
 * WattLedger's Electron main process: a list of setup calls, one feature per file in setup/; the logic
 * they use lives in plain modules (security/, ipc/, files/, window/, menu/, launch/) unit-tested with
 * Vitest. Bundled to out/main/main.cjs by `npm run build` (electron.config.ts).
 */
import { app } from 'electron';
import { registerAppScheme, serveAppScheme } from './setup/app-protocol.ts';
import { createContext } from './setup/context.ts';
import { setupIpc, showError } from './setup/ipc.ts';
import { setupLifecycle } from './setup/lifecycle.ts';
import { setupMenu } from './setup/menu.ts';
import { cleanUserDataTemporaries } from './setup/clean-up.ts';
import { connectFileOpening, setupFileOpening } from './setup/open-files.ts';
import { setupSecurity, setupSecurityBeforeReady } from './setup/security.ts';
import { createMainWindow } from './setup/window.ts';

function main(): void {
  // One instance: a second launch forwards its file argument to this one and exits.
  if (!app.requestSingleInstanceLock()) {
    app.quit();
    return;
  }
  const context = createContext(app.getAppPath(), app.getPath('userData'), app.isPackaged);
  setupSecurityBeforeReady();
  registerAppScheme();
  setupFileOpening(context);
  setupLifecycle(context);

  void app.whenReady().then(async () => {
    setupSecurity(context);
    serveAppScheme(context);
    const handlers = setupIpc(context);
    setupMenu(context);
    context.track(cleanUserDataTemporaries(context));
    connectFileOpening(context, handlers.open, (message) => showError(context.window?.webContents ?? null, message));
    await createMainWindow(context);
  });
}

main();
