import type { DesktopApi } from '../../shared-model/index.ts';

declare global {
  interface Window {
    /** Present only inside the Electron app (exposed by the preload). */
    wattledger?: DesktopApi;
  }
}

export {};
