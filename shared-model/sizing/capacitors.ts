/**
 * Output- and input-capacitor sizing on solved operating points.
 *
 * Output bank, at each corner, from the solved capacitor current i(t) (piecewise linear):
 * - charge given up per period Q = ∫ max(i − ī, 0) dt (buck: ΔI·Ts/8; boost: Io·D·Ts — charge balance);
 * - current swing ΔiC = max i − min i (buck: ΔI; boost: the rectifier peak IL + ΔI/2).
 * For a ripple target ΔV: C ≥ Q/ΔV with zero ESR (the capacitive part alone); ESR ≤ ΔV/ΔiC with unlimited
 * C (the ESR part alone); with the bank's ESR, C ≥ Q/(ΔV − ESR·ΔiC); with the bank's C,
 * ESR ≤ (ΔV − Q/C)/ΔiC. Adding the two parts as magnitudes is conservative (their peaks do not coincide
 * in time; the engine's exact ripple, waveform/voltage-ripple.ts, adds them in time).
 * ESL is not part of the part data; its steps at the switching edges are not sized.
 * Input bank: its RMS current from the solved point (exact, docs/methods.md §1).
 * Assumptions: capacitance without bias or temperature derating; the load current constant.
 * Source: C·dv/dt = i; Erickson & Maksimović, Fundamentals of Power Electronics, 2nd ed., ch. 2
 * (capacitor charge balance, from memory for the chapter); docs/methods.md §23.
 */
import type { Design } from '../design/schema.ts';
import { topologyOf } from '../topology/registry.ts';
import type { Waveform } from '../operating-point/types.ts';
import { waveformStats } from '../waveform/stats.ts';
import type { SolvedCorner } from './corners.ts';
import { derived, sized } from './sized.ts';
import type { OutputCapacitorSizing, SizedValue } from './types.ts';

const CHARGE_SOURCE = 'C·dv/dt = i; Erickson & Maksimović, Fundamentals of Power Electronics, 2nd ed., ch. 2 (from memory for the chapter); docs/methods.md §23';

/** Charge of a periodic piecewise-linear current above its mean over one period, C. */
export function chargeAboveMean(w: Waveform): number {
  const mean = waveformStats(w).averageA;
  let q = 0;
  for (const s of w.segments) {
    const dt = s.durationS;
    if (!(dt > 0)) continue;
    const a = s.i0A - mean;
    const b = s.i1A - mean;
    if (a >= 0 && b >= 0) q += 0.5 * (a + b) * dt;
    else if (a > 0 || b > 0) {
      const hi = Math.max(a, b);
      const tPos = (hi / (hi - Math.min(a, b))) * dt;
      q += 0.5 * hi * tPos;
    }
  }
  return q;
}

function swingOf(w: Waveform): number {
  const s = waveformStats(w);
  return s.peakA > s.minA ? s.peakA - s.minA : 0;
}

const capWave = (c: SolvedCorner) => c.evaluation.operatingPoint.waveforms.outputCapacitor;

export function sizeOutputCapacitor(design: Design, corners: readonly SolvedCorner[]): OutputCapacitorSizing {
  const words = topologyOf(design).sizingWords;
  const slot = design.parts.outputCapacitor;
  const bank = { capacitanceF: slot.part.capacitanceF * slot.count, esrOhm: slot.part.esrOhm / slot.count };
  const chargeC = sized(corners, (c) => chargeAboveMean(capWave(c)), {
    unit: 'C',
    ...words.outputCharge,
    source: CHARGE_SOURCE,
  });
  const currentSwingA = sized(corners, (c) => swingOf(capWave(c)), {
    unit: 'A',
    ...words.outputCurrentSwing,
    source: CHARGE_SOURCE,
  });
  const rmsA = sized(corners, (c) => c.evaluation.operatingPoint.stats.outputCapacitor.rmsA, {
    unit: 'A',
    formula: 'exact RMS of the solved capacitor current',
    reason: 'The bank RMS current is largest at {corner}.',
    source: 'docs/methods.md §1',
  });
  const out: OutputCapacitorSizing = {
    chargeC,
    currentSwingA,
    bank,
    rmsA,
    eslNote: 'ESL is not in the part data: its steps at the switching edges (ESL·di/dt) are not included; measure them on hardware.',
  };
  const dv = design.spec.targets?.outputRippleV;
  if (dv === undefined) return out;
  out.targetRippleV = dv;
  out.minCapacitanceF = derived(chargeC, chargeC.value / dv, 'F', 'C ≥ Q/ΔV (zero ESR)', CHARGE_SOURCE);
  out.maxEsrOhm = derived(currentSwingA, dv / currentSwingA.value, 'Ω', 'ESR ≤ ΔV/ΔiC (unlimited C)', CHARGE_SOURCE);
  out.capacitanceWithBankEsrF = worstRequirement(corners, (c) => {
    const room = dv - bank.esrOhm * swingOf(capWave(c));
    return room > 0 ? chargeAboveMean(capWave(c)) / room : Infinity;
  }, chargeC, 'F', 'C ≥ Q/(ΔV − ESR·ΔiC) with the bank ESR');
  out.maxEsrWithBankCapacitanceOhm = worstRequirement(corners, (c) => {
    const room = dv - chargeAboveMean(capWave(c)) / bank.capacitanceF;
    return room / swingOf(capWave(c));
  }, currentSwingA, 'Ω', 'ESR ≤ (ΔV − Q/C)/ΔiC with the bank capacitance', true);
  return out;
}

/** The strictest per-corner requirement (largest, or smallest with `smallest`), kept finite: none → undefined. */
function worstRequirement(
  corners: readonly SolvedCorner[],
  valueOf: (c: SolvedCorner) => number,
  like: SizedValue,
  unit: string,
  formula: string,
  smallest = false,
): SizedValue | undefined {
  const v = sized(corners, valueOf, { unit, formula, reason: like.reason, smallest });
  if (!Number.isFinite(v.value) || v.value < 0) return undefined;
  const at = corners.find((c) => c.corner.id === v.corner)!;
  return { ...v, reason: `The strictest corner is ${at.corner.label}.`, source: CHARGE_SOURCE };
}

export function sizeInputCapacitor(corners: readonly SolvedCorner[]): SizedValue {
  return sized(corners, (c) => c.evaluation.operatingPoint.stats.inputCapacitor.rmsA, {
    unit: 'A',
    formula: 'exact RMS of the solved input-capacitor current',
    reason: 'The input bank RMS current is largest at {corner}.',
    source: 'docs/methods.md §1',
  });
}
