/**
 * Output of `wattledger sweep`: the JSON record (points with load, regulated, efficiency, totalLoss,
 * temperatures by part; landmarks found with load and value, or not found with a reason; figures of merit
 * available with a value, or not with a reason — never a null), the CSV table, and the plain-text view.
 * A point that is not regulated (ledger/regulated.ts) says so in every view: `regulated: false` with the
 * output reached in JSON and CSV, and a mark in the table.
 */
import type { Design, FiguresOfMerit, Landmark, Landmarks, LoadSweep, SweepPoint } from '../../../shared-model/index.ts';
import type { CsvCell } from '../../../shared-model/index.ts';
import { csvLines, formatEngineering as fmt, isUsablePoint, unusableReason } from '../../../shared-model/index.ts';
import { CAUTION_LINE, CAUTIONS } from '../cautions.ts';
import { renderTable, section } from '../table.ts';
import { landmarksJson } from './landmark-json.ts';

export function sweepJson(design: Design, sweep: LoadSweep, landmarks: Landmarks, figures: FiguresOfMerit): unknown {
  const c = sweep.columns;
  return {
    command: 'sweep',
    design: design.name,
    conditions: { vinV: sweep.vinV, ambientC: sweep.ambientC, switchingFrequencyHz: sweep.switchingFrequencyHz },
    ratedLoadA: sweep.ratedLoadA,
    spacing: sweep.spacing,
    units: { load: 'A', efficiency: 'ratio', totalLoss: 'W', temperatures: '°C', margins: 'K', losses: 'W' },
    points: sweep.points.map((p) => (runaway(p) ? runawayGap(p) : {
      load: p.loadA,
      regulated: p.regulated,
      voutV: p.voutV,
      efficiency: p.efficiency,
      totalLoss: p.totalLoss,
      inputPower: p.inputPower,
      outputPower: p.outputPower,
      dutyCycle: p.dutyCycle,
      mode: p.mode,
      equivalentSwitchingHz: p.equivalentSwitchingHz,
      converged: p.converged,
      temperatures: Object.fromEntries(c.temperatures.map((t, j) => [t.part, p.temperaturesC[j]])),
      marginsK: Object.fromEntries(c.temperatures.map((t, j) => [t.part, p.marginsK[j]])),
      losses: c.losses.map((l, j) => ({ part: l.part, mechanism: l.mechanism, watts: p.losses[j] })),
      warnings: [...new Set(p.warnings.map((w) => w.code))],
    })),
    landmarks: landmarksJson(landmarks),
    figuresOfMerit: figures,
    cautions: CAUTIONS,
  };
}

/** The point has no steady state (thermal runaway): the sweep shows a gap there, with the reason. */
function runaway(p: SweepPoint): boolean {
  return p.warnings.some((w) => w.code === 'thermal-runaway');
}

/**
 * A runaway point in JSON: no efficiency, loss or temperature (they would describe no steady state,
 * issue 10 §5) — the load, the flags and the reason (the runaway warning's first sentence).
 */
function runawayGap(p: SweepPoint): Record<string, unknown> {
  const w = p.warnings.find((x) => x.code === 'thermal-runaway');
  const reason = (w?.message ?? 'Thermal runaway.').split(' — ')[0] ?? '';
  return {
    load: p.loadA,
    regulated: p.regulated,
    converged: false,
    steadyState: false,
    reason: `${reason}: no steady state at this load, so no efficiency, loss or temperature is given.`,
    warnings: [...new Set(p.warnings.map((x) => x.code))],
  };
}

/**
 * One row per point; column names carry their units. Written by the shared CSV writer (RFC 4180, CRLF,
 * text cells neutralised against spreadsheet formula injection: shared-model/csv/write.ts).
 */
export function sweepCsv(sweep: LoadSweep): string {
  const c = sweep.columns;
  const head = [
    'load_A', 'efficiency', 'total_loss_W', 'input_W', 'output_W', 'duty_cycle', 'mode', 'converged', 'regulated', 'vout_V',
    ...c.temperatures.map((t) => `T_${t.part}_C`),
    ...c.losses.map((l) => `loss_${l.part}_${l.mechanism.replace(/ /g, '_')}_W`),
    'warnings',
  ];
  // A runaway point is a gap: empty cells where a steady state's numbers would be (its warnings say why).
  const rows = sweep.points.map((p): CsvCell[] => {
    const codes = [...new Set(p.warnings.map((w) => w.code))].join(' ');
    if (runaway(p)) return [p.loadA, '', '', '', '', '', '', 'false', String(p.regulated), '', ...p.temperaturesC.map(() => ''), ...p.losses.map(() => ''), codes];
    return [
      p.loadA, p.efficiency, p.totalLoss, p.inputPower, p.outputPower, p.dutyCycle, p.mode, String(p.converged), String(p.regulated), p.voutV,
      ...p.temperaturesC, ...p.losses, codes,
    ];
  });
  return csvLines([head, ...rows]);
}

