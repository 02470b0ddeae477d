/**
 * Permission requests from web content (camera, microphone, geolocation, notifications, MIDI, HID,
 * clipboard reading, …) are all denied: WattLedger needs none of them. The single exception is
 * writing to the clipboard (`clipboard-sanitized-write`) from our own page, which "copy chart as PNG"
 * uses; writing cannot read anything back and still needs a user gesture.
 */
import { isTrustedSender } from '../ipc/sender.ts';

export const ALLOWED_PERMISSIONS: readonly string[] = ['clipboard-sanitized-write'];

export function isPermissionAllowed(permission: string, requestingUrl: string): boolean {
  return ALLOWED_PERMISSIONS.includes(permission) && isTrustedSender({ url: requestingUrl, isMainFrame: true });
}
