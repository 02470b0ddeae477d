import { describe, expect, it } from 'vitest';
import { isPermissionAllowed } from '../../../src-main/security/permissions.ts';

describe('isPermissionAllowed()', () => {
  it('denies every device, location and notification permission, even to our own page', () => {
    const denied = ['media', 'geolocation', 'notifications', 'midi', 'midiSysex', 'pointerLock', 'fullscreen', 'openExternal', 'clipboard-read', 'hid', 'serial', 'usb', 'display-capture'];
    for (const permission of denied) {
      expect(isPermissionAllowed(permission, 'wattledger://app/index.html'), permission).toBe(false); // Electron checklist "Handle session permission requests from remote content" [from memory]
    }
  });

  it('allows clipboard writing only from the app origin', () => {
    expect(isPermissionAllowed('clipboard-sanitized-write', 'wattledger://app/index.html')).toBe(true); // Electron session permission names [from memory]; needed for "copy chart"
    expect(isPermissionAllowed('clipboard-sanitized-write', 'https://example.com/')).toBe(false);
    expect(isPermissionAllowed('clipboard-sanitized-write', 'file:///tmp/x.html')).toBe(false);
  });
});
