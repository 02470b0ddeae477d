import nodePath from 'node:path';
import { describe, expect, it } from 'vitest';
import { designFileFromArgv } from '../../../src-main/launch/argv.ts';

const posix = { path: nodePath.posix };

describe('designFileFromArgv()', () => {
  it('finds the file after the executable in a packaged app', () => {
    expect(designFileFromArgv(['/opt/WattLedger/wattledger', 'designs/buck.json'], { packaged: true, cwd: '/home/u', ...posix })).toBe('/home/u/designs/buck.json'); // Electron process.argv layout, packaged [from memory]
  });

  it('skips the app path in development and Chromium switches anywhere', () => {
    expect(designFileFromArgv(['/x/electron', '/repo', '--enable-logging', '--inspect=9229', '/tmp/boost.JSON'], { packaged: false, cwd: '/repo', ...posix })).toBe('/tmp/boost.JSON'); // Electron dev argv = [electron, appPath, ...] [from memory]
  });

  it("ignores macOS's process serial number and anything that is not a design file", () => {
    expect(designFileFromArgv(['/App/WattLedger', '-psn_0_12345', 'notes.txt', ''], { packaged: true, cwd: '/', ...posix })).toBeNull(); // macOS Finder -psn_ argument [from memory]
  });

  it("resolves against the second instance's working folder", () => {
    expect(designFileFromArgv(['C:\\WattLedger\\WattLedger.exe', 'buck.json'], { packaged: true, cwd: 'D:\\work', path: nodePath.win32 })).toBe('D:\\work\\buck.json'); // Node path.win32.resolve
  });
});
