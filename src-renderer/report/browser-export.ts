/**
 * Saving a report file in browser mode (no Electron): a download of the text or base64 content.
 */
import type { ExportRequest, SaveOutcome } from '../../shared-model/index.ts';

/** A file-name stem from a design name: letters, digits, dot, dash and underscore; others become "-". */
export function fileStem(name: string): string {
  const stem = name.trim().replace(/[^A-Za-z0-9._-]+/g, '-').replace(/^-+|-+$/g, '');
  return stem === '' ? 'design' : stem.slice(0, 80);
}

export async function browserExport(request: ExportRequest): Promise<SaveOutcome> {
  const type = request.extensions.includes('png') ? 'image/png' : request.extensions.includes('csv') ? 'text/csv' : request.extensions.includes('html') ? 'text/html' : 'text/plain';
  const body = request.encoding === 'base64' ? Uint8Array.from(atob(request.content), (c) => c.charCodeAt(0)) : request.content;
  const url = URL.createObjectURL(new Blob([body], { type }));
  try {
    const link = document.createElement('a');
    link.href = url;
    link.download = request.suggestedName;
    link.click();
  } finally {
    setTimeout(() => URL.revokeObjectURL(url), 10_000);
  }
  return { ok: true, path: request.suggestedName, name: request.suggestedName };
}
