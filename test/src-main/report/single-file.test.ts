/**
 * The self-contained report file: script and styles inlined, the model embedded so that nothing in it
 * can end its element, and a CSP whose script hash is the SHA-256 (Node crypto) of the inlined script.
 */
import { createHash } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import type { ReportModel } from '../../../shared-model/index.ts';
import { cspFor, embeddedJson, scriptSafe, singleFileReport } from '../../../src-main/report/single-file.ts';

const PAGE = `<!doctype html>
<html lang="en">
  <head>
    <meta charset="utf-8" />
    <title>WattLedger design review</title>
    <script type="module" crossorigin src="./assets/report-abc.js"></script>
    <link rel="modulepreload" crossorigin href="./assets/dep.js">
    <link rel="stylesheet" crossorigin href="./assets/report-xyz.css">
  </head>
  <body><div id="report"></div></body>
</html>`;

const ASSETS: Record<string, string> = {
  './assets/report-abc.js': 'const s = "</script><!-- x"; document.title = s;',
  './assets/report-xyz.css': 'body { color: black } /* </style> */',
};

const model = { format: 'wattledger.report', version: 1, title: { designName: 'Rail </script> "$&" <b>' } } as unknown as ReportModel;

function page() {
  return { html: PAGE, readAsset: (ref: string) => ASSETS[ref] ?? (() => { throw new Error(`unexpected asset ${ref}`); })() };
}

describe('singleFileReport', () => {
  const html = singleFileReport(page(), model, 'Letter');

  it('inlines the script and the style sheet and refers to no other file', () => {
    expect(html).not.toMatch(/src="\.\/assets/);
    expect(html).not.toMatch(/href="\.\/assets/);
    expect(html).toContain('document.title = s;');
    expect(html).toContain('body { color: black }');
  });

  it('keeps the inlined code from closing its element', () => {
    const script = /<script type="module">([\s\S]*?)<\/script>/.exec(html)?.[1] ?? '';
    expect(script).toBe(scriptSafe(ASSETS['./assets/report-abc.js']!));
    expect(script).not.toMatch(/<\/script|<!--/i); // HTML Living Standard §4.12.1.3: script content restrictions
    expect(html).not.toMatch(/\/\* <\/style> \*\//);
  });

  it('embeds the model and page size as JSON that parses back unchanged', () => {
    const data = /<script type="application\/json" id="report-data">([\s\S]*?)<\/script>/.exec(html)?.[1] ?? '';
    expect(data).not.toContain('<');
    expect(JSON.parse(data)).toEqual({ model, pageSize: 'Letter' }); // ECMA-404: \u003c is "<"
    expect(data).toBe(embeddedJson({ model, pageSize: 'Letter' }));
  });

  it('allows only the inlined script by its SHA-256 hash', () => {
    const script = /<script type="module">([\s\S]*?)<\/script>/.exec(html)?.[1] ?? '';
    const hash = createHash('sha256').update(script, 'utf8').digest('base64'); // CSP Level 3 hash-source, Node crypto reference
    expect(html).toContain(`content="${cspFor([hash])}"`);
    expect(cspFor([hash])).toMatch(/default-src 'none'/);
  });

  it('titles the page with the design name, escaped', () => {
    expect(html).toContain('<title>Rail &lt;/script> &quot;$&amp;&quot; &lt;b> — WattLedger design review</title>');
  });

  it('refuses a page without a module script', () => {
    expect(() => singleFileReport({ html: '<html><head></head></html>', readAsset: () => '' }, model, 'A4')).toThrow(/no module script/);
  });
});
