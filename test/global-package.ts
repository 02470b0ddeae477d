/**
 * Vitest global set-up: builds the package's plain-JavaScript entries (out/lib engine module and types,
 * out/cli command line; src-main/dev/build-package.ts) when a source is newer than the build, so the
 * tests that run the built CLI and the scripting example always run today's code.
 */
import { buildPackage } from '../src-main/dev/build-package.ts';

export default async function setup(): Promise<void> {
  await buildPackage({ ifStale: true });
}
