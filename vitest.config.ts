// Test runner configuration: one run, three projects (engine and main-process units; property tests; browser end-to-end).
import { defineConfig } from 'vitest/config';
import { svelte } from '@sveltejs/vite-plugin-svelte';

export default defineConfig({
  plugins: [svelte()],
  test: {
    reporters: ['default', 'json'],
    outputFile: { json: '.reports/vitest.json' },
    projects: [
      {
        plugins: [svelte()],
        test: {
          name: 'unit',
          include: ['test/shared-model/**/*.test.ts', 'test/src-main/**/*.test.ts', 'test/src-renderer/**/*.test.ts', 'test/project/**/*.test.ts'],
          environment: 'node',
          globalSetup: ['test/global-package.ts'],
          testTimeout: 60_000,
        },
      },
      {
        test: {
          // Property tests over random valid designs (issue 10 §7): ≥ 10⁵ checked points, on their own so
          // the unit project stays quick; `npm test` runs them with the others.
          name: 'properties',
          include: ['test/properties/**/*.test.ts'],
          environment: 'node',
          globalSetup: ['test/global-package.ts'],
          testTimeout: 300_000,
        },
      },
      {
        test: {
          name: 'e2e',
          include: ['test/e2e/**/*.test.ts'],
          environment: 'node',
          globalSetup: ['test/global-package.ts', 'test/e2e/global-setup.ts'],
          testTimeout: 120_000,
          hookTimeout: 240_000,
          fileParallelism: false,
        },
      },
    ],
  },
});
