/**
 * CSV export of the load sweep and of the loss ledger, for spreadsheets and scripts.
 * Format: RFC 4180 (comma separated, CRLF line ends, a field holding a comma, quote or line break is
 * quoted with inner quotes doubled), one header row naming each column with its unit in brackets.
 * Numbers are written in full precision (JavaScript's shortest round-trip form, "." decimal point), in
 * SI units without prefixes: the file carries the engine's values, not the rounded ones printed.
 */
import type { Evaluation } from '../ledger/types.ts';
import type { LoadSweep } from '../sweep/types.ts';

const num = (x: number): string => (Number.isFinite(x) ? String(x) : '');

export function csvField(value: string): string {
  return /[",\r\n]/.test(value) ? `"${value.replace(/"/g, '""')}"` : value;
}

export function csvLines(rows: readonly (readonly string[])[]): string {
  return rows.map((r) => r.map(csvField).join(',')).join('\r\n') + '\r\n';
}

/** One row per sweep point: conditions, efficiency, powers, every loss term, temperature, margin and surface. */
export function sweepCsv(sweep: LoadSweep): string {
  const c = sweep.columns;
  const header = [
    'load [A]',
    'input voltage [V]',
    'ambient [°C]',
    'switching frequency [Hz]',
    'efficiency [1]',
    'input power [W]',
    'output power [W]',
    'total loss [W]',
    'duty cycle [1]',
    'mode',
    'converged',
    'inductor peak [A]',
    'inductor ripple p-p [A]',
    ...c.losses.map((l) => `loss ${l.part} ${l.mechanism} [W]`),
    ...c.temperatures.map((t) => `temperature ${t.part} [°C]`),
    ...c.temperatures.map((t) => `margin ${t.part} [K]`),
    ...c.temperatures.map((t) => `surface ${t.part} [°C]`),
    ...c.hazards.map((h) => `touch margin ${h.part} [K]`),
    ...c.heatsinks.map((h) => `heatsink ${h.id} [°C]`),
    'warnings',
  ];
  const rows = sweep.points.map((p) => [
    num(p.loadA),
    num(p.vinV),
    num(p.ambientC),
    num(p.switchingFrequencyHz),
    num(p.efficiency),
    num(p.inputPower),
    num(p.outputPower),
    num(p.totalLoss),
    num(p.dutyCycle),
    p.mode,
    p.converged ? 'yes' : 'no',
    num(p.inductorPeakA),
    num(p.inductorRippleA),
    ...p.losses.map(num),
    ...p.temperaturesC.map(num),
    ...p.marginsK.map(num),
    ...p.surfacesC.map(num),
    ...p.hazardMarginsK.map(num),
    ...p.heatsinksC.map(num),
    [...new Set(p.warnings.map((w) => w.code))].join(' '),
  ]);
  return csvLines([header, ...rows]);
}

/** One row per loss term: part, mechanism, watts, share of the total, formula and the inputs it used. */
export function ledgerCsv(e: Evaluation): string {
  const header = ['part', 'part name', 'mechanism', 'loss [W]', 'share of total loss [1]', 'formula', 'inputs'];
  const rows = e.losses.map((t) => [
    t.part,
    t.partName,
    t.mechanism,
    num(t.watts),
    e.totalLoss > 0 ? num(t.watts / e.totalLoss) : '',
    t.formula,
    t.inputs.map((i) => `${i.name} = ${num(i.value)}${i.unit ? ` ${i.unit}` : ''}`).join('; '),
  ]);
  rows.push(['total', '', '', num(e.totalLoss), e.totalLoss > 0 ? '1' : '', '', '']);
  rows.push(['input power', '', '', num(e.inputPower), '', '', '']);
  rows.push(['output power', '', '', num(e.outputPower), '', '', '']);
  return csvLines([header, ...rows]);
}
