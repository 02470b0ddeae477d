/**
 * Capacitor ESR(f) and ESR(T) tables (issue 13 §2): each harmonic of the bank current meets the ESR at its
 * own frequency. The harmonics come from the Fourier series of the piecewise-linear current
 * (shared-model/curves/esr-spectrum.ts); here they are checked against textbook Fourier series of stated
 * waveforms, then the whole ESR loss against hand figures, and the edge where a flat ESR(f) must give the
 * single-value loss of docs/methods.md §9.
 */
import { describe, expect, it } from 'vitest';
import { evaluate, validateDesign } from '../../../shared-model/index.ts';
import type { Design, EsrFrequencyPoint, EsrTemperaturePoint, Segment } from '../../../shared-model/index.ts';
import { harmonicSquare, MAX_HARMONICS, spectralEsrOhm } from '../../../shared-model/curves/esr-spectrum.ts';
import { closeTo } from '../../helpers/close-to.ts';
import { makeDesign } from '../../helpers/designs.ts';
import { METHODS_BUCK } from '../../helpers/operating-point.ts';
import { valid } from '../../helpers/ledger-designs.ts';

const T = 1e-5; // 100 kHz
const A = 1; // triangle peak, A

/** A symmetric zero-mean triangle of peak A: rises −A → A over T/2, falls back over T/2. */
const TRIANGLE: Segment[] = [
  { durationS: T / 2, i0A: -A, i1A: A },
  { durationS: T / 2, i0A: A, i1A: -A },
];

describe('harmonics of piecewise-linear currents against textbook Fourier series', () => {
  it('symmetric triangle: amplitude 8A/(π²n²) on odd n, nothing on even n', () => {
    // Triangle wave x(t) = (8A/π²) Σ_{n odd} (−1)^((n−1)/2) sin(nωt)/n² — Kreyszig, Advanced Engineering
    // Mathematics, ch. 11 (Fourier series) [from memory]; RMS² of harmonic n = amplitude²/2.
    for (const n of [1, 3, 5, 7, 21]) closeTo(harmonicSquare(TRIANGLE, T, n), (8 * A / (Math.PI ** 2 * n * n)) ** 2 / 2, 1e-12);
    for (const n of [2, 4, 10]) closeTo(harmonicSquare(TRIANGLE, T, n), 0, 0, 1e-28);
  });
  it('asymmetric triangle (rise D·T, fall (1 − D)·T, swing ΔI): amplitude ΔI·|sin(nπD)|/(π²n²D(1 − D))', () => {
    // The inductor ripple's Fourier series — Erickson & Maksimović, 2nd ed., ch. 2 / Mohan, Undeland &
    // Robbins ch. 7 give the triangle of rise fraction D [from memory for the closed form].
    const D = 0.3;
    const dI = 2;
    const tri: Segment[] = [
      { durationS: D * T, i0A: -dI / 2, i1A: dI / 2 },
      { durationS: (1 - D) * T, i0A: dI / 2, i1A: -dI / 2 },
    ];
    for (const n of [1, 2, 3, 4, 9]) {
      const amp = (dI * Math.abs(Math.sin(n * Math.PI * D))) / (Math.PI ** 2 * n * n * D * (1 - D));
      closeTo(harmonicSquare(tri, T, n), amp * amp / 2, 1e-10);
    }
  });
  it('rectangular pulse train (duty D, jump H): amplitude 2H·|sin(nπD)|/(nπ) — jumps, not only slopes', () => {
    // Pulse-train Fourier series, Oppenheim & Willsky, Signals and Systems, 2nd ed., ex. 3.5 [from memory];
    // the buck input capacitor's current with negligible ripple: Io − Iin for D·T, −Iin for the rest.
    const D = 0.25;
    const io = 4;
    const iin = io * D;
    const pulses: Segment[] = [
      { durationS: D * T, i0A: io - iin, i1A: io - iin },
      { durationS: (1 - D) * T, i0A: -iin, i1A: -iin },
    ];
    for (const n of [1, 2, 3, 4, 5]) {
      const amp = (2 * io * Math.abs(Math.sin(n * Math.PI * D))) / (n * Math.PI);
      closeTo(harmonicSquare(pulses, T, n), amp * amp / 2, 1e-10, 1e-14);
    }
  });
  it('Parseval: the harmonics of the triangle add up to its RMS² A²/3', () => {
    // Σ_{n odd} 32A²/(π⁴n⁴) = A²/3 (Σ_{n odd} 1/n⁴ = π⁴/96, Abramowitz & Stegun 23.2.20 [from memory]).
    let sum = 0;
    for (let n = 1; n <= 2001; n++) sum += harmonicSquare(TRIANGLE, T, n);
    closeTo(sum, (A * A) / 3, 1e-9);
  });
});

