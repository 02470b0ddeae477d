/**
 * Planning and writing the report files, with the bundle, the printer and the file system replaced by
 * stand-ins: which files are written, and the sentence when no Chromium is installed.
 */
import { describe, expect, it } from 'vitest';
import { buildReport, ledgerCsv, sweepCsv } from '../../../shared-model/index.ts';
import type { ReportWriterDeps } from '../../../src-main/report/write-report.ts';
import { reportPaths, writeReportFiles } from '../../../src-main/report/write-report.ts';
import { designText } from '../../shared-model/report/demo.ts';
import { demoDesign } from '../../helpers/demo.ts';

describe('reportPaths', () => {
  it('puts the PDF and the CSV files beside the HTML with the same stem', () => {
    expect(reportPaths('/x/review.html', { pdf: true, csv: true })).toEqual({
      html: '/x/review.html', pdf: '/x/review.pdf', sweepCsv: '/x/review-sweep.csv', ledgerCsv: '/x/review-ledger.csv',
    });
    expect(reportPaths('/x/review', { pdf: false, csv: false })).toEqual({ html: '/x/review.html', pdf: null, sweepCsv: null, ledgerCsv: null });
  });

  it('reads an output ending in .pdf as the PDF, with the HTML beside it', () => {
    expect(reportPaths('/x/review.PDF', { pdf: false, csv: false })).toEqual({ html: '/x/review.html', pdf: '/x/review.PDF', sweepCsv: null, ledgerCsv: null });
  });
});

describe('writeReportFiles', () => {
  const design = demoDesign('diode-boost');
  const model = buildReport({ design, documentText: designText(design), date: '2026-12-02', appVersion: 't', sweepPoints: 12, familyPoints: 6 });
  const page = { html: '<html><head><title>t</title><script type="module" src="./a.js"></script></head></html>', readAsset: () => 'void 0;' };

  function deps(chromium: string | null, saved: Map<string, string | Uint8Array>): ReportWriterDeps {
    return {
      ensureBundle: async () => undefined,
      readPage: () => page,
      findChromium: () => chromium,
      printPdf: async () => new Uint8Array([37, 80, 68, 70]),
      save: async (path, content) => {
        saved.set(path, content);
        return { ok: true };
      },
    };
  }

  it('writes the HTML, the CSV files of the engine records and the PDF', async () => {
    const saved = new Map<string, string | Uint8Array>();
    const outcome = await writeReportFiles(model, reportPaths('/r/out.html', { pdf: true, csv: true }), 'A4', deps('/usr/bin/chromium', saved));
    expect(outcome).toEqual({ ok: true, written: ['/r/out.html', '/r/out-sweep.csv', '/r/out-ledger.csv', '/r/out.pdf'] });
    expect(saved.get('/r/out-sweep.csv')).toBe(sweepCsv(model.sweep));
    expect(saved.get('/r/out-ledger.csv')).toBe(ledgerCsv(model.rated));
    expect(String(saved.get('/r/out.html'))).toContain('id="report-data"');
  });

  it('still writes the HTML and says how to get a PDF when no Chromium is installed', async () => {
    const saved = new Map<string, string | Uint8Array>();
    const outcome = await writeReportFiles(model, reportPaths('/r/out.html', { pdf: true, csv: false }), 'A4', deps(null, saved));
    expect(outcome.ok).toBe(false);
    expect(outcome.written).toEqual(['/r/out.html']);
    if (!outcome.ok) expect(outcome.message).toMatch(/No Chromium found.*out\.html in a browser/);
  });

  it('stops with the file system\'s sentence when a file cannot be saved', async () => {
    const failing: ReportWriterDeps = { ...deps('/usr/bin/chromium', new Map()), save: async (path) => ({ ok: false, message: `Could not save "${path}": disk full.` }) };
    const outcome = await writeReportFiles(model, reportPaths('/r/out.html', { pdf: true, csv: true }), 'A4', failing);
    expect(outcome).toEqual({ ok: false, written: [], message: 'Could not save "/r/out.html": disk full.' });
  });
});
