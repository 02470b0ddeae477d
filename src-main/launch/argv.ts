/**
 * The design file named on the command line, if any: `wattledger design.json`, a file dropped on the
 * app icon (Windows, Linux), or the arguments a second instance forwards. Electron's argv is
 * [executable, ...args] when packaged and [electron, appPath, ...args] in development; Chromium
 * switches (`--foo`) and macOS's `-psn_…` process serial number are skipped.
 */
import nodePath from 'node:path';

export interface ArgvContext {
  /** app.isPackaged */
  packaged: boolean;
  /** Folder relative paths are resolved against (the caller's working folder). */
  cwd: string;
  path?: Pick<typeof nodePath, 'resolve' | 'extname'>;
}

export const DESIGN_EXTENSIONS = ['.json'] as const;

export function designFileFromArgv(argv: readonly string[], context: ArgvContext): string | null {
  const pathApi = context.path ?? nodePath;
  const args = argv.slice(context.packaged ? 1 : 2);
  for (const arg of args) {
    if (arg === '' || arg.startsWith('-')) continue;
    if (!(DESIGN_EXTENSIONS as readonly string[]).includes(pathApi.extname(arg).toLowerCase())) continue;
    return pathApi.resolve(context.cwd, arg);
  }
  return null;
}