describe('the spectrum-weighted ESR of a stated ESR(f) table (hand figures)', () => {
  /** 20 mΩ at 100 kHz, 10 mΩ from 300 kHz on (held above 1 MHz). */
  const STEP: EsrFrequencyPoint[] = [
    { frequencyHz: 100e3, esrOhm: 0.02 },
    { frequencyHz: 300e3, esrOhm: 0.01 },
    { frequencyHz: 1e6, esrOhm: 0.01 },
  ];
  it('triangle at 100 kHz: the fundamental meets 20 mΩ, the rest 10 mΩ → 10 + 10·96/π⁴ = 19.8555 mΩ', () => {
    // I1²/Irms² = (32/π⁴)/(1/3) = 96/π⁴ (textbook triangle series above); the odd harmonics from 3 on meet 10 mΩ.
    closeTo(spectralEsrOhm(TRIANGLE, T, STEP), 0.01 + 0.01 * (96 / Math.PI ** 4), 1e-12);
  });
  it('a flat table gives the single value whatever the waveform (edge: equals today\'s single-ESR loss)', () => {
    const flat = STEP.map((p) => ({ ...p, esrOhm: 0.015 }));
    closeTo(spectralEsrOhm(TRIANGLE, T, flat), 0.015, 1e-12); // Parseval: Σ Ih² = Irms²
    const pulses: Segment[] = [
      { durationS: 0.2 * T, i0A: 2, i1A: 3 },
      { durationS: 0.8 * T, i0A: -0.5, i1A: -0.8 },
    ];
    closeTo(spectralEsrOhm(pulses, T, flat), 0.015, 1e-12);
  });
  it('a table reaching far beyond the harmonics summed one by one stays within the stated cap', () => {
    // 1 Ω up to 200 kHz, 0 Ω-like 1 mΩ from 300 kHz to 1 GHz: the triangle's fundamental carries 96/π⁴.
    const wide: EsrFrequencyPoint[] = [
      { frequencyHz: 10, esrOhm: 1 },
      { frequencyHz: 200e3, esrOhm: 1 },
      { frequencyHz: 300e3, esrOhm: 0.001 },
      { frequencyHz: 1e9, esrOhm: 0.001 },
    ];
    expect(1e9 * T).toBeGreaterThan(MAX_HARMONICS);
    closeTo(spectralEsrOhm(TRIANGLE, T, wide), 0.001 + 0.999 * (96 / Math.PI ** 4), 1e-9); // hand, as above
  });
  it('with no current it is the ESR at the switching frequency (hand interpolation: 15 mΩ at 200 kHz)', () => {
    const still: Segment[] = [{ durationS: 5e-6, i0A: 0, i1A: 0 }, { durationS: 0, i0A: 0, i1A: 0 }];
    closeTo(spectralEsrOhm(still, 5e-6, STEP), 0.015, 1e-12);
  });
});

/** The docs/methods.md §1 buck with ideal-ish parts and the output capacitor's ESR as given. */
function buck(edit: (d: Design) => void): Design {
  const d = makeDesign({ ...METHODS_BUCK, outputEsrOhm: 0.02 });
  edit(d);
  return valid(d);
}

function esrTerm(d: Design, part: 'outputCapacitor' | 'inputCapacitor') {
  const e = evaluate(d);
  const term = e.losses.find((l) => l.part === part && l.mechanism === 'ESR')!;
  return { e, term, input: (name: string) => term.inputs.find((x) => x.name === name)!.value };
}

describe('the ESR loss of a design with an ESR(f) table', () => {
  it("flat in f equals today's single-value loss (edge)", () => {
    const single = esrTerm(buck(() => {}), 'outputCapacitor');
    const flat = esrTerm(
      buck((d) => {
        d.parts.outputCapacitor.part.esrFrequencyCurve = { points: [1e3, 1e5, 1e7].map((f) => ({ frequencyHz: f, esrOhm: 0.02 })) };
      }),
      'outputCapacitor',
    );
    closeTo(flat.term.watts, single.term.watts, 1e-12);
    // And that single value is ESR·Irms² with Irms = ΔI/√12 of the §1 ripple (docs/methods.md §1, §9).
    const ripple = single.e.operatingPoint.inductor.rippleA;
    closeTo(single.term.watts, 0.02 * ripple * ripple / 12, 1e-9);
  });
  it('each harmonic of the output ripple meets its own ESR: hand sum over the triangle of rise D', () => {
    // 40 mΩ at 500 kHz falling to 10 mΩ at 1 MHz, held above: harmonic 1 meets 40 mΩ, harmonics ≥ 2 meet 10 mΩ.
    const points: EsrFrequencyPoint[] = [
      { frequencyHz: 100e3, esrOhm: 0.04 },
      { frequencyHz: 500e3, esrOhm: 0.04 },
      { frequencyHz: 1e6, esrOhm: 0.01 },
    ];
    const r = esrTerm(buck((d) => { d.parts.outputCapacitor.part.esrFrequencyCurve = { points }; }), 'outputCapacitor');
    const op = r.e.operatingPoint;
    const D = op.dutyCycle;
    const dI = op.inductor.rippleA;
    // Hand: I1² = (ΔI·sin(πD)/(π²D(1 − D)))²/2 (asymmetric triangle above), Irms² = ΔI²/12.
    const i1sq = ((dI * Math.sin(Math.PI * D)) / (Math.PI ** 2 * D * (1 - D))) ** 2 / 2;
    const irms2 = (dI * dI) / 12;
    const hand = 0.04 * i1sq + 0.01 * (irms2 - i1sq);
    closeTo(r.term.watts, hand, 1e-9);
    closeTo(r.input('ESR(25 °C)'), hand / irms2, 1e-9);
  });
});

