/**
 * Duty range, slope compensation and the small-signal limits a loop design must respect.
 *
 * - Duty: the solved duty (power balance with the design's losses) at each corner; its largest value
 *   (boost and buck: Vin min) against the controller's limit spec.maxDuty.
 * - Slope compensation (peak current mode): above D = 0.5 the current loop is subharmonically unstable
 *   without a ramp; a ramp of at least half the inductor down-slope, m_a ≥ m2/2, keeps it stable for all D
 *   (Ridley, IEEE TPEL 6(2), 1991, from memory; the half-slope rule is common practice). m2 is read from the
 *   solved inductor waveform (boost (Vo − Vin)/L, buck Vo/L ideally). Referred to the sense signal:
 *   m_a·Ri (V/s), Ri the sense resistor in the switch or inductor path. Sense signal at the end of the on
 *   time: Ri·Ipk + m_a·Ri·D·Ts.
 * - Boost RHP zero fz = D′²·R/(2π·L), lowest at Vin min (largest D) and rated load (smallest R); current-
 *   mode output pole boost 2/(2π·R·C), buck 1/(2π·R·C); ESR zero 1/(2π·ESR·C); buck LC double pole
 *   1/(2π√(LC)) (Erickson & Maksimović 2nd ed. ch. 7–8, 12, from memory).
 * - Crossover: below fs/10 and below fz/5 (both common practice); the lowest is recommended. An ESR zero
 *   below that crossover flattens the loop gain's roll-off: the compensator then needs a pole at it.
 * Source: docs/methods.md §13, §17, §23.
 */
import type { Design } from '../design/schema.ts';
import { topologyOf } from '../topology/registry.ts';
import type { SolvedCorner } from './corners.ts';
import { derived, sized } from './sized.ts';
import type { CrossoverLimit, DutySizing, LoopSizing, SlopeSizing } from './types.ts';

const RIDLEY = 'Ridley, IEEE Trans. Power Electronics 6(2), 1991 (from memory); half-slope rule common practice; docs/methods.md §17';
const SMALL_SIGNAL = 'Erickson & Maksimović, Fundamentals of Power Electronics, 2nd ed., ch. 7–8, 12 (from memory); docs/methods.md §13';
const op = (c: SolvedCorner) => c.evaluation.operatingPoint;
const f3 = (x: number) => Number(x.toPrecision(3)).toString();

export function sizeDuty(design: Design, corners: readonly SolvedCorner[]): DutySizing {
  const spec = { unit: '', formula: 'solved duty (power balance with the design losses)', source: 'docs/methods.md §1, §23' };
  const max = sized(corners, (c) => op(c).dutyCycle, { ...spec, reason: 'The duty is largest at the lowest input voltage: {corner}.' });
  const min = sized(corners, (c) => op(c).dutyCycle, { ...spec, smallest: true, reason: 'The duty is smallest at the highest input voltage: {corner}.' });
  const limitReached = corners.some((c) => op(c).warnings.some((w) => w.code === 'duty-limit')) || max.value >= design.spec.maxDuty;
  return { min, max, limit: design.spec.maxDuty, limitReached };
}

/** Largest magnitude of a falling slope of the inductor current, A/s. */
function downSlope(c: SolvedCorner): number {
  let m = 0;
  for (const s of op(c).waveforms.inductor.segments) {
    if (s.durationS > 0 && s.i1A < s.i0A) m = Math.max(m, (s.i0A - s.i1A) / s.durationS);
  }
  return m;
}

