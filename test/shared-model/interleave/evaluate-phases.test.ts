import { describe, expect, it } from 'vitest';
import { evaluatePhases, validateDesign, type Design } from '../../../shared-model/index.ts';
import { waveformStats } from '../../../shared-model/waveform/stats.ts';
import { closeTo } from '../../helpers/close-to.ts';
import { makeDesign, type DesignSketch } from '../../helpers/designs.ts';
import { allDirect } from '../../helpers/ledger-designs.ts';

/** An invented 12 V → 3 V synchronous buck, 20 A in two phases of 10 A, 500 kHz, 4.7 µH per phase. */
const SKETCH: DesignSketch = {
  kind: 'buck', rectifier: 'synchronous', vinV: 12, voutV: 3, loadA: 20, fsHz: 500e3, inductanceH: 4.7e-6,
  switchOhm: 0.002, rectifierOhm: 0.002, dcr20Ohm: 0.001, idRatingA: 100, outputCapacitanceF: 100e-6,
};

function multiphase(phases: number, edit?: (d: Design) => void, sketch: Partial<DesignSketch> = {}): Design {
  const d = makeDesign({ ...SKETCH, ...sketch });
  d.topology.phases = phases;
  allDirect(d, 0.5);
  edit?.(d);
  return d;
}

/** K(N, D), docs/methods.md §15 (multiphase-VRM literature, from memory). */
const K = (N: number, D: number): number => {
  const m = Math.floor(N * D);
  return (N * (D - m / N) * ((m + 1) / N - D)) / (D * (1 - D));
};

describe('evaluatePhases: a 2-phase buck near D = 0.25 (issue 13 "Done when")', () => {
  const d = multiphase(2);
  const r = evaluatePhases(d);
  const D = r.dutyCycle;
  const rippleOnePhase = ((12 - 3) * D) / (4.7e-6 * 500e3); // ΔI = (Vin − Vo)·D/(L·fs), docs/methods.md §1

  it('runs near D = 0.25 with 10 A per phase', () => {
    expect(Math.abs(D - 0.25)).toBeLessThan(0.01);
    expect(r.phaseLoadsA).toEqual([10, 10]);
    expect(r.rippleFrequencyHz).toBe(1e6);
  });

  it('has the output ripple current K(2, D)·ΔI within 1 %', () => {
    closeTo(r.shared.outputCapacitor.peakToPeakA, K(2, D) * rippleOnePhase, 0.01, 0, { D }); // docs/methods.md §15 (VRM literature, from memory)
    // The output bank carries the triangle left over: RMS = pk-pk/(2√3) (docs/methods.md §1, triangle RMS).
    closeTo(r.shared.outputCapacitor.rmsA, (K(2, D) * rippleOnePhase) / (2 * Math.sqrt(3)), 0.01, 0, { D });
  });

  it('has the input-capacitor RMS Io·√((D − m/N)((m + 1)/N − D)) within 1 %', () => {
    const m = Math.floor(2 * D);
    // Two-level input current of N flat-topped phases (docs/methods.md §15; Zhou et al., IEEE TPEL 15(6) 2000 — from memory).
    closeTo(r.shared.inputCapacitor.rmsA, 20 * Math.sqrt((D - m / 2) * ((m + 1) / 2 - D)), 0.01, 0, { D });
    // …against the one-phase figure Io·√(D(1 − D)) (docs/methods.md §1), which it must undercut by far.
    expect(r.shared.inputCapacitor.rmsA).toBeLessThan(0.6 * 20 * Math.sqrt(D * (1 - D)));
  });

  it('books the output bank ESR loss at the summed RMS: I²rms·ESR/count', () => {
    const esr = d.parts.outputCapacitor.part.esrOhm;
    const watts = r.rows.filter((t) => t.phase === 'shared' && t.part === 'outputCapacitor').reduce((a, t) => a + t.watts, 0);
    closeTo(watts, r.shared.outputCapacitor.rmsA ** 2 * esr / d.parts.outputCapacitor.count, 1e-6); // I²R of a parallel bank, common practice (esrTempCo 0)
  });
});

