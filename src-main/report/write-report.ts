/**
 * Writes the design-review report files for the command line: the self-contained HTML, and on request
 * the PDF (through the system's Chromium) and the CSV files of the sweep and the ledger. Each file is
 * written atomically (temporary sibling, then rename). The file system, the bundle and the printer are
 * injectable so the planning and the messages can be tested without a browser.
 */
import nodePath from 'node:path';
import type { ReportModel } from '../../shared-model/index.ts';
import { ledgerCsv, sweepCsv } from '../../shared-model/index.ts';
import { saveAtomically } from '../files/atomic-save.ts';
import type { BuiltPage, PageSize } from './single-file.ts';
import { singleFileReport } from './single-file.ts';

export interface ReportPaths {
  html: string;
  pdf: string | null;
  sweepCsv: string | null;
  ledgerCsv: string | null;
}

/**
 * Where the files go. `output` names the HTML file (".html" added when it has no extension); a PDF and
 * the CSV files sit beside it with the same stem. An output ending in ".pdf" names the PDF instead (and
 * implies it); the HTML then takes the same stem.
 */
export function reportPaths(output: string, options: { pdf: boolean; csv: boolean }): ReportPaths {
  const ext = nodePath.extname(output).toLowerCase();
  const stem = ext === '' ? output : output.slice(0, -ext.length);
  const wantsPdf = options.pdf || ext === '.pdf';
  return {
    html: ext === '' || ext === '.pdf' ? `${stem}.html` : output,
    pdf: wantsPdf ? (ext === '.pdf' ? output : `${stem}.pdf`) : null,
    sweepCsv: options.csv ? `${stem}-sweep.csv` : null,
    ledgerCsv: options.csv ? `${stem}-ledger.csv` : null,
  };
}

export interface ReportWriterDeps {
  ensureBundle(): Promise<void>;
  readPage(): BuiltPage;
  findChromium(): string | null;
  printPdf(html: string, chromiumPath: string): Promise<Uint8Array>;
  save(path: string, content: string | Uint8Array): Promise<{ ok: true } | { ok: false; message: string }>;
}

export const saveFile: ReportWriterDeps['save'] = async (path, content) => {
  const result = await saveAtomically(path, content, { backup: false });
  return result.ok ? { ok: true } : { ok: false, message: result.message };
};

export type WriteOutcome = { ok: true; written: string[] } | { ok: false; written: string[]; message: string };

export async function writeReportFiles(model: ReportModel, paths: ReportPaths, pageSize: PageSize, deps: ReportWriterDeps): Promise<WriteOutcome> {
  const written: string[] = [];
  await deps.ensureBundle();
  const html = singleFileReport(deps.readPage(), model, pageSize);
  const files: [string | null, () => string][] = [
    [paths.html, () => html],
    [paths.sweepCsv, () => sweepCsv(model.sweep)],
    [paths.ledgerCsv, () => ledgerCsv(model.rated)],
  ];
  for (const [path, content] of files) {
    if (path === null) continue;
    const saved = await deps.save(path, content());
    if (!saved.ok) return { ok: false, written, message: saved.message };
    written.push(path);
  }
  if (paths.pdf === null) return { ok: true, written };
  const chromium = deps.findChromium();
  if (chromium === null) {
    return {
      ok: false,
      written,
      message:
        'No Chromium found (looked for WATTLEDGER_CHROMIUM and /usr/bin/chromium), so the PDF was not written. ' +
        `Install one (Debian: apt-get install chromium) or open ${nodePath.basename(paths.html)} in a browser and print it.`,
    };
  }
  let pdf: Uint8Array;
  try {
    pdf = await deps.printPdf(html, chromium);
  } catch (error) {
    return { ok: false, written, message: `Could not print the PDF with ${chromium}: ${error instanceof Error ? error.message : String(error)}.` };
  }
  const saved = await deps.save(paths.pdf, pdf);
  if (!saved.ok) return { ok: false, written, message: saved.message };
  written.push(paths.pdf);
  return { ok: true, written };
}
