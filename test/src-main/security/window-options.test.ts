import { describe, expect, it } from 'vitest';
import { secureWindowOptions } from '../../../src-main/security/window-options.ts';

const state = { bounds: { x: 10, y: 20, width: 1200, height: 800 }, maximized: false };
const options = secureWindowOptions({ preloadPath: '/app/out/preload/preload.cjs', state, devTools: false });
const web = options.webPreferences ?? {};

// Checks follow the Electron security checklist, electronjs.org/docs/latest/tutorial/security [from memory].
describe('secureWindowOptions()', () => {
  it('sandboxes the renderer and isolates the preload context', () => {
    expect(web.sandbox).toBe(true); // checklist "Enable process sandboxing"
    expect(web.contextIsolation).toBe(true); // checklist "Enable context isolation"
  });

  it('gives Node to no page, worker or sub-frame', () => {
    expect(web.nodeIntegration).toBe(false); // checklist "Do not enable Node.js integration for remote content"
    expect(web.nodeIntegrationInWorker).toBe(false); // same item, workers
    expect(web.nodeIntegrationInSubFrames).toBe(false); // same item, sub-frames
  });

  it('keeps web security on and refuses insecure content, experimental and extra Blink features', () => {
    expect(web.webSecurity).toBe(true); // checklist "Do not disable webSecurity"
    expect(web.allowRunningInsecureContent).toBe(false); // checklist "Do not enable allowRunningInsecureContent"
    expect(web.experimentalFeatures).toBe(false); // checklist "Do not enable experimental features"
    expect(web.enableBlinkFeatures).toBeUndefined(); // checklist "Do not use enableBlinkFeatures"
    expect(web.disableBlinkFeatures).toContain('Auxclick'); // electronegativity AUXCLICK_JS_CHECK: middle-click must not open windows
  });

  it('has no <webview>, no plugins, no WebGL, and a dropped file never navigates the page', () => {
    expect(web.webviewTag).toBe(false); // checklist "<webview>: verify options and params" — none at all here
    expect(web.plugins).toBe(false); // Electron WebPreferences docs, plugins default false [from memory]
    expect(web.webgl).toBe(false); // team rule 5: no GPU
    expect(web.navigateOnDragDrop).toBe(false); // checklist "Disable or limit navigation" (drops are navigation)
  });

  it('loads exactly the preload it is given, and no remote module option exists', () => {
    expect(web.preload).toBe('/app/out/preload/preload.cjs');
    expect(Object.keys(web)).not.toContain('enableRemoteModule'); // Electron 14 breaking changes: remote module removed [from memory]
  });

  it('opens hidden at the restored bounds, devtools only when asked', () => {
    expect(options).toMatchObject({ x: 10, y: 20, width: 1200, height: 800, show: false });
    expect(web.devTools).toBe(false);
    expect(secureWindowOptions({ preloadPath: 'p', state, devTools: true }).webPreferences?.devTools).toBe(true);
  });
});