describe('tables read outside their range warn (extrapolation)', () => {
  it('an ESR(f) table ending below the switching frequency (500 kHz) warns; one spanning it does not', () => {
    const short = evaluate(buck((d) => {
      d.parts.outputCapacitor.part.esrFrequencyCurve = { points: [1e3, 1e4, 1e5].map((f) => ({ frequencyHz: f, esrOhm: 0.02 })) };
    }));
    const w = short.warnings.find((x) => x.path === 'parts.outputCapacitor.part.esrFrequencyCurve.points');
    expect(w?.message).toMatch(/switching frequency 500000 Hz lies outside the output capacitor's ESR\(f\) table \(1000 … 100000 Hz\)/);
    const spans = evaluate(buck((d) => {
      d.parts.outputCapacitor.part.esrFrequencyCurve = { points: [1e3, 1e5, 1e7].map((f) => ({ frequencyHz: f, esrOhm: 0.02 })) };
    }));
    expect(spans.warnings.some((x) => x.path === 'parts.outputCapacitor.part.esrFrequencyCurve.points')).toBe(false);
  });
  it('an ESR(T) table starting above the input capacitor temperature warns', () => {
    const e = evaluate(buck((d) => {
      d.parts.inputCapacitor.part.esrTemperatureCurve = { points: [{ tC: 60, ratio: 1 }, { tC: 80, ratio: 0.9 }, { tC: 100, ratio: 0.8 }] };
    }));
    expect(e.warnings.find((x) => x.path === 'parts.inputCapacitor.part.esrTemperatureCurve.points')?.message).toMatch(/outside its ESR\(T\) table \(60 … 100 °C\)/);
  });
});

describe('ESR(T) tables', () => {
  const RATIO: EsrTemperaturePoint[] = [
    { tC: -40, ratio: 4 },
    { tC: 25, ratio: 1 },
    { tC: 105, ratio: 0.6 },
  ];
  it('scale the ESR by the ratio at the capacitor temperature (hand interpolation)', () => {
    const r = esrTerm(buck((d) => { d.parts.outputCapacitor.part.esrTemperatureCurve = { points: RATIO }; }), 'outputCapacitor');
    const t = r.input('T');
    expect(t).toBeGreaterThan(25);
    closeTo(r.input('ESR(T)'), 0.02 * (1 - (0.4 * (t - 25)) / 80), 1e-12); // straight line 25 → 105 °C (hand)
  });
  it('read at a cold ambient follow the cold branch: −20 °C is 4 − 3·20/65 times ESR25 near the ambient', () => {
    const r = esrTerm(
      buck((d) => {
        d.spec.ambientC = -30;
        d.parts.outputCapacitor.part.esrTemperatureCurve = { points: RATIO };
      }),
      'outputCapacitor',
    );
    const t = r.input('T');
    closeTo(r.input('ESR(T)'), 0.02 * (4 - (3 * (t + 40)) / 65), 1e-12); // hand, on the −40 → 25 °C segment
  });
  it('a table that is the linear law gives the linear law\'s loss (c = −0.5 %/K, docs/methods.md §9 law)', () => {
    const linear = esrTerm(buck((d) => { d.parts.outputCapacitor.part.esrTempCoPerK = -0.005; }), 'outputCapacitor');
    const table = esrTerm(
      buck((d) => {
        d.parts.outputCapacitor.part.esrTemperatureCurve = { points: [{ tC: -25, ratio: 1.25 }, { tC: 25, ratio: 1 }, { tC: 125, ratio: 0.5 }] };
      }),
      'outputCapacitor',
    );
    closeTo(table.term.watts, linear.term.watts, 1e-9);
  });
  it('refuse a temperature that does not rise, naming the point', () => {
    const d = makeDesign(METHODS_BUCK);
    d.parts.outputCapacitor.part.esrTemperatureCurve = { points: [RATIO[0]!, RATIO[0]!, RATIO[2]!] };
    const r = validateDesign(d);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.problems.some((p) => p.path.startsWith('parts.outputCapacitor.part.esrTemperatureCurve.points[1]'))).toBe(true);
  });
});
