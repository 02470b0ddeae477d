/**
 * Process-wide security settings (Electron glue; the decisions live in security/*.ts and ipc/sender.ts).
 */
import { app, session, type WebContents } from 'electron';
import { isAllowedNavigation } from '../ipc/sender.ts';
import { isPermissionAllowed } from '../security/permissions.ts';
import type { AppContext } from './context.ts';

/** Must run before the app is ready. */
export function setupSecurityBeforeReady(): void {
  // Every renderer is sandboxed, whatever its options say.
  app.enableSandbox();
  // Rule of the house: everything runs on the CPU (no GPU process work, no WebGL).
  app.disableHardwareAcceleration();
}

function guardContents(context: AppContext, contents: WebContents): void {
  const refuse = (event: { preventDefault(): void }, url: string): void => {
    if (!isAllowedNavigation(url)) {
      event.preventDefault();
      context.log(`navigation to ${url} denied`);
    }
  };
  contents.on('will-navigate', (event, url) => refuse(event, url));
  contents.on('will-frame-navigate', (event) => refuse(event, event.url));
  contents.on('will-redirect', (event, url) => refuse(event, url));
  contents.setWindowOpenHandler(({ url }) => {
    context.log(`new window for ${url} denied`);
    return { action: 'deny' };
  });
  contents.on('will-attach-webview', (event) => event.preventDefault());
}

/** Runs when the app is ready, before any window exists. */
export function setupSecurity(context: AppContext): void {
  app.on('web-contents-created', (_event, contents) => guardContents(context, contents));
  const ses = session.defaultSession;
  ses.setPermissionRequestHandler((contents, permission, callback) => callback(isPermissionAllowed(permission, contents.getURL())));
  ses.setPermissionCheckHandler((_contents, permission, requestingOrigin) => isPermissionAllowed(permission, requestingOrigin));
  ses.setDevicePermissionHandler(() => false);
}
