/**
 * Reusable end-to-end harness: serve the built renderer (out/renderer, built once by global-setup.ts)
 * with vite's preview() on a free port, drive Debian's Chromium through playwright-core (never a
 * downloaded browser, always --disable-gpu), collect console errors, page errors and CSP violations,
 * save screenshots to .artifacts/screenshots/NAME-THEME.png, and close everything.
 *
 * Typical use in a test file:
 *   const server = await startServer();            // beforeAll
 *   const browser = await launchBrowser();         // beforeAll (optional: shares one Chromium)
 *   const app = await openApp(server, { theme: 'dark', browser });
 *   ... app.page ...
 *   await app.screenshot('design');                // .artifacts/screenshots/design-dark.png
 *   expect(app.cspViolations).toEqual([]);
 *   await app.close();                             // closes the context (and its own browser)
 *   await browser.close(); await server.close();   // afterAll
 */
import { mkdirSync, mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { createRequire } from 'node:module';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { AddressInfo } from 'node:net';
import { chromium } from 'playwright-core';
import type { Browser, BrowserContext, Page } from 'playwright-core';
import { preview } from 'vite';
import { rendererBuildConfig, repoRoot } from './build.ts';

export const CHROMIUM_PATH = '/usr/bin/chromium';
export const CHROMIUM_ARGS = [
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
];
export const SCREENSHOT_DIR = join(repoRoot, '.artifacts', 'screenshots');

export type Theme = 'light' | 'dark';

export interface PreviewServer {
  url: string;
  close(): Promise<void>;
}

/** Serves out/renderer on 127.0.0.1 at a free port, with the app's CSP header. Close it in afterAll. */
export async function startServer(): Promise<PreviewServer> {
  const config = rendererBuildConfig();
  // The project's renderer config: same output folder and the same CSP response header as the app
  // (the page also carries the CSP meta tag; both must be satisfied).
  const server = await preview({ ...config, preview: { ...config.preview, host: '127.0.0.1', port: 0, strictPort: false, open: false } });
  const address = server.httpServer.address() as AddressInfo;
  const url = `http://127.0.0.1:${address.port}/`;
  return { url, close: () => server.close() };
}

export interface CspViolation {
  directive: string;
  blockedURI: string;
  sample: string;
}

export interface AppSession {
  page: Page;
  context: BrowserContext;
  theme: Theme;
  /** console.error messages and uncaught page errors, in order. */
  errors: string[];
  /** securitypolicyviolation events seen by any page of the session. */
  cspViolations: CspViolation[];
  /** Saves .artifacts/screenshots/NAME-THEME.png (full page unless told) and returns its path. */
  screenshot(name: string, options?: { fullPage?: boolean }): Promise<string>;
  /** Emulates the colour scheme (prefers-color-scheme) for the rest of the session. */
  setTheme(theme: Theme): Promise<void>;
  close(): Promise<void>;
}

/**
 * One Chromium for a whole test file; each openApp() then gets a fresh context (its own storage,
 * cookies and cache), which is much faster than a browser per test. Playwright gives the browser a
 * fresh temporary profile directory.
 */
export function launchBrowser(): Promise<Browser> {
  return chromium.launch({ executablePath: CHROMIUM_PATH, args: CHROMIUM_ARGS, headless: true });
}

export interface OpenOptions {
  /** A browser from launchBrowser(); without it a browser with a fresh profile is started and closed. */
  browser?: Browser;
  theme?: Theme;
  /** Runs in the page before the app's scripts (e.g. to seed localStorage). */
  initScript?: string;
  viewport?: { width: number; height: number };
  /** Wait for this selector after navigation (default: the app's main landmark). */
  readySelector?: string;
}

/** Launches Chromium with a fresh profile, opens the served app and starts collecting problems. */
export async function openApp(server: PreviewServer, options: OpenOptions = {}): Promise<AppSession> {
  let theme: Theme = options.theme ?? 'light';
  const contextOptions = { viewport: options.viewport ?? { width: 1400, height: 900 }, colorScheme: theme, acceptDownloads: true };
  const profileDir = options.browser ? null : mkdtempSync(join(tmpdir(), 'wattledger-e2e-'));
  const context = options.browser
    ? await options.browser.newContext(contextOptions)
    : await chromium.launchPersistentContext(profileDir as string, {
        executablePath: CHROMIUM_PATH,
        args: CHROMIUM_ARGS,
        headless: true,
        ...contextOptions,
      });
  const errors: string[] = [];
  const cspViolations: CspViolation[] = [];
  await context.exposeBinding('__wattledgerReportCsp', (_source, violation: CspViolation) => {
    cspViolations.push(violation);
  });
  await context.addInitScript(() => {
    document.addEventListener('securitypolicyviolation', (event) => {
      const report = (window as unknown as { __wattledgerReportCsp(v: unknown): void }).__wattledgerReportCsp;
      report({ directive: event.violatedDirective, blockedURI: event.blockedURI, sample: event.sample });
    });
  });
  if (options.initScript) await context.addInitScript({ content: options.initScript });
  const page = context.pages()[0] ?? (await context.newPage());
  page.on('console', (message) => {
    if (message.type() === 'error') errors.push(message.text());
  });
  page.on('pageerror', (error) => errors.push(`pageerror: ${error.message}`));
  await page.goto(server.url);
  await page.waitForSelector(options.readySelector ?? 'main', { timeout: 20_000 });

  return {
    page,
    context,
    get theme() {
      return theme;
    },
    errors,
    cspViolations,
    async screenshot(name: string, shot = {}) {
      mkdirSync(SCREENSHOT_DIR, { recursive: true });
      const path = join(SCREENSHOT_DIR, `${name}-${theme}.png`);
      await page.screenshot({ path, fullPage: shot.fullPage ?? true, animations: 'disabled' });
      return path;
    },
    async setTheme(next: Theme) {
      theme = next;
      await page.emulateMedia({ colorScheme: next });
    },
    async close() {
      await context.close();
      if (profileDir) rmSync(profileDir, { recursive: true, force: true });
    },
  };
}

const require = createRequire(import.meta.url);

export interface AxeViolation {
  id: string;
  impact: string | null;
  help: string;
  nodes: string[];
}

let axeSource: string | null = null;

/**
 * Runs axe-core (every rule it runs by default: WCAG 2.x A/AA and best practice) on the current page and
 * returns every violation, whatever its impact (issue 16: 0 violations of any impact).
 * axe is evaluated through the DevTools protocol rather than page.addScriptTag: a script tag's inline
 * content is (rightly) refused by the app's CSP (script-src 'self'), and turning CSP off with bypassCSP
 * would hide the very violations this harness must report. Evaluation this way is not subject to CSP.
 */
export async function axeViolations(page: Page): Promise<AxeViolation[]> {
  axeSource ??= readFileSync(require.resolve('axe-core/axe.min.js'), 'utf8');
  await page.evaluate(`${axeSource}\n;void 0`);
  const violations = await page.evaluate(async () => {
    const axe = (window as unknown as { axe: { run(context: Document): Promise<{ violations: unknown[] }> } }).axe;
    const result = await axe.run(document);
    return result.violations as { id: string; impact: string | null; help: string; nodes: { target: string[] }[] }[];
  });
  return violations.map((v) => ({ id: v.id, impact: v.impact, help: v.help, nodes: v.nodes.map((n) => n.target.join(' ')) }));
}

/** The serious and critical violations only (issue 5's bar). */
export async function axeSeriousViolations(page: Page): Promise<AxeViolation[]> {
  return (await axeViolations(page)).filter((v) => v.impact === 'serious' || v.impact === 'critical');
}
