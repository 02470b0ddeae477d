import { describe, expect, it } from 'vitest';
import { evaluatePhases, phaseShedding } from '../../../shared-model/index.ts';
import { phaseLabel, phaseLossTable, phaseTemperatureRows, sheddingChart } from '../../../src-renderer/results/phase-tables.ts';
import { closeTo } from '../../helpers/close-to.ts';
import { demoDesign } from '../../helpers/demo.ts';

describe('per-phase ledger and temperatures of the 4-phase demo at rated load (issue 13 §1)', () => {
  const design = demoDesign('multiphase-buck'); // invented: 12 → 1.8 V, 60 A, 4 phases, ±5 % sharing
  const p = evaluatePhases(design);
  const table = phaseLossTable(p);

  it('has a column per active phase, one for the shared parts and the total; phase 1 named as the worst', () => {
    expect(table.columns.map((c) => c.phase)).toEqual([1, 2, 3, 4, 'shared', 'total']);
    expect(table.columns[0]!.label).toBe('Phase 1 (worst, +5 %)'); // the design's phaseMismatch 0.05
    expect(table.columns[1]!.label).toBe('Phase 2');
    closeTo(table.columns[0]!.loadA!, (60 / 4) * 1.05, 1e-12); // worst phase (1 + m)·I/N, the mismatch's definition (schema)
  });

  it('adds up: each phase column to its phase loss, the total column to input minus output power', () => {
    p.phaseLossW.forEach((w, k) => closeTo(table.totals[k]!, w, 1e-12, 1e-15));
    closeTo(table.totals[4]!, p.sharedLossW, 1e-12, 1e-15);
    closeTo(table.totals[5]!, p.inputPower - p.outputPower, 1e-9, 1e-12); // first law: Pin = Pout + ΣPloss
    for (const row of table.rows) {
      const sum = row.cells.slice(0, -1).reduce<number>((s, v) => s + (v ?? 0), 0);
      closeTo(row.cells[row.cells.length - 1]!, sum, 1e-12, 1e-15);
    }
  });

  it('puts the switch, rectifier and inductor in every phase and the capacitor banks only in the shared column', () => {
    const cells = (part: string) => table.rows.find((r) => r.part === part)!.cells;
    for (const part of ['switch', 'rectifier', 'inductor']) expect(cells(part).slice(0, 4).every((v) => v !== null && v > 0)).toBe(true);
    for (const part of ['inputCapacitor', 'outputCapacitor']) expect(cells(part).slice(0, 4).every((v) => v === null)).toBe(true);
    // The worst phase loses more in its switch than an even phase: conduction ∝ I² (textbook I²R).
    expect(cells('switch')[0]!).toBeGreaterThan(cells('switch')[1]!);
  });

  it('lists one temperature row per part and phase, shared parts once, and the worst phase hottest', () => {
    const rows = phaseTemperatureRows(p);
    expect(rows.filter((r) => r.part === 'switch').map((r) => r.phase)).toEqual([1, 2, 3, 4]);
    expect(rows.filter((r) => r.part === 'outputCapacitor').map((r) => r.phase)).toEqual(['shared']);
    const sw = rows.filter((r) => r.part === 'switch');
    expect(sw[0]!.celsius).toBeGreaterThan(sw[1]!.celsius); // more current, more loss, hotter (same θ): common practice
    expect(new Set(rows.map((r) => r.key)).size).toBe(rows.length);
  });

  it('names a single even phase without a worst tag', () => {
    expect(phaseLabel({ activePhases: 2, phaseLoadsA: [10, 10] }, 1)).toBe('Phase 1');
    expect(phaseLabel({ activePhases: 2, phaseLoadsA: [10.5, 9.5] }, 1)).toBe('Phase 1 (worst, +5 %)');
    expect(phaseLabel({ activePhases: 2, phaseLoadsA: [10, 10] }, 'shared')).toBe('Shared');
  });
});

describe('the shedding chart of the 4-phase demo', () => {
  const s = phaseShedding(demoDesign('multiphase-buck'), { points: 24 });
  const chart = sheddingChart(s);

  it('draws one curve per active-phase count and the envelope, on the engine’s load points', () => {
    expect(chart.series.map((x) => x.label)).toEqual(['1 phase', '2 phases', '3 phases', '4 phases', 'Best phase count (envelope)']);
    expect(chart.xValues).toEqual(s.curves[0]!.points.map((q) => q.loadA));
    // The envelope is at least every usable curve at each load (its definition: least loss → highest efficiency at the same output).
    const env = chart.series[4]!.values;
    for (const c of chart.series.slice(0, 4))
      c.values.forEach((v, i) => {
        if (v !== null && env[i] !== null) expect(env[i]!).toBeGreaterThanOrEqual(v - 1e-12);
      });
  });

  it('marks each crossover with a labelled line and its hysteresis edges unlabelled, and says each in words', () => {
    const found = s.landmarks.filter((l) => l.found);
    expect(found.length).toBeGreaterThan(0);
    expect(chart.markers.filter((m) => m.label !== '').map((m) => m.label)).toEqual(found.map((l) => `${l.fromPhases} → ${l.toPhases}`));
    for (const l of found) {
      const line = chart.lines.find((t) => t.startsWith(`${l.fromPhases} → ${l.toPhases}`))!;
      expect(line).toContain('hysteresis');
      expect(line).toContain(`${l.crossoverA!.toPrecision(3)} A`);
      // The band is centred on the crossover: shed below I·(1 − h/2), add back above I·(1 + h/2) (shedding.ts definition).
      closeTo(l.shedBelowA!, l.crossoverA! * (1 - s.hysteresisFraction / 2), 1e-12);
    }
  });
});
