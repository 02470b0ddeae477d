/**
 * "Save as HTML": the report as it is shown, frozen into one self-contained HTML file for a design-review
 * wiki or an e-mail — the report's markup, the page's style rules, every chart as a PNG image, and no
 * script at all (the file's own Content-Security-Policy forbids scripts and outside requests). Buttons
 * (the per-chart PNG buttons) are left out; everything a reader needs is text or an image.
 */

/** A self-contained HTML document of `report` (an element on the page), titled `title`. */
export function reportHtml(report: HTMLElement, title: string): string {
  const copy = report.cloneNode(true) as HTMLElement;
  const drawn = report.querySelectorAll('canvas');
  copy.querySelectorAll('canvas').forEach((canvas, i) => {
    const source = drawn[i];
    const img = document.createElement('img');
    img.src = source.toDataURL('image/png');
    img.alt = source.getAttribute('aria-label') ?? source.closest('figure')?.querySelector('figcaption')?.textContent?.trim() ?? 'chart';
    const box = source.getBoundingClientRect();
    if (box.width > 0) img.style.width = `${Math.round(box.width)}px`;
    img.style.maxWidth = '100%';
    canvas.replaceWith(img);
  });
  copy.querySelectorAll('button, script').forEach((e) => e.remove());
  const css = pageStyles();
  return [
    '<!doctype html>',
    '<html lang="en">',
    '<head>',
    '<meta charset="utf-8">',
    `<meta http-equiv="Content-Security-Policy" content="default-src 'none'; img-src data:; style-src 'unsafe-inline'">`,
    '<meta name="viewport" content="width=device-width, initial-scale=1">',
    '<meta name="color-scheme" content="light">',
    `<title>${escapeHtml(title)}</title>`,
    `<style>${css.replace(/<\/style/gi, '<\\/style')}</style>`,
    '</head>',
    `<body class="wl-report-file">${copy.outerHTML}</body>`,
    '</html>',
    '',
  ].join('\n');
}

/** Every style rule the page has loaded (its own stylesheets: same origin, so readable). */
function pageStyles(): string {
  const parts: string[] = [];
  for (const sheet of Array.from(document.styleSheets)) {
    try {
      for (const rule of Array.from(sheet.cssRules)) parts.push(rule.cssText);
    } catch {
      // A stylesheet from elsewhere cannot be read; the app loads none.
    }
  }
  return parts.join('\n');
}

function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c] as string);
}
