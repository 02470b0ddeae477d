/**
 * Rows of the operating-point table: one row per quantity, one cell per input voltage (min, nom, max),
 * all read from the engine's Evaluation and OperatingPoint records and formatted.
 */
import type { Evaluation, InputVoltageCase, RatingCheck } from '../../shared-model/index.ts';
import {
  formatAmps,
  formatCelsius,
  formatDuty,
  formatMarginFraction,
  formatPercent,
  formatEngineering,
  formatVolts,
  formatWatts,
  roleLabel,
} from '../../shared-model/index.ts';

export interface OperatingRow {
  label: string;
  cells: string[];
}

function checkCell(e: Evaluation, part: RatingCheck['part'], check: RatingCheck['check']): string {
  const c = e.checks.find((x) => x.part === part && x.check === check);
  if (!c) return '—';
  return `${formatEngineering(c.value, c.unit, 3, 'table')} / ${formatEngineering(c.limit, c.unit, 3, 'table')} · ${formatMarginFraction(c.marginFraction)}`;
}

export function operatingRows(cases: readonly InputVoltageCase[]): OperatingRow[] {
  const row = (label: string, cell: (e: Evaluation) => string): OperatingRow => ({ label, cells: cases.map((c) => cell(c.evaluation)) });
  const hottest = (e: Evaluation): string => {
    const t = [...e.temperatures].sort((a, b) => b.celsius - a.celsius)[0];
    return t ? `${roleLabel(t.part)} ${formatCelsius(t.celsius)}` : '—';
  };
  return [
    row('Input voltage', (e) => formatVolts(e.conditions.vinV)),
    row('Output voltage', (e) => `${formatVolts(e.operatingPoint.voutV)}${e.operatingPoint.regulated ? '' : ' (not regulated)'}`),
    row('Conduction mode', (e) => e.conductionMode),
    row('Duty cycle', (e) => formatDuty(e.dutyCycle)),
    row('Inductor current, mean', (e) => formatAmps(e.operatingPoint.inductor.averageA)),
    row('Inductor ripple, peak to peak', (e) => formatAmps(e.operatingPoint.inductor.rippleA)),
    row('Inductor current, peak', (e) => formatAmps(e.operatingPoint.inductor.peakA)),
    row('Inductor current, RMS', (e) => formatAmps(e.operatingPoint.inductor.rmsA)),
    row('Switch current, RMS', (e) => formatAmps(e.operatingPoint.stats.switch.rmsA)),
    row('Rectifier current, RMS', (e) => formatAmps(e.operatingPoint.stats.rectifier.rmsA)),
    row('Rectifier current, mean', (e) => formatAmps(e.operatingPoint.stats.rectifier.averageA)),
    row('Input capacitor bank, RMS', (e) => formatAmps(e.operatingPoint.stats.inputCapacitor.rmsA)),
    row('Output capacitor bank, RMS', (e) => formatAmps(e.operatingPoint.stats.outputCapacitor.rmsA)),
    row('Switch voltage / derated rating · margin', (e) => checkCell(e, 'switch', 'voltage')),
    row('Switch peak current / rating · margin', (e) => checkCell(e, 'switch', 'current')),
    row('Rectifier voltage / derated rating · margin', (e) => checkCell(e, 'rectifier', 'voltage')),
    row('Rectifier current / rating · margin', (e) => checkCell(e, 'rectifier', 'current')),
    row('Inductor peak / Isat when hot · margin', (e) => checkCell(e, 'inductor', 'saturation')),
    row('Output ripple, peak to peak', (e) => formatVolts(e.operatingPoint.outputRipple.totalV)),
    row('Efficiency', (e) => formatPercent(e.efficiency)),
    row('Total loss', (e) => formatWatts(e.totalLoss)),
    row('Hottest part', hottest),
    row('Electro-thermal solution', (e) => (e.converged ? `converged in ${e.iterations} iterations` : 'NOT converged (see warnings)')),
  ];
}
