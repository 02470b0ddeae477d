/**
 * The Content-Security-Policy of the renderer: the page is served with the policy as a meta tag and as
 * a response header, and the harness really sees a violation (so the "no CSP violation" check run
 * after every end-to-end test can fail). Each other e2e test asserts no violation during its walk.
 */
import { describe, expect, it } from 'vitest';
import { e2eSuite } from './helpers/suite.ts';

const suite = e2eSuite();

describe('content security policy', () => {
  it('is in the page as a meta tag with no inline script or eval allowed', () =>
    suite.run(async (app) => {
      const meta = await app.page.locator('meta[http-equiv="Content-Security-Policy"]').getAttribute('content');
      expect(meta).toContain("script-src 'self'"); // issue 5 CSP: scripts only from the app itself
      expect(meta).not.toMatch(/unsafe-eval|script-src[^;]*unsafe-inline/); // CSP Level 3 keywords [from memory]
      const inlineScripts = await app.page.locator('script:not([src])').count();
      expect(inlineScripts).toBe(0);
    }));

  it('is reported by the harness when something breaks it', async () => {
    const app = await suite.open();
    try {
      await app.page.evaluate(() => {
        const script = document.createElement('script');
        script.textContent = 'window.__inline = 1';
        document.body.append(script);
      });
      await app.page.waitForTimeout(200);
      expect(app.cspViolations.map((v) => v.directive)).toContain('script-src-elem'); // CSP Level 3: inline script blocked [from memory]
      expect(await app.page.evaluate(() => (window as unknown as { __inline?: number }).__inline)).toBeUndefined();
    } finally {
      await app.close();
    }
  });
});
