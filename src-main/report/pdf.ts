/**
 * PDF from the self-contained report HTML through a Chromium the system provides (Debian's
 * /usr/bin/chromium, or WATTLEDGER_CHROMIUM) and playwright-core's page.pdf(). Never downloads a
 * browser. Headless, CPU only (--disable-gpu), no network, a fresh profile folder removed afterwards.
 * The page's own @page rule sets the paper size and the running header and footer (preferCSSPageSize).
 */
import { existsSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import nodePath from 'node:path';
import { pathToFileURL } from 'node:url';

export const DEFAULT_CHROMIUM = '/usr/bin/chromium';

export const CHROMIUM_ARGS: readonly string[] = [
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
];

/** The Chromium to print with, or null when none is installed. */
export function findChromium(env: NodeJS.ProcessEnv = process.env): string | null {
  const candidates = [env.WATTLEDGER_CHROMIUM, DEFAULT_CHROMIUM].filter((p): p is string => typeof p === 'string' && p !== '');
  return candidates.find((p) => existsSync(p)) ?? null;
}

export interface PdfOptions {
  chromiumPath: string;
  /** Milliseconds to wait for the report to draw (default 60 s). */
  timeoutMs?: number;
}

/** Prints the report HTML to PDF bytes. Throws with a sentence when the page cannot be printed. */
export async function reportPdf(html: string, options: PdfOptions): Promise<Uint8Array> {
  const { chromium } = await import('playwright-core');
  const work = mkdtempSync(nodePath.join(tmpdir(), 'wattledger-report-'));
  const profile = nodePath.join(work, 'profile');
  const page = nodePath.join(work, 'report.html');
  writeFileSync(page, html, 'utf8');
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: options.chromiumPath,
    args: [...CHROMIUM_ARGS],
    headless: true,
    offline: true,
  });
  try {
    const tab = context.pages()[0] ?? (await context.newPage());
    const problems: string[] = [];
    tab.on('pageerror', (error) => problems.push(error.message));
    await tab.goto(pathToFileURL(page).href);
    try {
      await tab.waitForSelector('html[data-report-ready]', { timeout: options.timeoutMs ?? 60_000, state: 'attached' });
    } catch {
      throw new Error(`the report page did not finish drawing${problems.length ? ` (${problems.join('; ')})` : ''}`);
    }
    const ready = await tab.getAttribute('html', 'data-report-ready');
    if (ready !== 'true') throw new Error(`the report page could not show the report${problems.length ? ` (${problems.join('; ')})` : ''}`);
    return new Uint8Array(await tab.pdf({ preferCSSPageSize: true, printBackground: true }));
  } finally {
    await context.close();
    rmSync(work, { recursive: true, force: true });
  }
}
