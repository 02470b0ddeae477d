/**
 * Output of `wattledger fit`: the fitted parameters with their approximate 95 % intervals, the residual
 * RMS before and after, the correlations, the warnings and the calibration caution; or the same as JSON.
 */
import type { Calibration, Design } from '../../../shared-model/index.ts';
import { formatEngineering as fmt } from '../../../shared-model/index.ts';
import { CAUTION_LINE, CAUTIONS } from '../cautions.ts';
import { renderTable, section } from '../table.ts';

export function fitJson(design: Design, measurementName: string, c: Calibration): unknown {
  const names = c.parameters.map((p) => p.name);
  return {
    command: 'fit',
    design: design.name,
    measurement: { name: measurementName, points: c.points.length, sha256: c.measurementSha256 },
    units: { multipliers: '× the datasheet value', quiescent: 'A', loss: 'W', temperatures: '°C', residualPoints: 'percentage points of efficiency' },
    parameters: c.parameters.map((p) => ({
      name: p.name, label: p.label, unit: p.unit, initial: p.initial, fitted: p.fitted, lower95: p.lower95, upper95: p.upper95,
      intervalKnown: p.intervalKnown, standardError: p.standardError, lower: p.lower, upper: p.upper, atBound: p.atBound,
    })),
    residualRms: c.residualRms,
    correlations: { names, matrix: c.correlations },
    warnings: c.warnings,
    summary: c.summary,
    atRated: c.atRated,
    points: c.points,
    weights: c.weights,
    solver: c.solver,
    caution: c.caution,
    cautions: CAUTIONS,
  };
}

const value = (v: number, unit: string) => (unit === '×' ? `${v.toPrecision(4)}×` : fmt(v, unit, 4));

export function renderFit(design: Design, measurementName: string, c: Calibration): string {
  const params = renderTable(
    [{ title: 'Parameter' }, { title: 'Design', align: 'right' }, { title: 'Fitted', align: 'right' }, { title: '95 % interval', align: 'right' }, { title: 'Note' }],
    c.parameters.map((p) => [
      p.label.replace(/ ×$/, ''),
      value(p.initial, p.unit),
      value(p.fitted, p.unit),
      p.intervalKnown ? `${value(p.lower95, p.unit)} … ${value(p.upper95, p.unit)}` : 'not fixed by the data',
      p.atBound ? `at ${p.atBound} bound` : '',
    ]),
  );
  const rmsRows = [
    ['loss', fmt(c.residualRms.before.lossW, 'W', 3), fmt(c.residualRms.after.lossW, 'W', 3)],
    ...(c.points.some((p) => p.temperatures.length > 0)
      ? [['temperature', fmt(c.residualRms.before.temperatureK, 'K', 3), fmt(c.residualRms.after.temperatureK, 'K', 3)]]
      : []),
  ];
  const rms = renderTable([{ title: 'Residual RMS' }, { title: 'Before', align: 'right' }, { title: 'After', align: 'right' }], rmsRows);
  const points = renderTable(
    [{ title: 'Vin' }, { title: 'Load', align: 'right' }, { title: 'η measured', align: 'right' }, { title: 'η before', align: 'right' }, { title: 'η after', align: 'right' }, { title: 'Loss gap after', align: 'right' }],
    c.points.map((p) => [fmt(p.vinV, 'V', 4), fmt(p.loadA, 'A', 4), fmt(p.measuredEfficiency, '%', 4), fmt(p.efficiencyBefore, '%', 4), fmt(p.efficiencyAfter, '%', 4), fmt(p.measuredLossW - p.lossAfterW, 'W', 3)]),
  );
  const names = c.parameters.map((p) => p.name);
  const corr = renderTable(
    [{ title: '' }, ...names.map((n) => ({ title: n, align: 'right' as const }))],
    c.correlations.map((row, i) => [names[i], ...row.map((r) => r.toFixed(2))]),
  );
  const warnings = c.warnings.length === 0 ? '' : section('Warnings', c.warnings.map((w) => `  - ${w.message}`).join('\n'));
  return [
    `Calibration of ${design.name} against "${measurementName}" (${c.points.length} points, SHA-256 ${c.measurementSha256.slice(0, 12)}…)`,
    '',
    c.summary,
    '',
    section('Fitted parameters', params),
    section('Residuals', rms),
    section('Points', points),
    section('Correlations', corr),
    warnings,
    c.caution,
    CAUTION_LINE,
  ].join('\n');
}