describe('evaluatePhases: per-phase ledger, thermal and sharing', () => {
  it('puts one row set per phase and the shared parts once, and the totals add up', () => {
    const r = evaluatePhases(multiphase(3));
    for (const k of [1, 2, 3]) expect(r.rows.filter((t) => t.phase === k && t.part === 'switch').length).toBeGreaterThan(0);
    expect(r.rows.filter((t) => t.phase === 'shared' && t.part === 'controller' && t.mechanism === 'quiescent')).toHaveLength(1);
    closeTo(r.totalLoss, r.rows.reduce((a, t) => a + t.watts, 0), 1e-12); // energy bookkeeping (first law)
    closeTo(r.inputPower, r.outputPower + r.totalLoss, 1e-12); // first law
    closeTo(r.outputPower, 3 * 20, 1e-9); // Pout = Vout·Io
  });

  it('cuts the conduction loss to about 1/N of one phase carrying everything (I²R, textbook)', () => {
    const condW = (r: ReturnType<typeof evaluatePhases>) =>
      r.rows.filter((t) => (t.part === 'switch' || t.part === 'rectifier') && t.mechanism === 'conduction').reduce((a, t) => a + t.watts, 0);
    const one = evaluatePhases(multiphase(1));
    for (const N of [2, 4]) {
      const many = evaluatePhases(multiphase(N));
      // N·(I/N)²·R = I²R/N; the ripple term ΔI²/12 grows in relative size (Erickson & Maksimović ch. 2, from memory).
      closeTo(condW(many) * N, condW(one), 0.03, 0, { N });
    }
  });

  it('makes the worst phase carry (1 + m)·I/N and run hotter; its conduction loss ratio follows I²R', () => {
    const r = evaluatePhases(multiphase(2, (d) => { d.topology.phaseMismatch = 0.1; }));
    closeTo(r.phaseLoadsA[0]!, 11, 1e-12);
    closeTo(r.phaseLoadsA[1]!, 9, 1e-12);
    const tj = (k: number) => r.temperatures.find((t) => t.phase === k && t.part === 'switch')!.celsius;
    expect(tj(1)).toBeGreaterThan(tj(2));
    const cond = (k: number) => r.rows.find((t) => t.phase === k && t.part === 'rectifier' && t.mechanism === 'conduction')!.watts;
    closeTo(cond(1) / cond(2), (11 / 9) ** 2, 0.03); // I²R at nearly equal temperatures (θ 0.5 K/W), textbook
    expect(r.checks.every((c) => c.phase === 1 || c.phase === 'shared')).toBe(true);
  });

  it('collects every phase on a shared heatsink: Ts = Ta + θSA·ΣP (docs/methods.md §10)', () => {
    const d = multiphase(3, (x) => {
      x.thermal.heatsinks = [{ id: 'fin', name: 'Invented fin', thetaSaKPerW: 4, surface: 'metal' }];
      const sink = { kind: 'heatsink' as const, heatsinkId: 'fin', thetaJcKPerW: 1, thetaCsKPerW: 0.5 };
      x.thermal.paths.switch = sink;
      x.thermal.paths.rectifier = sink;
    });
    const r = evaluatePhases(d);
    const onSink = r.rows.filter((t) => t.phase !== 'shared' && (t.part === 'switch' || t.part === 'rectifier')).reduce((a, t) => a + t.watts, 0);
    const heatsink = r.phaseRecords[0]!.heatsinks[0]!;
    closeTo(heatsink.celsius, 25 + 4 * onSink, 1e-6); // docs/methods.md §10 shared sink
  });

  it('warns when a high-ESR shared bank runs far from the one-phase temperature its ESR was taken at', () => {
    const d = multiphase(2, (x) => {
      x.thermal.paths.inputCapacitor = { kind: 'direct', thetaJaKPerW: 200 };
    }, { inputEsrOhm: 0.2 });
    const r = evaluatePhases(d, { vinV: 12 });
    const bank = r.temperatures.find((t) => t.part === 'inputCapacitor' && t.phase === 'shared')!;
    const one = r.phaseRecords[0]!.temperatures.find((t) => t.part === 'inputCapacitor')!;
    expect(Math.abs(bank.celsius - one.celsius)).toBeGreaterThan(10);
    expect(r.warnings.some((w) => w.code === 'model-limit' && w.part === 'inputCapacitor')).toBe(true);
  });

  it('stays finite at light load in DCM, where the DCM warning fires and the summed ripple is no longer K·ΔI', () => {
    const d = multiphase(2, (x) => { x.topology.lightLoad = 'diode-emulation'; });
    const r = evaluatePhases(d, { loadA: 0.2 });
    expect(r.conductionMode).toBe('DCM');
    expect(r.warnings.some((w) => w.code === 'dcm')).toBe(true);
    expect(Number.isFinite(r.efficiency) && r.efficiency > 0 && r.efficiency < 1).toBe(true);
    // In DCM each phase is a triangle of its own; the two pulses do not overlap at this load, so the
    // sum's peak is one phase's peak (superposition).
    closeTo(waveformStats(r.shared.inductors.waveform).peakA, waveformStats(r.phaseRecords[0]!.operatingPoint.waveforms.inductor).peakA, 1e-9);
  });

  it('sheds: with one active phase of a 4-phase design, one stage carries the whole load', () => {
    const r = evaluatePhases(multiphase(4), { loadA: 6 }, { activePhases: 1 });
    expect(r.activePhases).toBe(1);
    expect(r.phaseLoadsA).toEqual([6]);
    expect(r.rows.some((t) => t.phase === 2)).toBe(false);
  });
});

describe('topology.phases in the design document', () => {
  const doc = (edit: (t: Record<string, unknown>) => void) => {
    const d = JSON.parse(JSON.stringify(multiphase(2))) as { topology: Record<string, unknown> };
    edit(d.topology);
    return validateDesign(d);
  };

  it('accepts 1 … 8 and a missing value (one phase, as older files)', () => {
    for (const n of [1, 4, 8]) expect(doc((t) => { t.phases = n; }).ok).toBe(true);
    const old = doc((t) => { delete t.phases; });
    expect(old.ok && evaluatePhases(old.design).phases).toBe(1);
  });

  it('refuses 0, 9, 2.5 and a mismatch of 0.8 with the field, the value and the range', () => {
    for (const [key, value] of [['phases', 0], ['phases', 9], ['phases', 2.5], ['phaseMismatch', 0.8]] as const) {
      const r = doc((t) => { t[key] = value; });
      expect(r.ok).toBe(false);
      if (r.ok) continue;
      const p = r.problems.find((x) => x.path === `topology.${key}`);
      expect(p, `${key} ${value}`).toBeDefined();
      expect(p!.message).toContain(String(value));
    }
  });
});