export function sizeSlope(design: Design, corners: readonly SolvedCorner[]): SlopeSizing {
  const m2 = sized(corners, downSlope, {
    unit: 'A/s',
    ...topologyOf(design).sizingWords.downSlope,
    source: RIDLEY,
  });
  const dMax = Math.max(...corners.map((c) => op(c).dutyCycle));
  const out: SlopeSizing = { needed: dMax > 0.5, downSlopeAPerS: m2, minSlopeAPerS: m2.value / 2 };
  const sense = design.parts.senseResistor;
  const loc = design.topology.senseLocation;
  if (sense && (loc === 'switch' || loc === 'inductor')) {
    const ri = sense.resistanceOhm;
    out.senseOhm = ri;
    out.minSlopeVPerS = (m2.value / 2) * ri;
    out.senseSignalPeakV = sized(corners, (c) => ri * (op(c).inductor.peakA + (m2.value / 2) * op(c).dutyCycle * op(c).periodS), {
      unit: 'V',
      formula: 'Vsense = Ri·Ipk + (m2/2)·Ri·D·Ts',
      reason: 'The sense signal with the minimum ramp is largest at {corner}.',
      source: RIDLEY,
    });
  }
  if (sense && loc !== 'none') {
    const senseW = (c: SolvedCorner) => c.evaluation.losses.filter((l) => l.part === 'senseResistor').reduce((s, l) => s + l.watts, 0);
    out.senseLossW = sized(corners, senseW, {
      unit: 'W',
      formula: 'P = Irms²·R(T) (ledger)',
      reason: 'The sense resistor dissipates most at {corner}.',
      source: 'docs/methods.md §9',
    });
  }
  return out;
}

export function sizeLoop(design: Design, corners: readonly SolvedCorner[]): LoopSizing {
  const topology = topologyOf(design);
  const slot = design.parts.outputCapacitor;
  const cF = slot.part.capacitanceF * slot.count;
  const esr = slot.part.esrOhm / slot.count;
  const rLoad = design.spec.voutV / design.spec.ratedLoadA;
  const fs = design.spec.switchingFrequencyHz;
  const base = sized(corners, (c) => op(c).dutyCycle, { unit: '', formula: '', reason: 'at {corner}' });
  const outputPoleHz = derived(
    { ...base, reason: 'The load resistance R = Vo/Io is smallest at rated load (the pole is then highest).' },
    topology.outputPoleFactor / (2 * Math.PI * rLoad * cF),
    'Hz',
    topology.sizingWords.outputPoleFormula,
    SMALL_SIGNAL,
  );
  const esrZeroHz = esr > 0 ? 1 / (2 * Math.PI * esr * cF) : Infinity;
  const limits: CrossoverLimit[] = [
    { id: 'switching', hz: fs / 10, reason: 'a tenth of the switching frequency (the averaged model holds well below fs)', source: 'common practice; docs/methods.md §13' },
  ];
  const out: LoopSizing = { outputPoleHz, esrZeroHz: Number.isFinite(esrZeroHz) ? esrZeroHz : 0, limits, crossoverHz: 0, crossoverReason: '' };
  // The right-half-plane zero of the topology's record at each corner's solved duty (resistive load R = Vo/Io).
  const rhpZeroAt = (c: SolvedCorner) => {
    const r = op(c).voutV / c.corner.loadA;
    return topology.smallSignal(op(c).dutyCycle, r, op(c).inductanceH, cF, 1 / r)?.rhpZeroHz;
  };
  if (corners.length > 0 && rhpZeroAt(corners[0]!) !== undefined) {
    const fz = (c: SolvedCorner) => rhpZeroAt(c) ?? Infinity;
    out.rhpZeroHz = sized(corners, fz, {
      unit: 'Hz',
      formula: 'fz = D′²·R/(2π·L) (solved D)',
      reason: 'The RHP zero is lowest where D′ is smallest (lowest Vin) at rated load: {corner}.',
      source: SMALL_SIGNAL,
      smallest: true,
    });
    limits.push({ id: 'rhp-zero', hz: out.rhpZeroHz.value / 5, reason: 'a fifth of the right-half-plane zero at its lowest (its phase lag must stay small at crossover)', source: 'common practice; docs/methods.md §13' });
  } else {
    out.lcDoublePoleHz = 1 / (2 * Math.PI * Math.sqrt(design.parts.inductor.inductanceH * cF));
  }
  limits.sort((a, b) => a.hz - b.hz);
  const binding = limits[0]!;
  out.crossoverHz = binding.hz;
  const esrPart = !(esrZeroHz < Infinity)
    ? 'The bank has no ESR zero.'
    : esrZeroHz < binding.hz
      ? `The ESR zero (${f3(esrZeroHz)} Hz) lies below it: it flattens the loop gain's roll-off, so the compensator needs a pole at the ESR zero.`
      : `The ESR zero (${f3(esrZeroHz)} Hz) lies above it and adds phase lead near crossover only.`;
  out.crossoverReason = `Crossover at most ${f3(binding.hz)} Hz: ${binding.reason}. ${esrPart}`;
  return out;
}
