/**
 * The sizing and the design checks as plain-text tables for `wattledger size`: what each part must be
 * (value, corner, why), the crossover sentence, the checks (value, limit, result, margin, corner), the
 * sentences of the checks that do not pass, the notes and the cautions.
 */
import type { DesignCheck, DesignNotice, DesignReview } from '../../../shared-model/index.ts';
import { formatEngineering as fmt, sizingRows } from '../../../shared-model/index.ts';
import { CAUTION_LINE } from '../cautions.ts';
import { formatNotices } from '../design-file.ts';
import { renderTable, section } from '../table.ts';

const RESULT: Record<DesignCheck['status'], string> = { pass: 'pass', warn: 'WARN', fail: 'FAIL' };

function sizingTable(review: DesignReview): string {
  const s = review.sizing;
  const rows = sizingRows(s).map(({ label, value: v }) =>
    v ? [label, fmt(v.value, v.unit, 4), v.corner, v.reason] : [label, '—', '', 'not sized (see the notes)']);
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