function landmarkLine(name: string, l: Landmark, value: (v: number) => string): string[] {
  if (l.load === null) return [name, '—', '—', l.reason ?? ''];
  return [name, fmt(l.load, 'A', 4), l.value === null ? '—' : value(l.value), l.note ?? ''];
}

export function renderSweep(design: Design, sweep: LoadSweep, m: Landmarks, figures: FiguresOfMerit): string {
  const pct = (v: number) => fmt(v, '%', 4);
  const tc = m.thermalCeiling;
  const landmarkRows = [
    landmarkLine('Peak efficiency', m.peak, pct),
    landmarkLine('Light-load knee', m.knee, pct),
    landmarkLine('CCM/DCM boundary', m.modeBoundary, pct),
    ...(design.topology.lightLoad === 'pulse-skipping' ? [landmarkLine('Pulse skipping (PFM) below', m.pulseSkipping, pct)] : []),
    landmarkLine(`Thermal ceiling${tc.part ? ` (${tc.part}, ${tc.limitKind})` : ''}`, tc, (v) => fmt(v, '°C', 4)),
    landmarkLine(`Regulation limit${m.regulationLimit.cause ? ` (${m.regulationLimit.cause})` : ''}`, m.regulationLimit, (v) => `duty ${fmt(v, '', 3)}`),
  ];
  const marks = renderTable([{ title: 'Landmark' }, { title: 'Load', align: 'right' }, { title: 'Value', align: 'right' }, { title: 'Note' }], landmarkRows);
  const fom = renderTable(
    [{ title: 'Load' }, { title: 'Efficiency', align: 'right' }, { title: 'Note' }],
    [
      ...figures.points.map((p) => [
        `${fmt(p.fractionOfRated, '%', 3)} (${fmt(p.loadA, 'A', 3)})`,
        isUsablePoint(p) ? pct(p.efficiency) : '—',
        unusableReason({ ...p, targetVoutV: design.spec.voutV }),
      ]),
      ['Average of 25/50/75/100 %', figures.averageEfficiency.available ? pct(figures.averageEfficiency.value) : '—', figures.averageEfficiency.available ? '' : figures.averageEfficiency.reason],
    ],
  );
  const step = Math.max(1, Math.ceil(sweep.points.length / 20));
  const shown = sweep.points.filter((_, i) => i % step === 0 || i === sweep.points.length - 1);
  const hottest = (j: number[]) => j.reduce((best, t, i) => (t > j[best] ? i : best), 0);
  const rows = shown.map((p) => {
    const h = hottest(p.temperaturesC);
    const col = sweep.columns.temperatures[h];
    return [
      fmt(p.loadA, 'A', 4), pct(p.efficiency), fmt(p.totalLoss, 'W', 3), p.mode,
      col ? `${col.part} ${fmt(p.temperaturesC[h], '°C', 4)}` : '—',
      fmt(Math.min(...p.marginsK), 'K', 3),
      [...(p.regulated ? [] : [`not regulated (Vout ${fmt(p.voutV, 'V', 4)})`]), ...new Set(p.warnings.filter((w) => w.severity !== 'info').map((w) => w.code))].join(' '),
    ];
  });
  const table = renderTable(
    [{ title: 'Load', align: 'right' }, { title: 'Efficiency', align: 'right' }, { title: 'Loss', align: 'right' }, { title: 'Mode' }, { title: 'Hottest part' }, { title: 'Least margin', align: 'right' }, { title: 'Warnings' }],
    rows,
  );
  return [
    `${design.name}: load sweep at Vin ${fmt(sweep.vinV, 'V', 4)}, fs ${fmt(sweep.switchingFrequencyHz, 'Hz', 4)}, ambient ${fmt(sweep.ambientC, '°C', 4)}`,
    `${sweep.points.length} points, ${fmt(sweep.points[0]?.loadA ?? 0, 'A', 3)} … ${fmt(sweep.points.at(-1)?.loadA ?? 0, 'A', 3)}, ${sweep.spacing} spacing; every point electro-thermal.`,
    '',
    section('Landmarks', `${marks}\n${m.knee.definition}`),
    section('Figures of merit', `${fom}\n${figures.source}`),
    section(`Points (every ${step}${step === 1 ? 'st' : 'th'}; --csv or --json for all)`, table),
    CAUTION_LINE,
  ].join('\n');
}
