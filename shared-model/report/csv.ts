/**
 * CSV export of the load sweep and of the loss ledger, for spreadsheets and scripts.
 * Format: RFC 4180 (comma separated, CRLF line ends, a field holding a comma, quote or line break is
 * quoted with inner quotes doubled; text cells neutralised against formula injection: csv/write.ts), one
 * header row naming each column with its unit in brackets.
 * Numbers are written in full precision (JavaScript's shortest round-trip form, "." decimal point), in
 * SI units without prefixes: the file carries the engine's values, not the rounded ones printed.
 */
import type { Evaluation } from '../ledger/types.ts';
import type { LoadSweep } from '../sweep/types.ts';

import { csvLines } from '../csv/write.ts';


/** One row per sweep point: conditions, efficiency, powers, every loss term, temperature, margin and surface. */
export function sweepCsv(sweep: LoadSweep): string {
  const c = sweep.columns;
  const header = [
    'load [A]',
    'input voltage [V]',
    'ambient [°C]',
    'switching frequency [Hz]',
    'equivalent switching frequency [Hz]',
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
    p.loadA,
    p.vinV,
    p.ambientC,
    p.switchingFrequencyHz,
    p.equivalentSwitchingHz,
    p.efficiency,
    p.inputPower,
    p.outputPower,
    p.totalLoss,
    p.dutyCycle,
    p.mode,
    p.converged ? 'yes' : 'no',
    p.inductorPeakA,
    p.inductorRippleA,
    ...p.losses,
    ...p.temperaturesC,
    ...p.marginsK,
    ...p.surfacesC,
    ...p.hazardMarginsK,
    ...p.heatsinksC,
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
    t.watts,
    e.totalLoss > 0 ? t.watts / e.totalLoss : '',
    t.formula,
    t.inputs.map((i) => `${i.name} = ${String(i.value)}${i.unit ? ` ${i.unit}` : ''}`).join('; '),
  ]);
  rows.push(['total', '', '', e.totalLoss, e.totalLoss > 0 ? '1' : '', '', '']);
  rows.push(['input power', '', '', e.inputPower, '', '', '']);
  rows.push(['output power', '', '', e.outputPower, '', '', '']);
  return csvLines([header, ...rows]);
}
