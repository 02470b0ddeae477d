/**
 * What `npm start` does, decided without side effects: launch Electron when its runtime is installed
 * and a display exists; otherwise serve the same renderer to a browser on 127.0.0.1 and say why in one
 * sentence. The inputs (files, environment) are passed in so every branch is unit-tested.
 */
import nodePath from 'node:path';

export const PREVIEW_HOST = '127.0.0.1';
export const PREVIEW_PORT = 5199;

export interface ElectronProbe {
  /** Folder of the installed `electron` package, or null when the package is missing. */
  packageDir: string | null;
  /** Contents of its path.txt (written by its install script once the runtime is downloaded). */
  readPathFile: () => string | null;
  exists: (path: string) => boolean;
  env: Readonly<Record<string, string | undefined>>;
}

export type ElectronRuntime = { found: true; binary: string } | { found: false; reason: string };

const GET_IT = 'to get the desktop app, run `npm install` on a machine with internet access';

/**
 * Resolves the Electron executable the way the `electron` package itself does (path.txt, or
 * ELECTRON_OVERRIDE_DIST_PATH), but never throws.
 */
export function locateElectron(probe: ElectronProbe): ElectronRuntime {
  if (probe.packageDir === null) {
    return { found: false, reason: `the Electron runtime could not be downloaded when npm installed this folder (npm then leaves out the optional electron package), so WattLedger runs in your browser instead; ${GET_IT}.` };
  }
  const relative = probe.readPathFile()?.trim() ?? '';
  const override = probe.env['ELECTRON_OVERRIDE_DIST_PATH'];
  const binary = override ? nodePath.join(override, relative || 'electron') : relative ? nodePath.join(probe.packageDir, 'dist', relative) : null;
  if (binary === null || !probe.exists(binary)) {
    return { found: false, reason: `the Electron runtime is not installed here (it was skipped or could not be downloaded), so WattLedger runs in your browser instead; ${GET_IT}.` };
  }
  return { found: true, binary };
}

export type StartPlan =
  | { mode: 'electron'; binary: string; args: string[] }
  | { mode: 'browser'; host: string; port: number; reason: string };

export interface StartInput {
  runtime: ElectronRuntime;
  platform: NodeJS.Platform;
  env: Readonly<Record<string, string | undefined>>;
  /** Folder holding package.json (Electron starts the app from there: `electron <appRoot>`). */
  appRoot: string;
  /** Extra arguments after `npm start --`, e.g. a design file. */
  args: readonly string[];
}

export function planStart(input: StartInput): StartPlan {
  const port = PREVIEW_PORT;
  if (input.env['WATTLEDGER_BROWSER'] === '1') {
    return { mode: 'browser', host: PREVIEW_HOST, port, reason: 'WATTLEDGER_BROWSER=1 asks for the browser version, so WattLedger runs in your browser.' };
  }
  if (!input.runtime.found) return { mode: 'browser', host: PREVIEW_HOST, port, reason: capitalise(input.runtime.reason) };
  const headlessLinux = input.platform === 'linux' && !input.env['DISPLAY'] && !input.env['WAYLAND_DISPLAY'];
  if (headlessLinux) {
    return { mode: 'browser', host: PREVIEW_HOST, port, reason: 'Electron is installed but this machine has no graphical display (DISPLAY and WAYLAND_DISPLAY are unset), so WattLedger runs in your browser instead.' };
  }
  return { mode: 'electron', binary: input.runtime.binary, args: [input.appRoot, ...input.args] };
}

function capitalise(text: string): string {
  return text.charAt(0).toUpperCase() + text.slice(1);
}

/** The lines printed in browser mode: the address first, then the one-sentence reason. */
export function browserModeMessage(url: string, reason: string): string[] {
  return [`WattLedger is being served at ${url}`, reason, 'Open the address in a browser; press Ctrl+C to stop.'];
}
