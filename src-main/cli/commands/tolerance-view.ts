/**
 * Output of `wattledger tolerance`: worst-case corners (worst efficiency, worst temperature, each part's
 * hottest corner) and the Monte Carlo distributions with their seed; or the same as JSON.
 */
import type { Design, MonteCarlo, WorstCase } from '../../../shared-model/index.ts';
import { formatEngineering as fmt } from '../../../shared-model/index.ts';
import { CAUTION_LINE, CAUTIONS } from '../cautions.ts';
import { renderTable, section } from '../table.ts';

export function toleranceJson(design: Design, w: WorstCase, mc: MonteCarlo): unknown {
  const corner = (c: WorstCase['nominal']) => ({ label: c.label, variation: c.variation, efficiency: c.efficiency, totalLoss: c.totalLoss, converged: c.converged, temperatures: c.temperatures, worstPart: c.worstPart, worstMarginK: c.worstMarginK, warnings: c.warningCodes });
  return {
    command: 'tolerance',
    design: design.name,
    load: w.loadA,
    tolerances: w.tolerances,
    units: { load: 'A', efficiency: 'ratio', temperatures: '°C', margins: 'K', totalLoss: 'W' },
    worstCase: {
      nominal: corner(w.nominal),
      cornerCount: w.corners.length,
      worstEfficiency: corner(w.worstEfficiency),
      worstTemperature: corner(w.worstTemperature),
      hottestByPart: w.hottestByPart,
      caution: w.caution,
    },
    monteCarlo: mc,
    cautions: CAUTIONS,
  };
}

const pct = (v: number) => fmt(v, '%', 4);
const share = (v: number) => `${(v * 100).toFixed(1)} %`;

export function renderTolerance(design: Design, w: WorstCase, mc: MonteCarlo): string {
  const t = w.tolerances;
  const spreads = [
    `Vin ${fmt(t.vinV.min, 'V', 4)} … ${fmt(t.vinV.max, 'V', 4)}`,
    `ambient ${fmt(t.ambientC.min, '°C', 4)} … ${fmt(t.ambientC.max, '°C', 4)}`,
    `RDS(on) ±${share(t.rdsOnFraction)}`,
    `DCR ±${share(t.dcrFraction)}`,
    `ESR ±${share(t.esrFraction)}`,
    `L ±${share(t.inductanceFraction)}`,
    `fs ±${share(t.frequencyFraction)}`,
  ].join(', ');
  const corners = renderTable(
    [{ title: '' }, { title: 'Efficiency', align: 'right' }, { title: 'Least margin', align: 'right' }, { title: 'Corner' }],
    [
      ['nominal', pct(w.nominal.efficiency), `${fmt(w.nominal.worstMarginK, 'K', 3)} ${w.nominal.worstPart ?? ''}`, w.nominal.label],
      ['worst efficiency', pct(w.worstEfficiency.efficiency), `${fmt(w.worstEfficiency.worstMarginK, 'K', 3)} ${w.worstEfficiency.worstPart ?? ''}`, w.worstEfficiency.label],
      ['worst temperature', pct(w.worstTemperature.efficiency), `${fmt(w.worstTemperature.worstMarginK, 'K', 3)} ${w.worstTemperature.worstPart ?? ''}`, w.worstTemperature.label],
    ],
  );
  const hottest = renderTable(
    [{ title: 'Part' }, { title: 'Hottest', align: 'right' }, { title: 'Margin', align: 'right' }, { title: 'Corner' }],
    w.hottestByPart.map((h) => [h.part, fmt(h.celsius, '°C', 4), fmt(h.marginK, 'K', 3), h.corner]),
  );
  const e = mc.efficiency.summary;
  const dist = renderTable(
    [{ title: 'Quantity' }, { title: 'Mean', align: 'right' }, { title: 'Std dev', align: 'right' }, { title: '1 %', align: 'right' }, { title: '99 %', align: 'right' }, { title: 'Over derated limit', align: 'right' }, { title: 'Over touch limit', align: 'right' }],
    [
      ['efficiency', pct(e.mean), pct(e.standardDeviation), pct(e.p01), pct(e.p99), '', ''],
      ...mc.temperatures.map((p) => [
        p.part, fmt(p.summary.mean, '°C', 4), fmt(p.summary.standardDeviation, 'K', 3), fmt(p.summary.p01, '°C', 4), fmt(p.summary.p99, '°C', 4),
        share(p.fractionOverDerated), p.fractionOverTouch === null ? '—' : share(p.fractionOverTouch),
      ]),
    ],
  );
  const target = mc.efficiencyTarget ? `Below the efficiency target ${pct(mc.efficiencyTarget.target)}: ${share(mc.efficiencyTarget.fractionBelow)} of samples.` : 'No efficiency target in the design.';
  return [
    `${design.name}: tolerance analysis at ${fmt(w.loadA, 'A', 4)}`,
    `Tolerances: ${spreads}.`,
    '',
    section(`Worst-case corners (${w.corners.length})`, `${corners}\n${w.caution}`),
    section('Hottest corner of each part', hottest),
    section(
      `Monte Carlo: ${mc.samples} samples, seed ${mc.seed} (--seed to change), ${mc.distribution} spreads, Vin and ambient ${mc.spreadConditions ? 'varied' : 'held'}`,
      `${dist}\n${target}\nNot regulating: ${share(mc.fractionNotRegulating)} of samples.`,
    ),
    CAUTION_LINE,
  ].join('\n');
}
