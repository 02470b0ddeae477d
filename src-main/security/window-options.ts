/**
 * Options of the one WattLedger window, from a pure function so every security setting is unit-tested
 * (Electron security checklist, electronjs.org/docs/latest/tutorial/security):
 * sandboxed renderer, context isolation, no Node integration anywhere (page, workers, sub-frames),
 * web security on, no insecure content, no experimental or extra Blink features, no <webview>,
 * dropped files never navigate the page, no WebGL (the app draws on CPU), the preload as the only bridge.
 * The remote module no longer exists in Electron ≥ 14, so there is nothing to switch off.
 */
import type { BrowserWindowConstructorOptions } from 'electron';
import { APP_NAME } from '../window/title.ts';
import { MIN_SIZE, type WindowState } from '../window/window-state.ts';

export interface WindowOptionsInput {
  preloadPath: string;
  state: WindowState;
  /** Allow opening developer tools (unpackaged development runs only). */
  devTools: boolean;
  backgroundColor?: string;
}

export function secureWindowOptions(input: WindowOptionsInput): BrowserWindowConstructorOptions {
  const { bounds } = input.state;
  return {
    title: APP_NAME,
    x: bounds.x,
    y: bounds.y,
    width: bounds.width,
    height: bounds.height,
    minWidth: MIN_SIZE.width,
    minHeight: MIN_SIZE.height,
    show: false,
    backgroundColor: input.backgroundColor ?? '#1e1e1e',
    webPreferences: {
      preload: input.preloadPath,
      sandbox: true,
      contextIsolation: true,
      nodeIntegration: false,
      nodeIntegrationInWorker: false,
      nodeIntegrationInSubFrames: false,
      webSecurity: true,
      allowRunningInsecureContent: false,
      experimentalFeatures: false,
      webviewTag: false,
      navigateOnDragDrop: false,
      webgl: false,
      plugins: false,
      safeDialogs: true,
      spellcheck: false,
      devTools: input.devTools,
      disableBlinkFeatures: 'Auxclick',
    },
  };
}
