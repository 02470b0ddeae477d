import { describe, expect, it } from 'vitest';
import { isAllowedNavigation, isTrustedSender } from '../../../src-main/ipc/sender.ts';

describe('isTrustedSender()', () => {
  it('trusts the main frame of our own app origin', () => {
    expect(isTrustedSender({ url: 'wattledger://app/index.html', isMainFrame: true })).toBe(true); // Electron checklist "Validate the sender of all IPC messages" [from memory]
    expect(isTrustedSender({ url: 'wattledger://app/index.html#/compare', isMainFrame: true })).toBe(true);
  });

  it('refuses other origins, sub-frames, missing frames and look-alikes', () => {
    const refused: [string, boolean][] = [
      ['https://example.com/', true],
      ['file:///home/user/design.html', true],
      ['wattledger://app.evil/index.html', true], // host must match exactly, not by prefix
      ['wattledger://evil/app', true],
      ['wattledger://user@app/index.html', true], // userinfo trick, RFC 3986 §3.2.1
      ['wattledger://app:8080/index.html', true],
      ['about:blank', true],
      ['not a url', true],
      ['wattledger://app/index.html', false], // same origin but a sub-frame
    ];
    for (const [url, isMainFrame] of refused) expect(isTrustedSender({ url, isMainFrame }), `${url} main=${isMainFrame}`).toBe(false); // Electron checklist item 17 [from memory]
    expect(isTrustedSender(null)).toBe(false); // a frame that navigated away or was destroyed (Electron: senderFrame may be null)
  });
});

describe('isAllowedNavigation()', () => {
  it('allows only our own origin and denies files dropped on the window and the web', () => {
    expect(isAllowedNavigation('wattledger://app/index.html')).toBe(true);
    expect(isAllowedNavigation('file:///home/user/design.json')).toBe(false); // Electron checklist "Disable or limit navigation" [from memory]
    expect(isAllowedNavigation('https://example.com/')).toBe(false);
    expect(isAllowedNavigation('javascript:alert(1)')).toBe(false);
  });
});
