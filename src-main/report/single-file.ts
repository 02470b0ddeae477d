/**
 * Turns the built report page (out/report/report.html with its JS and CSS files) and one ReportModel
 * into a single self-contained HTML file: the script and style sheets inlined, the model embedded as
 * <script type="application/json" id="report-data">, and a Content-Security-Policy that lets only that
 * one inline script run (by its SHA-256 hash) and loads nothing from anywhere.
 * Pure string work: the caller reads the files.
 */
import { createHash } from 'node:crypto';
import type { ReportModel } from '../../shared-model/index.ts';

export type PageSize = 'A4' | 'Letter';

export interface BuiltPage {
  /** The built report.html text. */
  html: string;
  /** Reads an asset the page references (path as written in the page, e.g. "./assets/report-x.js"). */
  readAsset(reference: string): string;
}

/** Text safe inside <script>: no "</script" and no "<!--" can end or confuse the element. */
export function scriptSafe(code: string): string {
  return code.replace(/<\/script/gi, '<\\/script').replace(/<!--/g, '<\\!--');
}

/** Text safe inside <style>. */
export function styleSafe(css: string): string {
  return css.replace(/<\/style/gi, '<\\/style');
}

/** JSON for a <script type="application/json"> element: every "<" escaped, so nothing can close it. */
export function embeddedJson(value: unknown): string {
  return JSON.stringify(value).replace(/</g, '\\u003c').replace(/\u2028/g, '\\u2028').replace(/\u2029/g, '\\u2029');
}

export function cspFor(scriptHashes: readonly string[]): string {
  return [
    "default-src 'none'",
    `script-src ${scriptHashes.map((h) => `'sha256-${h}'`).join(' ')}`,
    "style-src 'unsafe-inline'",
    'img-src data: blob:',
    'font-src data:',
    "base-uri 'none'",
    "form-action 'none'",
  ].join('; ');
}

const escapeAttribute = (text: string): string => text.replace(/&/g, '&amp;').replace(/"/g, '&quot;').replace(/</g, '&lt;');

export function singleFileReport(page: BuiltPage, model: ReportModel, pageSize: PageSize): string {
  const scriptTag = /<script\s+type="module"[^>]*\ssrc="([^"]+)"[^>]*>\s*<\/script>/g;
  const styleTag = /<link\s+rel="stylesheet"[^>]*\shref="([^"]+)"[^>]*>/g;
  const scripts = new Map<string, string>();
  for (const m of page.html.matchAll(scriptTag)) scripts.set(m[1]!, scriptSafe(page.readAsset(m[1]!)));
  if (scripts.size === 0) throw new Error('The built report page has no module script to inline.');
  const hashes = [...scripts.values()].map((code) => createHash('sha256').update(code, 'utf8').digest('base64'));

  const data = `<script type="application/json" id="report-data">${embeddedJson({ model, pageSize })}</script>`;
  const csp = `<meta http-equiv="Content-Security-Policy" content="${escapeAttribute(cspFor(hashes))}" />`;
  const title = `<title>${escapeAttribute(model.title.designName)} — WattLedger design review</title>`;
  // The page's own short tags are edited first, the large inlined code last, so no pattern can match
  // inside it. Replacer functions throughout: a replacement string would interpret "$&" in the data.
  let html = page.html.replace(/<link\s+rel="modulepreload"[^>]*>\s*/g, '');
  html = html.replace(/<title>[^<]*<\/title>/, () => title);
  html = /<meta charset="utf-8"\s*\/?>/i.test(html)
    ? html.replace(/<meta charset="utf-8"\s*\/?>/i, (charset) => `${charset}\n    ${csp}`)
    : html.replace(/<head>/, () => `<head>\n    <meta charset="utf-8" />\n    ${csp}`);
  html = html.replace(/<\/head>/, () => `    ${data}\n  </head>`);
  html = html.replace(styleTag, (_all, href: string) => `<style>${styleSafe(page.readAsset(href))}</style>`);
  return html.replace(scriptTag, (_all, src: string) => `<script type="module">${scripts.get(src)!}</script>`);
}
