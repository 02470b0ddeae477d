/**
 * The report's @page rule: paper size (A4 or Letter), margins, and the running header and footer that
 * Chromium prints in the page-margin boxes (CSS Paged Media 3, supported from Chromium 131, so by
 * Electron 40 and Debian's chromium): design name and revision at the top of every page, the page
 * number "Page N of M" and the date at the bottom. Installed from script because its text depends on
 * the design; removed again when the report view goes away.
 */
import type { ReportModel } from '../../shared-model/index.ts';

export type PageSize = 'A4' | 'Letter';

export const PAGE_SIZES: readonly PageSize[] = ['A4', 'Letter'];

/** A CSS string literal: quotes and backslashes escaped, control characters written as escapes. */
export function cssString(text: string): string {
  // eslint-disable-next-line no-control-regex
  return `"${text.replace(/[\\"]/g, (c) => `\\${c}`).replace(/[\u0000-\u001f\u007f]/g, (c) => `\\${c.charCodeAt(0).toString(16)} `)}"`;
}

/** The header text of every page: design name and revision. */
export function runningHeader(model: ReportModel): string {
  const rev = model.title.revision.trim() === '' ? 'revision not stated' : `revision ${model.title.revision}`;
  return `${model.title.designName} · ${rev}`;
}

export function pageCss(model: ReportModel, size: PageSize): string {
  const box = "font-family: 'DejaVu Sans', 'Liberation Sans', Arial, sans-serif; font-size: 8pt; color: #444444;";
  return [
    `@page {`,
    `  size: ${size};`,
    `  margin: 17mm 14mm 16mm 14mm;`,
    `  @top-left { content: ${cssString(runningHeader(model))}; ${box} vertical-align: bottom; padding-bottom: 2mm; }`,
    `  @top-right { content: ${cssString('WattLedger design review')}; ${box} vertical-align: bottom; padding-bottom: 2mm; }`,
    `  @bottom-left { content: ${cssString(`${model.title.date} · design SHA-256 ${model.title.designHash.slice(0, 12)}…`)}; ${box} vertical-align: top; padding-top: 2mm; }`,
    `  @bottom-right { content: "Page " counter(page) " of " counter(pages); ${box} vertical-align: top; padding-top: 2mm; }`,
    `}`,
  ].join('\n');
}

/**
 * Installs the report's @page rule in the document as a constructed style sheet (CSSOM), which the
 * app's Content-Security-Policy allows (style-src 'self' refuses an inline <style> element); returns a
 * function that removes it again.
 */
export function installPageStyle(doc: Document, model: ReportModel, size: PageSize): () => void {
  const sheet = new CSSStyleSheet();
  sheet.replaceSync(pageCss(model, size));
  doc.adoptedStyleSheets = [...doc.adoptedStyleSheets, sheet];
  return () => {
    doc.adoptedStyleSheets = doc.adoptedStyleSheets.filter((s) => s !== sheet);
  };
}
