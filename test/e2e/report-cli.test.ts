/**
 * `npx wattledger report` as a user runs it: a Letter PDF, the self-contained HTML beside it and the two
 * CSV files; the HTML loads nothing from anywhere and carries the SHA-256 of the design file, checked
 * with Node's crypto (OpenSSL) on the file's bytes.
 */
import { execFile, execFileSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { existsSync, mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { REPO_ROOT } from '../../src-main/report/bundle.ts';

const BIN = join(REPO_ROOT, 'out', 'cli', 'wattledger.js');
const DESIGN = join(REPO_ROOT, 'assets', 'designs', 'synchronous-buck.json');
const work = mkdtempSync(join(tmpdir(), 'wattledger-report-cli-'));
afterAll(() => rmSync(work, { recursive: true, force: true }));

function run(args: string[]): Promise<{ code: number; stdout: string; stderr: string }> {
  return new Promise((resolve) => {
    execFile(process.execPath, [BIN, ...args], { cwd: REPO_ROOT, encoding: 'utf8', timeout: 900_000 }, (error, stdout, stderr) => {
      resolve({ code: error ? (typeof error.code === 'number' ? error.code : -1) : 0, stdout, stderr });
    });
  });
}

describe('wattledger report DESIGN.json -o FILE.pdf --page Letter --csv', () => {
  it('writes the PDF, the self-contained HTML and the CSV files', async () => {
    const out = join(work, 'review.pdf');
    const result = await run(['report', DESIGN, '-o', out, '--page', 'Letter', '--csv', '--date', '2026-12-02', '--project', 'CLI proof']);
    expect(result.stderr).toBe('');
    expect(result.code).toBe(0);
    for (const f of ['review.html', 'review.pdf', 'review-sweep.csv', 'review-ledger.csv']) expect(existsSync(join(work, f)), f).toBe(true);
    expect(result.stdout).toMatch(/Estimates only/);

    const info = execFileSync('pdfinfo', [out], { encoding: 'utf8' });
    expect(info).toMatch(/Page size:\s+612 x 792 pts/); // ANSI Letter, 8.5 × 11 in at 72 pt/in
    const text = execFileSync('pdftotext', ['-layout', '-enc', 'UTF-8', out, '-'], { encoding: 'utf8' });
    expect(text).toContain('CLI proof');
    expect(text).toMatch(/Page 1 of \d+/);

    const html = readFileSync(join(work, 'review.html'), 'utf8');
    expect(html).not.toMatch(/\s(src|href)="(?!data:)[^"]+"/); // nothing loaded from a file or the network
    expect(html).toMatch(/Content-Security-Policy" content="default-src 'none'/);
    const data = JSON.parse(/<script type="application\/json" id="report-data">([\s\S]*?)<\/script>/.exec(html)![1]!) as { model: { title: { designHash: string } }; pageSize: string };
    expect(data.pageSize).toBe('Letter');
    expect(data.model.title.designHash).toBe(createHash('sha256').update(readFileSync(DESIGN)).digest('hex')); // Node crypto on the file bytes (no BOM in the demo file)
  }, 900_000);
});
