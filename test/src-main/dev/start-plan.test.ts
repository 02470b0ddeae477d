import nodePath from 'node:path';
import { describe, expect, it } from 'vitest';
import { PREVIEW_HOST, PREVIEW_PORT, browserModeMessage, locateElectron, planStart, type ElectronProbe } from '../../../src-main/dev/start-plan.ts';

const pkg = '/repo/node_modules/electron';
const probe = (over: Partial<ElectronProbe>): ElectronProbe => ({ packageDir: pkg, readPathFile: () => 'electron', exists: () => true, env: {}, ...over });

describe('locateElectron()', () => {
  it('finds the runtime named by path.txt under dist/, as the electron package does', () => {
    expect(locateElectron(probe({}))).toEqual({ found: true, binary: nodePath.join(pkg, 'dist', 'electron') }); // electron/index.js getElectronPath() (node_modules/electron/index.js)
  });

  it('honours ELECTRON_OVERRIDE_DIST_PATH', () => {
    expect(locateElectron(probe({ env: { ELECTRON_OVERRIDE_DIST_PATH: '/opt/electron' } }))).toEqual({ found: true, binary: '/opt/electron/electron' }); // same source
  });

  it('reports a skipped download (no path.txt) or a missing binary without throwing', () => {
    for (const over of [{ readPathFile: () => null }, { exists: () => false }] satisfies Partial<ElectronProbe>[]) {
      const runtime = locateElectron(probe(over));
      expect(runtime.found).toBe(false);
      if (!runtime.found) expect(runtime.reason).toMatch(/Electron runtime is not installed here.*`npm install` on a machine with internet access\.$/);
    }
    const removed = locateElectron(probe({ packageDir: null }));
    expect(removed.found).toBe(false); // npm docs: a failed optional dependency is removed [from memory]
    if (!removed.found) expect(removed.reason).toMatch(/^the Electron runtime could not be downloaded .* optional electron package.*runs in your browser instead/);
  });
});

describe('planStart()', () => {
  const base = { platform: 'linux' as const, env: { DISPLAY: ':0' }, appRoot: '/repo', args: [] as string[] };

  it('launches Electron on the app folder when the runtime and a display exist', () => {
    expect(planStart({ ...base, runtime: { found: true, binary: '/e/electron' }, args: ['my.json'] })).toEqual({ mode: 'electron', binary: '/e/electron', args: ['/repo', 'my.json'] });
    expect(planStart({ ...base, platform: 'win32', env: {}, runtime: { found: true, binary: 'e.exe' } }).mode).toBe('electron');
  });

  it('serves the browser version on 127.0.0.1:5199 when the runtime is missing, with one sentence why', () => {
    const plan = planStart({ ...base, runtime: { found: false, reason: 'the Electron runtime is not installed here, so …; to get it, run `npm install`.' } });
    expect(plan).toMatchObject({ mode: 'browser', host: PREVIEW_HOST, port: PREVIEW_PORT });
    if (plan.mode === 'browser') expect(plan.reason.split(/(?<=\.) /)).toHaveLength(1);
    expect(PREVIEW_HOST).toBe('127.0.0.1'); // loopback only (RFC 1122 §3.2.1.3), never all interfaces
  });

  it('falls back to the browser on a Linux machine without a display, and when asked', () => {
    expect(planStart({ ...base, env: {}, runtime: { found: true, binary: '/e/electron' } })).toMatchObject({ mode: 'browser' });
    expect(planStart({ ...base, env: { WAYLAND_DISPLAY: 'wayland-0' }, runtime: { found: true, binary: '/e/electron' } }).mode).toBe('electron');
    expect(planStart({ ...base, env: { DISPLAY: ':0', WATTLEDGER_BROWSER: '1' }, runtime: { found: true, binary: '/e/electron' } }).mode).toBe('browser');
  });

  it('prints the address first, then the reason', () => {
    expect(browserModeMessage('http://127.0.0.1:5199/', 'Because.')).toEqual(['WattLedger is being served at http://127.0.0.1:5199/', 'Because.', 'Open the address in a browser; press Ctrl+C to stop.']);
  });
});
