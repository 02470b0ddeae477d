import { describe, expect, it } from 'vitest';
import { EXIT } from '../../../src-main/cli/io.ts';
import { runCli } from '../../../src-main/cli/main.ts';
import { memoryIo } from './memory-io.ts';
import { demoText } from '../../helpers/demo.ts';
import { closeTo } from '../../helpers/close-to.ts';

/** K(N, D), docs/methods.md §15 (multiphase-VRM literature, from memory). */
const K = (N: number, D: number): number => {
  const m = Math.floor(N * D);
  return (N * (D - m / N) * ((m + 1) / N - D)) / (D * (1 - D));
};

describe('wattledger with the four-phase demo (issue 13 §1)', () => {
  it('sweep --json carries a phaseShedding landmark list and one efficiency curve per phase count', async () => {
    const io = memoryIo({ 'd.json': demoText('multiphase-buck') });
    expect(await runCli(['sweep', 'd.json', '--json', '--points', '16'], io)).toBe(EXIT.ok);
    const out = JSON.parse(io.stdout);
    const s = out.phaseShedding;
    expect(s.phases).toBe(4);
    expect(s.enabled).toBe(true);
    expect(s.curves.map((c: { activePhases: number }) => c.activePhases)).toEqual([1, 2, 3, 4]);
    expect(s.landmarks.map((l: { fromPhases: number }) => l.fromPhases)).toEqual([4, 3, 2]);
    for (const l of s.landmarks) {
      expect(l.found).toBe(true);
      expect(l.shedBelowA).toBeLessThan(l.crossoverA);
      expect(l.addAboveA).toBeGreaterThan(l.crossoverA);
      closeTo(l.addAboveA - l.shedBelowA, 0.1 * l.crossoverA, 1e-9); // the demo's 10 % band (topology.phaseShedding)
    }
    // Crossovers n → n − 1 at I* ∝ √(n(n − 1)) for per-phase loss P0 + a·I/n + b·(I/n)² (docs/methods.md §12 model, §15 worked; 10 %: DCM and temperature)
    const c = (n: number) => s.landmarks.find((l: { fromPhases: number }) => l.fromPhases === n).crossoverA;
    closeTo(c(3) / c(2), Math.sqrt(3), 0.1);
    // With shedding, the sweep's light-load point is the envelope: better than all four phases at the same load.
    const light = out.points[0];
    const allFour = s.curves[3].points[0];
    expect(light.load).toBeCloseTo(allFour.loadA, 9);
    expect(light.efficiency).toBeGreaterThan(allFour.efficiency);
    expect(out.cautions.length).toBeGreaterThan(0);
  });

  it('evaluate --json adds per-phase rows and the shared banks’ summed currents', async () => {
    const io = memoryIo({ 'd.json': demoText('multiphase-buck') });
    expect(await runCli(['evaluate', 'd.json', '--json'], io)).toBe(EXIT.ok);
    const out = JSON.parse(io.stdout);
    const p = out.phases;
    expect(p.phases).toBe(4);
    expect(p.activePhases).toBe(4);
    closeTo(p.phaseLoadsA[0], 1.05 * 15, 1e-12); // the demo's ±5 % sharing on phase 1
    expect(new Set(p.rows.map((r: { phase: number | string }) => r.phase))).toEqual(new Set([1, 2, 3, 4, 'shared']));
    closeTo(out.totalLoss, p.rows.reduce((a: number, r: { watts: number }) => a + r.watts, 0), 1e-9); // first law: the rows are the ledger
    const o = p.sharedCurrents.outputCapacitor;
    // Phase 1 carries 5 % more, so its L(I) and ripple differ slightly from the others': 3 %.
    closeTo(o.peakToPeakA, K(4, out.dutyCycle) * o.onePhasePeakToPeakA, 0.03); // docs/methods.md §15 (VRM literature, from memory)
    closeTo(p.rippleFrequencyHz, 4 * 400e3, 1e-12); // ripple at N·fs (docs/methods.md §15)
  });
});
