/**
 * Issue 17 §3: examples/import-parts.js runs as a real Node process against the built package entry
 * (`from 'wattledger'`): a CSV with one bad row writes nothing and names the row, column, value and
 * allowed range; the fixed sheet becomes a library file the engine reads back with the values typed; a
 * second run adds to that file (taken ids renamed); a saved mapping document does the same job as the
 * options. Every part is invented.
 */
import { execFile } from 'node:child_process';
import { existsSync } from 'node:fs';
import nodeFs from 'node:fs/promises';
import nodePath from 'node:path';
import { promisify } from 'node:util';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { guessMapping, parsePartsLibraryText, readCsv, type Part } from '../../shared-model/index.ts';

const run = promisify(execFile);
const ROOT = nodePath.resolve(import.meta.dirname, '../..');
const EXAMPLE = nodePath.join(ROOT, 'examples', 'import-parts.js');
type Mosfet = Extract<Part, { kind: 'mosfet' }>;

const HEADERS = ['Part number', 'Name', 'VDS max (V)', 'ID max (A)', 'RDS(on) typ [mΩ]', 'RDS tempco (%/K)', 'Qg total (nC)', 'Qgs (nC)', 'Qgd (nC)', 'Vth (V)', 'Plateau (V)', 'Rg (Ω)', 'Coss (pF)', 'Coss at V', 'VSD (V)', 'Qrr (nC)', 'Tj max (°C)', 'θJC (K/W)'];
const fet = (n: number, rds: string, qgs: string): string[] => [`INV-S${n}`, `Invented script FET ${n}`, '40', '30', rds, '0.4', '12', qgs, '3', '2', '3.1', '1.5', '300', '20', '0.8', '15', '150', '1.8'];
const csv = (rows: string[][]): string => [HEADERS, ...rows].map((cells) => cells.join(',')).join('\n');
const GOOD = [fet(1, '6.5 mΩ', '2.1n'), fet(2, '4.2', '2.5'), fet(3, '0.0031 Ω', '1800p')];
const LAW = ['--kind', 'mosfet', '--set', 'rdsTemperatureLaw.law=linear'];

let work: string;
beforeAll(async () => {
  work = await nodeFs.mkdtemp(nodePath.join(ROOT, 'out', 'import-parts-'));
});
afterAll(async () => {
  await nodeFs.rm(work, { recursive: true, force: true });
});

async function script(args: string[]): Promise<{ code: number; stdout: string; stderr: string }> {
  return run(process.execPath, [EXAMPLE, ...args], { cwd: ROOT }).then(
    ({ stdout, stderr }) => ({ code: 0, stdout, stderr }),
    (error: { code: number; stdout: string; stderr: string }) => ({ code: error.code, stdout: error.stdout, stderr: error.stderr }),
  );
}

async function readLibrary(file: string) {
  const read = parsePartsLibraryText(await nodeFs.readFile(file, 'utf8'));
  if (!read.ok) throw new Error(read.problems.map((p) => p.message).join(' '));
  return read.library;
}

describe('examples/import-parts.js', () => {
  it('writes nothing while a row is bad, and names its row, column, value and allowed range', async () => {
    const sheet = nodePath.join(work, 'bad.csv');
    await nodeFs.writeFile(sheet, csv([...GOOD, fet(4, '0.001', '2')]));
    const library = nodePath.join(work, 'bad.json');
    const result = await script([sheet, library, ...LAW]);
    expect(result.code).toBe(1);
    expect(result.stderr).toContain('1 of 4 rows have problems; nothing was written:');
    expect(result.stderr).toContain('Row 5, column "RDS(on) typ [mΩ]" (RDS(on) at 25 °C): "0.001" mΩ reads as 1 µΩ; allowed: 10 µΩ ≤ RDS(on) at 25 °C ≤ 100 Ω.'); // design/numbers.ts conductionOhm: 10 µΩ … 100 Ω; header row 1, so the 4th data row is row 5
    expect(existsSync(library)).toBe(false);
  });

  it('turns the sheet into a library file with the values as typed, and adds to it on a second run', async () => {
    const sheet = nodePath.join(work, 'good.csv');
    await nodeFs.writeFile(sheet, csv(GOOD));
    const file = nodePath.join(work, 'approved.json');
    const first = await script([sheet, file, ...LAW, '--name', 'Approved FETs']);
    expect(first.stdout).toContain(`Added 3 parts to ${file} ("Approved FETs", 3 parts in all).`);
    const library = await readLibrary(file);
    expect(library.id).toBe('approved-fets');
    const parts = library.parts as Mosfet[];
    expect(parts.map((p) => p.rdsOn25Ohm)).toEqual([0.0065, 0.0042, 0.0031]); // m = 1e-3 (SI Brochure, 9th ed., Table 7): "6.5 mΩ", "4.2" in a mΩ column, "0.0031 Ω"
    expect(parts.map((p) => p.qgsC)).toEqual([2.1e-9, 2.5e-9, 1.8e-9]); // n = 1e-9, p = 1e-12 (SI Brochure Table 7): "2.1n", "2.5" in an nC column, "1800p"
    expect(parts.every((p) => p.rdsTemperatureLaw.law === 'linear')).toBe(true); // the --set value on every row

    const second = await script([sheet, file, ...LAW]);
    expect(second.stdout).toContain('Invented script FET 1: id INV-S1 was taken, stored as INV-S1-2.');
    expect((await readLibrary(file)).parts.map((p) => p.id)).toEqual(['INV-S1', 'INV-S2', 'INV-S3', 'INV-S1-2', 'INV-S2-2', 'INV-S3-2']);
  });

  it('does the same job from a saved mapping document', async () => {
    const sheet = nodePath.join(work, 'mapped.csv');
    await nodeFs.writeFile(sheet, csv(GOOD));
    const saved = { ...guessMapping(readCsv(csv(GOOD)).rows[0]?.cells ?? [], 'mosfet'), fixed: [{ field: 'rdsTemperatureLaw.law', text: 'linear' }] };
    const mappingFile = nodePath.join(work, 'mapping.json');
    await nodeFs.writeFile(mappingFile, JSON.stringify(saved));
    const viaMapping = nodePath.join(work, 'via-mapping.json');
    const viaOptions = nodePath.join(work, 'via-options.json');
    expect((await script([sheet, viaMapping, '--mapping', mappingFile])).code).toBe(0);
    expect((await script([sheet, viaOptions, ...LAW])).code).toBe(0);
    expect((await readLibrary(viaMapping)).parts).toEqual((await readLibrary(viaOptions)).parts);
    const broken = await script([sheet, nodePath.join(work, 'never.json'), '--mapping', viaOptions]);
    expect(broken.code).toBe(1);
    expect(broken.stderr).toMatch(/via-options\.json is not a saved part mapping; nothing was written:\n {2}- format: /);
  });
});
