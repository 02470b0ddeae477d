/**
 * Output of `wattledger compare`: side-by-side ledgers at the chosen load, temperatures, crossover loads
 * and a thinned table of total loss against load for every part; or the same as JSON.
 */
import type { Comparison, Design } from '../../../shared-model/index.ts';
import { formatEngineering as fmt } from '../../../shared-model/index.ts';
import { CAUTION_LINE, CAUTIONS } from '../cautions.ts';
import { renderTable, section } from '../table.ts';

export function compareJson(design: Design, c: Comparison): unknown {
  return {
    command: 'compare',
    design: design.name,
    role: c.role,
    load: c.loadA,
    units: { load: 'A', totalLoss: 'W', temperatures: '°C', efficiency: 'ratio' },
    alternatives: c.alternatives.map((a) => ({
      partId: a.partId,
      partName: a.partName,
      atLoad: {
        regulated: a.evaluation.regulated,
        voutV: a.evaluation.operatingPoint.voutV,
        efficiency: a.evaluation.efficiency,
        totalLoss: a.evaluation.totalLoss,
        converged: a.evaluation.converged,
        losses: a.evaluation.losses.map((l) => ({ part: l.part, mechanism: l.mechanism, watts: l.watts })),
        temperatures: a.evaluation.temperatures.map((t) => ({ part: t.part, celsius: t.celsius, limit: t.limit, marginK: t.marginK })),
        warnings: a.evaluation.warnings.map((w) => ({ code: w.code, severity: w.severity, message: w.message })),
      },
    })),
    sweep: {
      loads: c.loadsA,
      totalLoss: c.alternatives.map((a) => a.sweep.points.map((p) => p.totalLoss)),
      efficiency: c.alternatives.map((a) => a.sweep.points.map((p) => p.efficiency)),
      lossDifferenceFromFirst: c.alternatives.map((a) => a.lossDifferenceW),
      regulated: c.alternatives.map((a) => a.sweep.points.map((p) => p.regulated)),
      // A load where no part regulates with a steady state has no winner: "none".
      winners: c.winners.map((k) => c.alternatives[k]?.partId ?? 'none'),
    },
    crossovers: c.crossovers,
    cautions: CAUTIONS,
  };
}

export function renderComparison(design: Design, c: Comparison): string {
  const alts = c.alternatives;
  const head = [{ title: 'Part' }, { title: 'Mechanism' }, ...alts.map((a) => ({ title: a.partId, align: 'right' as const }))];
  const keys: [string, string][] = [];
  for (const a of alts) for (const l of a.evaluation.losses) if (!keys.some(([p, m]) => p === l.part && m === l.mechanism)) keys.push([l.part, l.mechanism]);
  const watts = (k: number, part: string, mech: string) =>
    alts[k]?.evaluation.losses.filter((l) => l.part === part && l.mechanism === mech).reduce((s, l) => s + l.watts, 0) ?? 0;
  const ledger = renderTable(head, [
    ...keys.map(([p, m]) => [p, m, ...alts.map((_, k) => fmt(watts(k, p, m), 'W', 3))]),
    ['total', '', ...alts.map((a) => fmt(a.evaluation.totalLoss, 'W', 4))],
    ['efficiency', '', ...alts.map((a) => fmt(a.evaluation.efficiency, '%', 4))],
  ]);
  const parts = alts[0]?.evaluation.temperatures.map((t) => t.part) ?? [];
  const temps = renderTable(
    [{ title: 'Part' }, ...alts.map((a) => ({ title: a.partId, align: 'right' as const }))],
    parts.map((p) => [p, ...alts.map((a) => {
      const t = a.evaluation.temperatures.find((x) => x.part === p);
      return t ? `${fmt(t.celsius, '°C', 4)} (${fmt(t.marginK, 'K', 3)})` : '—';
    })]),
  );
  const crossings = c.crossovers.length
    ? c.crossovers.map((x) => `  at ${fmt(x.load, 'A', 4)}: ${x.fromPartId} has the lower loss below, ${x.toPartId} above`).join('\n')
    : `  none in the swept range: ${alts[c.winners.find((k) => k >= 0) ?? -1]?.partId ?? 'no part'} has the lower loss wherever a part regulates`;
  const step = Math.max(1, Math.ceil(c.loadsA.length / 15));
  const rows = c.loadsA
    .map((load, i) => [fmt(load, 'A', 4), ...alts.map((a) => fmt(a.sweep.points[i]?.totalLoss ?? NaN, 'W', 3)), alts[c.winners[i] ?? -1]?.partId ?? 'none'])
    .filter((_, i) => i % step === 0 || i === c.loadsA.length - 1);
  const overlay = renderTable([{ title: 'Load', align: 'right' }, ...alts.map((a) => ({ title: a.partId, align: 'right' as const })), { title: 'Lower loss' }], rows);
  return [
    `${design.name}: ${alts.length} parts compared in the ${c.role} role`,
    '',
    section(`Loss ledger at ${fmt(c.loadA, 'A', 4)}`, ledger),
    section('Temperatures (margin to the derated limit)', temps),
    section('Crossover loads', crossings),
    section('Total loss against load', overlay),
    CAUTION_LINE,
  ].join('\n');
}
