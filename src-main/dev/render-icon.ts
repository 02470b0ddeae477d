/**
 * `npm run icon`: renders assets/build/icon.svg (the source of WattLedger's application icon) to
 * assets/build/icon.png at 1024 × 1024 with Debian's Chromium, where electron-builder picks it up for
 * every platform. Run it after editing the SVG and commit both files.
 */
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { chromium } from 'playwright-core';

const dir = fileURLToPath(new URL('../../assets/build/', import.meta.url));
const browser = await chromium.launch({ executablePath: '/usr/bin/chromium', args: ['--no-sandbox', '--disable-gpu', '--disable-background-networking'], headless: true });
try {
  const page = await browser.newPage({ viewport: { width: 1024, height: 1024 } });
  await page.setContent(`<!doctype html><body style="margin:0">${readFileSync(`${dir}icon.svg`, 'utf8')}</body>`);
  await page.locator('svg').screenshot({ path: `${dir}icon.png`, omitBackground: true });
  console.log(`wrote ${dir}icon.png`);
} finally {
  await browser.close();
}
