/**
 * `wattledger fit DESIGN.json MEASURED.csv [--params a,b,c] [--json]`: fits model parameters to a bench
 * measurement (shared-model/fit) and prints the fitted values with approximate 95 % intervals, the
 * residuals before and after, the correlations and the identifiability warnings. A bad CSV: exit 1 with
 * every problem (line, column, value, expected).
 */
import nodePath from 'node:path';
import { calibrate, readMeasurement } from '../../../shared-model/index.ts';
import type { Command } from '../command.ts';
import { loadDesign } from '../design-file.ts';
import { EXIT } from '../io.ts';
import { fitJson, renderFit } from './fit-view.ts';

const PREFIX = 'wattledger fit';

export const fitCommand: Command = {
  name: 'fit',
  summary: 'Fit model parameters to measured efficiency and temperatures (calibration against the bench).',
  positionals: ['DESIGN.json', 'MEASURED.csv'],
  flags: [
    {
      name: 'params', kind: 'text', placeholder: 'a,b,c',
      help: 'Parameters that may move (default: RDS(on) of each MOSFET, switchCharge, coreLoss, quiescent, and thermal.<role> for each measured temperature).',
      check: (v) => (/^[A-Za-z.]+(,[A-Za-z.]+)*$/.test(v) ? null : 'a comma-separated list of parameter names, e.g. switchCharge,coreLoss'),
    },
    { name: 'json', kind: 'switch', help: 'Print JSON (SI units; multipliers of the datasheet value as plain numbers) instead of tables.' },
  ],
  details: [
    'MEASURED.csv columns (header names match without regard to case): vinV, loadA, and one of efficiency',
    '(a fraction, or a percentage with a % sign), efficiencyPct, inputPowerW, inputCurrentA; optional voutV,',
    'ambientC, fsHz, and measured surface temperatures switchC, rectifierC, inductorC, inputCapacitorC,',
    'outputCapacitorC, senseResistorC, controllerC.',
    'Parameters: switchRdsOn, rectifierRdsOn (synchronous) or rectifierDrop (diode), switchCharge, coreLoss,',
    'windingDcr, quiescent (A), thermal.<role>. Multipliers may move 0.2 … 5 × the datasheet value.',
    'Exit 1 for a bad design, a bad CSV or measured points the design cannot be evaluated at.',
  ],
  async run(args, io) {
    const loaded = await loadDesign(args.positionals[0] ?? '', io, PREFIX);
    if (!loaded.ok) return EXIT.invalidDesign;
    const csvPath = args.positionals[1] ?? '';
    const csvName = nodePath.basename(csvPath);
    const text = await io.readText(csvPath);
    if (!text.ok) {
      io.err(`${PREFIX}: ${text.message}`);
      return EXIT.invalidDesign;
    }
    const read = readMeasurement(text.text, { design: loaded.design, name: csvName });
    if (!read.ok) {
      const n = read.problems.length;
      io.err(`${PREFIX}: "${csvName}" is not a usable measurement (${n} problem${n === 1 ? '' : 's'}):\n` +
        read.problems.map((p) => `  - ${p.message}\n    line: ${p.line} | column: ${p.column || '(whole table)'} | value: ${p.value === '' ? '(empty)' : p.value} | expected: ${p.expected}`).join('\n'));
      return EXIT.invalidDesign;
    }
    const params = args.texts.params?.split(',');
    const out = calibrate(loaded.design, read.measurement, params ? { parameters: params } : {});
    if (!out.ok) {
      const usage = out.problems.every((p) => p.path === 'parameters' || p.path.startsWith('bounds.'));
      io.err(`${PREFIX}: cannot fit (${out.problems.length} problem${out.problems.length === 1 ? '' : 's'}):\n` +
        out.problems.map((p) => `  - ${p.message}\n    path: ${p.path} | allowed: ${p.allowed}`).join('\n'));
      return usage ? EXIT.usage : EXIT.invalidDesign;
    }
    if (args.switches.has('json')) io.out(JSON.stringify(fitJson(loaded.design, csvName, out.calibration), null, 2));
    else io.out(renderFit(loaded.design, csvName, out.calibration));
    return EXIT.ok;
  },
};
