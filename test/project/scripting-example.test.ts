/**
 * The engine as a package for scripts (issue 17 §3): docs/scripting.md's examples, examples/sweep-folder.js,
 * runs as a real Node process (and so does the evaluate example of docs/scripting.md) against the built package entry (`import … from 'wattledger'` resolves to
 * out/lib/wattledger.js through package.json "exports"), and a strict TypeScript consumer type-checks
 * against the published declarations.
 */
import { execFile } from 'node:child_process';
import nodeFs from 'node:fs/promises';
import { createRequire } from 'node:module';
import nodePath from 'node:path';
import { pathToFileURL } from 'node:url';
import { promisify } from 'node:util';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_DESIGNS, evaluate, readCsv, sweepLoad, validateDesign } from '../../shared-model/index.ts';

const run = promisify(execFile);
const ROOT = nodePath.resolve(import.meta.dirname, '../..');
const EXAMPLE = nodePath.join(ROOT, 'examples', 'sweep-folder.js');
let work: string;

beforeAll(async () => {
  work = await nodeFs.mkdtemp(nodePath.join(ROOT, 'out', 'scripting-'));
});
afterAll(async () => {
  await nodeFs.rm(work, { recursive: true, force: true });
});

describe('scripting with the engine package', () => {
  it("'wattledger' resolves to the built ES module named in package.json exports", async () => {
    const { stdout } = await run(process.execPath, ['--input-type=module', '-e', "console.log(import.meta.resolve('wattledger'))"], { cwd: ROOT });
    expect(stdout.trim()).toBe(pathToFileURL(nodePath.join(ROOT, 'out', 'lib', 'wattledger.js')).href); // Node: package self-reference through "exports"
  });

  it('examples/sweep-folder.js sweeps every design in a folder into one CSV, the same numbers as the engine', async () => {
    const designs = nodePath.join(work, 'designs');
    await nodeFs.mkdir(designs);
    for (const name of ['synchronous-buck', 'diode-boost', 'hot-fin-buck']) await nodeFs.copyFile(nodePath.join(ROOT, 'assets', 'designs', `${name}.json`), nodePath.join(designs, `${name}.json`));
    const output = nodePath.join(work, 'sweeps.csv');
    const { stdout } = await run(process.execPath, [EXAMPLE, designs, output], { cwd: ROOT });
    expect(stdout).toMatch(/^Wrote 60 rows to .*sweeps\.csv\.\nEstimates only/);
    const table = readCsv(await nodeFs.readFile(output, 'utf8'));
    expect(table.problems).toEqual([]);
    expect(table.rows).toHaveLength(61);
    // The built package and the sources agree number for number (esbuild bundles, it does not change arithmetic).
    const demo = DEMO_DESIGNS.find((d) => d.id === 'hot-fin-buck');
    const checked = validateDesign(demo?.json);
    if (!checked.ok) throw new Error('demo invalid');
    const expected = sweepLoad(checked.design, { points: 20, spacing: 'linear' }).points;
    const rows = table.rows.filter((r) => r.cells[0] === 'hot-fin-buck.json');
    expect(rows.map((r) => Number(r.cells[3]))).toEqual(expected.map((p) => p.efficiency));
  });

  it("docs/scripting.md's shortest script runs as printed", async () => {
    const page = await nodeFs.readFile(nodePath.join(ROOT, 'docs', 'scripting.md'), 'utf8');
    const code = /## The shortest script[\s\S]*?```js\n([\s\S]*?)```/.exec(page)?.[1];
    expect(code).toBeDefined();
    const folder = nodePath.join(work, 'readme');
    await nodeFs.mkdir(nodePath.join(folder, 'assets'), { recursive: true });
    await nodeFs.cp(nodePath.join(ROOT, 'assets', 'designs'), nodePath.join(folder, 'assets', 'designs'), { recursive: true });
    await nodeFs.writeFile(nodePath.join(folder, 'readme-example.js'), code ?? '');
    await run(process.execPath, ['readme-example.js'], { cwd: folder });
    const table = readCsv(await nodeFs.readFile(nodePath.join(folder, 'sweeps.csv'), 'utf8'));
    const demos = (await nodeFs.readdir(nodePath.join(ROOT, 'assets', 'designs'))).filter((f) => f.endsWith('.json'));
    expect(demos.length).toBeGreaterThanOrEqual(3);
    expect(table.rows).toHaveLength(1 + demos.length * 20); // header + each demo × 20 points (the example's sweep)
  });

  it("docs/scripting.md's evaluate example runs as printed and prints the engine's efficiency", async () => {
    const page = await nodeFs.readFile(nodePath.join(ROOT, 'docs', 'scripting.md'), 'utf8');
    const code = /## Evaluate one design[\s\S]*?```js\n([\s\S]*?)```/.exec(page)?.[1];
    expect(code).toBeDefined();
    const file = nodePath.join(work, 'evaluate-example.js');
    await nodeFs.writeFile(file, code ?? '');
    const { stdout } = await run(process.execPath, [file], { cwd: ROOT });
    const checked = validateDesign(DEMO_DESIGNS.find((d) => d.id === 'synchronous-buck')?.json);
    if (!checked.ok) throw new Error('demo invalid');
    expect(Number(stdout.split(' ')[0])).toBe(evaluate(checked.design).efficiency); // the built package against the sources
  });

  it('a bad design in the folder is reported by field and the script exits 1', async () => {
    const designs = nodePath.join(work, 'mixed');
    await nodeFs.mkdir(designs);
    await nodeFs.writeFile(nodePath.join(designs, 'broken.json'), '{"format": "wattledger.design", "version": 1}');
    const failure = await run(process.execPath, [EXAMPLE, designs, nodePath.join(work, 'mixed.csv')], { cwd: ROOT }).then(() => null, (error: { code: number; stderr: string }) => error);
    expect(failure?.code).toBe(1);
    expect(failure?.stderr).toMatch(/broken\.json: not a usable design:\n {2}- Design name: name is missing; allowed: text of 1 to 120 characters\./);
  });

  it('a strict TypeScript script type-checks against the published declarations (package.json "types")', async () => {
    const folder = nodePath.join(work, 'typed');
    await nodeFs.mkdir(folder);
    await nodeFs.writeFile(nodePath.join(folder, 'tsconfig.json'), JSON.stringify({ compilerOptions: { module: 'nodenext', moduleResolution: 'nodenext', target: 'es2022', strict: true, noEmit: true, types: ['node'], lib: ['es2022'], skipLibCheck: true }, files: ['script.ts'] }));
    await nodeFs.writeFile(nodePath.join(folder, 'script.ts'), [
      "import { evaluate, parseDesignText, sweepLoad, type Design, type Evaluation } from 'wattledger';",
      'declare const text: string;',
      'const read = parseDesignText(text);',
      'if (read.ok) {',
      '  const design: Design = read.design;',
      '  const point: Evaluation = evaluate(design);',
      '  const efficiency: number = point.efficiency + sweepLoad(design).points.length;',
      '  void efficiency;',
      '}',
      '// @ts-expect-error a wrong argument type must be caught',
      'evaluate(42);',
      '',
    ].join('\n'));
    const tsc = createRequire(import.meta.url).resolve('typescript/bin/tsc');
    const result = await run(process.execPath, [tsc, '-p', folder], { cwd: ROOT }).then(() => ({ code: 0, stdout: '' }), (error: { code: number; stdout: string }) => error);
    expect(result.stdout).toBe('');
    expect(result.code).toBe(0);
  }, 120_000);
});
