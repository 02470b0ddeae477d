/**
 * The evaluation as plain-text tables with units, for `wattledger evaluate`: summary, loss ledger,
 * temperatures, heatsinks, burn hazards, rating checks, warnings, then the cautions.
 */
import type { Design, DesignNotice, Evaluation, RatingCheck } from '../../../shared-model/index.ts';
import { formatEngineering as fmt } from '../../../shared-model/index.ts';
import { CAUTION_LINE } from '../cautions.ts';
import { formatNotices } from '../design-file.ts';
import { renderTable, section } from '../table.ts';
import { describeConditions } from './conditions.ts';
import { renderWarnings } from './point-view.ts';

const kelvin = (k: number): string => `${k >= 0 ? '+' : ''}${fmt(k, 'K', 3)}`;

const runsAway = (e: Evaluation): boolean => e.warnings.some((w) => w.code === 'thermal-runaway');
const RUNAWAY = 'RUNAWAY: no steady state';

function summary(e: Evaluation): string {
  // A runaway point has no steady state: no efficiency or power is shown as if it had one (issue 10 §5).
  const steady = (v: string) => (runsAway(e) ? RUNAWAY : v);
  const efficiency = !e.regulated ? `not regulated (output ${fmt(e.operatingPoint.voutV, 'V', 4)} instead of ${fmt(e.operatingPoint.targetVoutV, 'V', 4)})` : fmt(e.efficiency, '%', 4);
  return renderTable(
    [{ title: 'Quantity' }, { title: 'Value', align: 'right' }],
    [
      ['Efficiency', steady(efficiency)],
      ['Input power', steady(fmt(e.inputPower, 'W', 4))],
      ['Output power', steady(fmt(e.outputPower, 'W', 4))],
      ['Total loss', steady(fmt(e.totalLoss, 'W', 4))],
      ['Duty cycle', fmt(e.dutyCycle, '', 4)],
      ['Conduction mode', e.conductionMode],
      ['Converged', e.converged ? `yes (${e.iterations} iterations)` : `NO (${e.iterations} iterations)`],
    ],
  );
}

function ledger(e: Evaluation): string {
  const rows = e.losses.map((t) => [
    t.part,
    t.mechanism,
    fmt(t.watts, 'W', 3),
    e.totalLoss > 0 ? fmt(t.watts / e.totalLoss, '%', 3) : '—',
    t.formula,
  ]);
  rows.push(['total', '', fmt(e.totalLoss, 'W', 4), '', '']);
  return renderTable(
    [{ title: 'Part' }, { title: 'Mechanism' }, { title: 'Loss', align: 'right' }, { title: 'Share', align: 'right' }, { title: 'Formula' }],
    rows,
  );
}

function temperatures(e: Evaluation): string {
  return renderTable(
    [
      { title: 'Part' },
      { title: 'Kind' },
      { title: 'Temperature', align: 'right' },
      { title: 'Limit', align: 'right' },
      { title: 'Margin', align: 'right' },
      { title: 'Surface', align: 'right' },
      { title: 'Dissipation', align: 'right' },
      { title: 'Path' },
    ],
    e.temperatures.map((t) => [
      t.part,
      t.kind,
      fmt(t.celsius, '°C', 4),
      fmt(t.limit, '°C', 4),
      kelvin(t.marginK),
      fmt(t.surfaceC, '°C', 4),
      fmt(t.dissipationW, 'W', 3),
      t.path,
    ]),
  );
}

function heatsinks(e: Evaluation): string {
  return renderTable(
    [{ title: 'Heatsink' }, { title: 'Temperature', align: 'right' }, { title: 'Dissipation', align: 'right' }],
    e.heatsinks.map((h) => [`${h.id} (${h.name})`, fmt(h.celsius, '°C', 4), fmt(h.dissipationW, 'W', 3)]),
  );
}

function hazards(e: Evaluation): string {
  if (e.hazards.length === 0) return '  (no touchable parts)';
  return renderTable(
    [{ title: 'Part' }, { title: 'Surface', align: 'right' }, { title: 'Limit', align: 'right' }, { title: 'Margin', align: 'right' }, { title: 'Status' }, { title: 'Limit row' }],
    e.hazards.map((h) => [
      h.part,
      fmt(h.surfaceC, '°C', 4),
      fmt(h.row.limitC, '°C', 4),
      kelvin(h.marginK),
      h.status === 'runaway' ? 'RUNAWAY: UNKNOWN' : h.exceeded ? 'TOO HOT TO TOUCH' : 'ok',
      `${h.row.standard} ${h.row.clause}`.trim() + (h.row.recalled ? ' (value recalled, not confirmed)' : ''),
    ]),
  );
}

function checks(list: readonly RatingCheck[]): string {
  return renderTable(
    [{ title: 'Part' }, { title: 'Check' }, { title: 'Value', align: 'right' }, { title: 'Limit', align: 'right' }, { title: 'Margin', align: 'right' }, { title: 'Status' }],
    list.map((c) => [c.part, c.check, fmt(c.value, c.unit, 4), fmt(c.limit, c.unit, 4), fmt(c.marginFraction, '%', 3), c.ok ? 'ok' : 'NOT OK']),
  );
}

export function renderEvaluation(design: Design, e: Evaluation, notices: readonly DesignNotice[]): string {
  const out = [
    `WattLedger evaluation: ${design.name}`,
    `Conditions: ${describeConditions(e.conditions)}.`,
    '',
    section('Summary', summary(e)),
    section('Loss ledger', runsAway(e) ? `  ${RUNAWAY}: the losses below are taken at the runaway limit (the part at its limit + 100 K), not at an operating point.\n${ledger(e)}` : ledger(e)),
    section('Temperatures', runsAway(e) ? `  ${RUNAWAY}: the temperatures below are capped at each part's limit + 100 K.\n${temperatures(e)}` : temperatures(e)),
  ];
  if (e.heatsinks.length > 0) out.push(section('Heatsinks', heatsinks(e)));
  out.push(section('Burn hazards', hazards(e)));
  if (e.checks.length > 0) out.push(section('Rating checks', checks(e.checks)));
  out.push(section('Warnings', renderWarnings(e.warnings)));
  if (notices.length > 0) out.push(section('Notes on the design file', formatNotices(notices)));
  out.push(CAUTION_LINE);
  return out.join('\n');
}
