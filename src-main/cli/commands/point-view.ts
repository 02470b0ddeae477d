/**
 * The operating point as plain-text tables with units (formatEngineering), for `wattledger point`.
 */
import type { CurrentStats, Design, DesignNotice, OperatingPoint, Warning } from '../../../shared-model/index.ts';
import { formatEngineering as fmt } from '../../../shared-model/index.ts';
import { CAUTION_LINE } from '../cautions.ts';
import { formatNotices } from '../design-file.ts';
import { renderTable, section } from '../table.ts';
import { describeConditions } from './conditions.ts';

/** A mean that is rounding noise next to the waveform's own size (1e-12 of its peak) is shown as 0. */
const mean = (s: CurrentStats): number =>
  Math.abs(s.averageA) < 1e-12 * Math.max(Math.abs(s.peakA), Math.abs(s.minA)) ? 0 : s.averageA;

const statRow = (name: string, s: CurrentStats): string[] => [
  name,
  fmt(mean(s), 'A', 4),
  fmt(s.rmsA, 'A', 4),
  fmt(s.peakA, 'A', 4),
  fmt(s.minA, 'A', 4),
];

export function renderWarnings(warnings: readonly Warning[]): string {
  if (warnings.length === 0) return '  (none)';
  return warnings.map((w) => `  - [${w.severity}] ${w.code}: ${w.message}${w.path ? ` (${w.path})` : ''}`).join('\n');
}

export function renderPoint(design: Design, op: OperatingPoint, notices: readonly DesignNotice[]): string {
  const summary = renderTable(
    [{ title: 'Quantity' }, { title: 'Value', align: 'right' }],
    [
      ['Conduction mode', op.mode],
      ['Duty cycle', fmt(op.dutyCycle, '', 4)],
      ['Rectifier conduction fraction', fmt(op.rectifierFraction, '', 4)],
      ['Idle fraction', fmt(op.idleFraction, '', 4)],
      ['Output voltage', fmt(op.voutV, 'V', 4)],
      ['Regulated', op.regulated ? 'yes' : 'no'],
      ['Output power', fmt(op.outputPowerW, 'W', 4)],
      ['Input current (average)', fmt(op.waveforms.inputA, 'A', 4)],
      ['Inductance used', fmt(op.inductanceH, 'H', 4)],
      ['Inductor ripple (peak to peak)', fmt(op.inductor.rippleA, 'A', 4)],
      ['Inductor valley current', fmt(op.inductor.valleyA, 'A', 4)],
    ],
  );
  const currents = renderTable(
    [{ title: 'Current in' }, { title: 'Average', align: 'right' }, { title: 'RMS', align: 'right' }, { title: 'Peak', align: 'right' }, { title: 'Minimum', align: 'right' }],
    [
      statRow('inductor', op.inductor),
      statRow('switch', op.stats.switch),
      statRow('rectifier', op.stats.rectifier),
      statRow('input capacitors', op.stats.inputCapacitor),
      statRow('output capacitors', op.stats.outputCapacitor),
      ...(design.parts.senseResistor && design.topology.senseLocation !== 'none' ? [statRow('sense resistor', op.stats.sense)] : []),
    ],
  );
  const { parts } = design;
  const rectRating = parts.rectifier.kind === 'mosfet' ? parts.rectifier.vdsRatingV : parts.rectifier.vrRatingV;
  const stress = renderTable(
    [{ title: 'Stress' }, { title: 'Value', align: 'right' }, { title: 'Rating', align: 'right' }],
    [
      ['switch blocking voltage', fmt(op.stress.switchV, 'V', 4), fmt(parts.switch.vdsRatingV, 'V', 4)],
      ['rectifier blocking voltage', fmt(op.stress.rectifierV, 'V', 4), fmt(rectRating, 'V', 4)],
      ['inductor peak current', fmt(op.inductor.peakA, 'A', 4), `${fmt(parts.inductor.isatA, 'A', 4)} Isat at ${fmt(parts.inductor.isatAtC, '°C')}`],
    ],
  );
  const rippleRows = [
    ['capacitive', fmt(op.outputRipple.capacitiveV, 'V', 4)],
    ['ESR', fmt(op.outputRipple.esrV, 'V', 4)],
    ['total (peak to peak)', fmt(op.outputRipple.totalV, 'V', 4)],
  ];
  const parts2 = [
    `WattLedger operating point: ${design.name}`,
    `Conditions: ${describeConditions(op.conditions)}; every part at ambient (no self-heating).`,
    '',
    section('Summary', summary),
    section('Currents', currents),
    section('Stress against ratings', stress),
    section('Output voltage ripple', renderTable([{ title: 'Part' }, { title: 'Value', align: 'right' }], rippleRows)),
  ];
  if (op.smallSignal)
    parts2.push(section('Small-signal landmarks (boost)', renderTable([{ title: 'Quantity' }, { title: 'Value', align: 'right' }], [
      ['right-half-plane zero', fmt(op.smallSignal.rhpZeroHz, 'Hz', 4)],
      ['current-mode output pole', fmt(op.smallSignal.outputPoleHz, 'Hz', 4)],
    ])));
  parts2.push(section('Warnings', renderWarnings(op.warnings)));
  if (notices.length > 0) parts2.push(section('Notes on the design file', formatNotices(notices)));
  parts2.push(CAUTION_LINE);
  return parts2.join('\n');
}
