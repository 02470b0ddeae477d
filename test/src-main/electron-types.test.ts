/**
 * src-main/types/electron.d.ts is Electron's own type declaration file, committed so that type checks
 * work where the optional `electron` package was removed (its runtime download failed, as on an
 * offline machine). It must stay the file of the pinned Electron version.
 */
import { existsSync, readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { describe, expect, it } from 'vitest';

const require = createRequire(import.meta.url);
const pkg = require('../../package.json') as { optionalDependencies: Record<string, string> };
const vendored = readFileSync(new URL('../../src-main/types/electron.d.ts', import.meta.url), 'utf8');
const installed = new URL('../../node_modules/electron/electron.d.ts', import.meta.url);

describe('vendored Electron type declarations', () => {
  it('are those of the pinned Electron version', () => {
    expect(vendored.split('\n')[0]).toBe(`// Type definitions for Electron ${pkg.optionalDependencies['electron']}`); // first line of Electron's electron.d.ts
  });

  it.runIf(existsSync(installed))('are byte for byte the installed package\'s file', () => {
    expect(vendored === readFileSync(installed, 'utf8')).toBe(true);
  });
});
