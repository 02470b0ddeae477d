/**
 * Per-file set-up for end-to-end tests: one preview server and one Chromium for the file, a fresh
 * browser context per test. `run` opens the app, runs the test body, then checks that the page logged
 * no error and met no CSP violation, and always closes the context.
 */
import { afterAll, beforeAll, expect } from 'vitest';
import type { Browser } from 'playwright-core';
import { launchBrowser, openApp, startServer, type AppSession, type OpenOptions, type PreviewServer } from './browser.ts';

export interface E2eSuite {
  open(options?: OpenOptions): Promise<AppSession>;
  run(body: (app: AppSession) => Promise<void>, options?: OpenOptions & { allowErrors?: RegExp }): Promise<void>;
}

export function e2eSuite(): E2eSuite {
  let server: PreviewServer | undefined;
  let browser: Browser | undefined;
  beforeAll(async () => {
    server = await startServer();
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
    await server?.close();
  });
  const open = (options: OpenOptions = {}) => {
    if (!server || !browser) throw new Error('e2eSuite() must be called at the top of the test file');
    return openApp(server, { browser, ...options });
  };
  return {
    open,
    async run(body, options = {}) {
      const app = await open(options);
      try {
        await body(app);
        const errors = options.allowErrors ? app.errors.filter((e) => !options.allowErrors!.test(e)) : app.errors;
        expect(errors, `console errors: ${JSON.stringify(errors)}`).toEqual([]);
        expect(app.cspViolations, `CSP violations: ${JSON.stringify(app.cspViolations)}`).toEqual([]);
      } finally {
        await app.close();
      }
    },
  };
}
