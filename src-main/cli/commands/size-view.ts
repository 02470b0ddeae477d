/**
 * The sizing and the design checks as plain-text tables for `wattledger size`: what each part must be
 * (value, corner, why), the crossover sentence, the checks (value, limit, result, margin, corner), the
 * sentences of the checks that do not pass, the notes and the cautions.
 */
import type { DesignCheck, DesignNotice, DesignReview, SizedValue } from '../../../shared-model/index.ts';
import { formatEngineering as fmt } from '../../../shared-model/index.ts';
import { CAUTION_LINE } from '../cautions.ts';
import { formatNotices } from '../design-file.ts';
import { renderTable, section } from '../table.ts';

const row = (name: string, v: SizedValue | undefined): string[] =>
  v ? [name, fmt(v.value, v.unit, 4), v.corner, v.reason] : [name, '—', '', 'not sized (see the notes)'];

const RESULT: Record<DesignCheck['status'], string> = { pass: 'pass', warn: 'WARN', fail: 'FAIL' };

function sizingTable(review: DesignReview): string {
  const s = review.sizing;
  const c = s.outputCapacitor;
  const rows = [
    row('Duty, smallest', s.duty.min),
    row('Duty, largest', s.duty.max),
    row('Rated inductor current', s.inductor.ratedCurrentA),
    row('Inductance for the ripple target', s.inductor.requiredInductanceH),
    row('Isat needed (hot)', s.inductor.requiredIsatA),
    row('Inductor RMS current', s.inductor.requiredRmsA),
    row('Output charge per period', c.chargeC),
    row('Output capacitor current swing', c.currentSwingA),
    row('Output capacitance, zero ESR', c.minCapacitanceF),
    row('Largest ESR, unlimited C', c.maxEsrOhm),
    row('Capacitance with the bank ESR', c.capacitanceWithBankEsrF),
    row('Largest ESR with the bank C', c.maxEsrWithBankCapacitanceOhm),
    row('Output capacitor RMS', c.rmsA),
    row('Input capacitor RMS', s.inputCapacitorRmsA),
    row('Switch voltage', s.stresses.switchV),
    row('Switch peak current', s.stresses.switchPeakA),
    row('Rectifier voltage', s.stresses.rectifierV),
    row('Rectifier mean current', s.stresses.rectifierAverageA),
    row('Inductor down-slope m2', s.slope.downSlopeAPerS),
    ...(s.slope.senseSignalPeakV ? [row('Sense signal with the minimum ramp', s.slope.senseSignalPeakV)] : []),
    ...(s.slope.senseLossW ? [row('Sense resistor loss', s.slope.senseLossW)] : []),
    row('Output pole', s.loop.outputPoleHz),
    ...(s.loop.rhpZeroHz ? [row('RHP zero (lowest)', s.loop.rhpZeroHz)] : []),
  ];
  const r = s.stresses.required;
  const needs = [
    `Switch: VDS ≥ ${fmt(r.switchVdsV, 'V', 3)}, ID ≥ ${fmt(r.switchIdA, 'A', 3)}; rectifier: ≥ ${fmt(r.rectifierVoltageV, 'V', 3)}, ≥ ${fmt(r.rectifierCurrentA, 'A', 3)}`,
    `(voltage derating ${fmt(s.stresses.voltageDerating, '%', 3)}, current derating ${fmt(s.stresses.currentDerating, '%', 3)}).`,
  ].join(' ');
  return `${renderTable([{ title: 'Quantity' }, { title: 'Value', align: 'right' }, { title: 'Corner' }, { title: 'Why this corner' }], rows)}\n\n${needs}`;
}

function checksTable(checks: readonly DesignCheck[]): string {
  return renderTable(
    [{ title: 'Check' }, { title: 'Value', align: 'right' }, { title: 'Limit', align: 'right' }, { title: 'Result' }, { title: 'Margin', align: 'right' }, { title: 'Corner' }],
    checks.map((k) => [
      k.label,
      fmt(k.value, k.unit, 4),
      `${k.bound === 'max' ? '≤' : '≥'} ${fmt(k.limit, k.unit, 4)}`,
      RESULT[k.status],
      fmt(k.marginFraction, '%', 3),
      k.corner ?? '',
    ]),
  );
}

export function renderSizing(review: DesignReview, notices: readonly DesignNotice[]): string {
  const n = review.counts;
  const open = review.checks.filter((k) => k.status !== 'pass');
  const findings = open.length === 0
    ? 'Every check passes.'
    : open.map((k) => `- [${RESULT[k.status]}] ${k.label}: ${k.message} (${k.source})`).join('\n');
  const parts = [
    section('Sizing (rated load, solved with the design\'s losses)', sizingTable(review)),
    section('Crossover', review.sizing.loop.crossoverReason),
    section(`Design checks: ${n.pass} pass, ${n.warn} warn, ${n.fail} fail`, checksTable(review.checks)),
    section('Findings (warn and fail; --json has every sentence)', findings),
    section('Notes', [...review.sizing.notes, ...review.notes].map((x) => `- ${x}`).join('\n')),
  ];
  if (notices.length > 0) parts.push(section('Design notices', formatNotices(notices)));
  parts.push(CAUTION_LINE);
  return parts.join('\n\n');
}
