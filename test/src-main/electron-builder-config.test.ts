/**
 * electron-builder.config.cjs cannot be exercised here (packaging downloads Electron), so it is loaded
 * and validated against electron-builder's own JSON schema, and its essential fields are checked.
 */
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { describe, expect, it } from 'vitest';

const require = createRequire(import.meta.url);
const config = require('../../electron-builder.config.cjs') as Record<string, unknown> & {
  linux: { target: string[] };
  win: { target: string[] };
  mac: { target: string[] };
  electronFuses: Record<string, boolean>;
  files: string[];
  extraMetadata: { main: string };
};
const pkg = require('../../package.json') as { main: string; devDependencies: Record<string, string>; optionalDependencies: Record<string, string>; scripts: Record<string, string> };
// electron-builder's own validator (app-builder-lib, installed with electron-builder 26.17.0).
const { validateConfiguration } = require('app-builder-lib/out/util/config/config.js') as { validateConfiguration: (c: unknown, l: unknown) => Promise<void> };
const { DebugLogger } = require('builder-util/out/DebugLogger.js') as { DebugLogger: new (enabled: boolean) => unknown };

describe('electron-builder.config.cjs', () => {
  it('passes electron-builder schema validation, and the validator does reject a bad field', async () => {
    await expect(validateConfiguration(config, new DebugLogger(false))).resolves.toBeUndefined(); // electron-builder scheme.json
    await expect(validateConfiguration({ ...config, notAnOption: true }, new DebugLogger(false))).rejects.toThrow(/unknown property 'notAnOption'/);
  }, 120_000); // compiling electron-builder's schema takes seconds on a busy machine

  it('is our app with the usual targets per platform', () => {
    expect(config['appId']).toBe('org.wattledger.desktop');
    expect(config['productName']).toBe('WattLedger');
    expect(config.linux.target).toEqual(['AppImage', 'deb']);
    expect(config.win.target).toEqual(['nsis']);
    expect(config.mac.target).toEqual(['dmg']);
  });

  it('packages the built output and starts the same main file as package.json, with the pinned Electron', () => {
    expect(config.files).toEqual(expect.arrayContaining(['out/main/**/*', 'out/preload/**/*', 'out/renderer/**/*', 'package.json']));
    expect(config.extraMetadata.main).toBe(pkg.main);
    expect(config['electronVersion']).toBe(pkg.optionalDependencies['electron']);
    expect(pkg.scripts['dist']).toContain('electron-builder --config electron-builder.config.cjs');
  });

  it('never packs node_modules: electron is an optional dependency, which electron-builder counts as production', () => {
    // npm docs "optionalDependencies": an optional package whose install fails is removed and the install goes on [from memory]
    expect(pkg.optionalDependencies['electron']).toMatch(/^\d+\.\d+\.\d+$/); // pinned exactly (team rule)
    expect(pkg.devDependencies['electron']).toBeUndefined();
    expect(config.files).toContain('!node_modules{,/**/*}');
  });

  it('has an application icon where electron-builder looks for it, large enough for every platform', () => {
    const dir = (config['directories'] as { buildResources: string }).buildResources;
    const png = readFileSync(new URL(`../../${dir}/icon.png`, import.meta.url));
    expect(png.subarray(1, 4).toString('latin1')).toBe('PNG'); // PNG signature (ISO/IEC 15948 §5.2)
    // IHDR width and height, big-endian at bytes 16 and 20 (ISO/IEC 15948 §11.2.2); electron-builder asks for ≥ 512 px (macOS) [from memory]
    expect([png.readUInt32BE(16), png.readUInt32BE(20)]).toEqual([1024, 1024]);
  });

  it('switches off the fuses an attacker could use', () => {
    // Electron fuses docs (electronjs.org/docs/latest/tutorial/fuses) [from memory]; checklist "Check which fuses you can change"
    expect(config.electronFuses).toMatchObject({ runAsNode: false, enableNodeOptionsEnvironmentVariable: false, enableNodeCliInspectArguments: false, onlyLoadAppFromAsar: true, grantFileProtocolExtraPrivileges: false });
  });
});
