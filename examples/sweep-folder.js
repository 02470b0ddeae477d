// Sweeps the load of every WattLedger design in a folder and writes one CSV with a row per design and
// load point: efficiency, losses and the hottest part's temperature.
//
//   node examples/sweep-folder.js assets/designs sweeps.csv
//
// The engine is the package's own entry (`import … from 'wattledger'`, built by `npm install`); a script
// in another folder imports it the same way after `npm install /path/to/wattledger`.
import { readdir, readFile, writeFile } from 'node:fs/promises';
import path from 'node:path';
import { csvLines, parseDesignText, sweepLoad } from 'wattledger';

const [folder, output] = process.argv.slice(2);
if (!folder || !output) {
  console.error('Usage: node examples/sweep-folder.js FOLDER OUTPUT.csv');
  process.exit(2);
}

const rows = [['design file', 'design', 'load [A]', 'efficiency [1]', 'total loss [W]', 'hottest part', 'hottest temperature [°C]', 'converged']];
let refused = 0;
for (const name of (await readdir(folder)).filter((n) => n.endsWith('.json')).sort()) {
  const read = parseDesignText(await readFile(path.join(folder, name), 'utf8'));
  if (!read.ok) {
    // Every problem names the field (its path), the value found and the allowed range.
    console.error(`${name}: not a usable design:\n${read.problems.map((p) => `  - ${p.message}`).join('\n')}`);
    refused += 1;
    continue;
  }
  const sweep = sweepLoad(read.design, { points: 20, spacing: 'linear' });
  for (const point of sweep.points) {
    const hottest = point.temperaturesC.indexOf(Math.max(...point.temperaturesC));
    rows.push([name, sweep.designName, point.loadA, point.efficiency, point.totalLoss, sweep.columns.temperatures[hottest]?.part ?? '', point.temperaturesC[hottest] ?? '', point.converged ? 'yes' : 'no']);
  }
}
// csvLines: RFC 4180 text, cells that a spreadsheet would run as a formula made inert.
await writeFile(output, csvLines(rows));
console.log(`Wrote ${rows.length - 1} rows to ${output}${refused > 0 ? ` (${refused} file(s) refused, see above)` : ''}.`);
console.log('Estimates only: measure losses and temperatures on hardware before relying on them.');
process.exitCode = refused > 0 ? 1 : 0;
