// Test runner configuration: one run, two projects (engine and main-process units; browser end-to-end).
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
