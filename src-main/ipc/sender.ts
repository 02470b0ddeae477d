/**
 * IPC sender check (Electron security checklist: validate the sender of all IPC messages).
 * A message is trusted only when it comes from a live frame whose document is served by our own app
 * scheme origin; anything else (a frame that navigated away, an iframe from elsewhere, a destroyed frame,
 * a look-alike host such as `wattledger://app.evil`) is refused.
 */
import { APP_HOST, APP_SCHEME } from '../security/app-scheme.ts';

/** The little we read from Electron's `event.senderFrame`. */
export interface SenderFrame {
  url: string;
  /** True when the frame is the top-level frame of its page. */
  isMainFrame: boolean;
}

export function isTrustedSender(frame: SenderFrame | null | undefined): boolean {
  if (!frame || !frame.isMainFrame) return false;
  let url: URL;
  try {
    url = new URL(frame.url);
  } catch {
    return false;
  }
  return url.protocol === `${APP_SCHEME}:` && url.host === APP_HOST && url.username === '' && url.password === '' && url.port === '';
}

/** Navigation is allowed only within our own origin (e.g. a reload); every other target is denied. */
export function isAllowedNavigation(targetUrl: string): boolean {
  return isTrustedSender({ url: targetUrl, isMainFrame: true });
}
