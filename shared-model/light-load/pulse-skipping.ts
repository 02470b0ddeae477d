/**
 * Pulse skipping (PFM) at light load, for diode and synchronous designs (topology.lightLoad
 * "pulse-skipping"): below the load at which the inductor peak would fall under a minimum peak current
 * Ipk,min, the controller fires pulses that each ramp the inductor to Ipk,min and back to zero (a DCM
 * triangle; a synchronous rectifier is turned off at zero current), with idle time between them. The
 * pulse rate follows from the output's charge balance; the controller sleeps between pulses.
 *
 * One pulse, from the topology record's intervals with the drops of each interval at its mean current
 * Ipk/2 (operating-point/circuit.ts; the same affine inductor voltages as shape.ts):
 *   t_on  = L·Ipk / (Eon − Ron·Ipk/2),    t_off = L·Ipk / (Eoff + Roff·Ipk/2)
 *   charge to the output per pulse  Q = Ipk/2 · ([on delivers]·t_on + t_off)
 *   (ideal buck: t_on = L·Ipk/(Vin − Vo), t_off = L·Ipk/Vo, Q = Ipk·(t_on + t_off)/2;
 *    ideal boost: t_on = L·Ipk/Vin, t_off = L·Ipk/(Vo − Vin), Q = Ipk·t_off/2).
 * Pulse rate (the equivalent switching frequency) f_p = Io/Q. The mode changes where f_p reaches the
 * switching frequency: I_change = Q·fs — above it the converter runs in DCM (or CCM) at fs with a higher
 * peak; below it the pulses keep Ipk,min and their rate falls with the load. At no load the rate is held at
 * MIN_RATE_FRACTION·fs and no pulse carries current (the feedback network's own draw is not modelled):
 * the point is the controller's sleep current alone, with the output held.
 * The point is evaluated as the DCM point at the period 1/f_p, so every per-pulse loss (switching, gate,
 * Coss, core per cycle) scales with the pulse rate; the controller draws its quiescent current while a
 * pulse runs and the sleep current for the rest: Iq,eff = Iq·a + I_sleep·(1 − a), a = (t_on + t_off)·f_p.
 * The output ripple is the packet ripple: one pulse's charge on the bank plus its ESR step (waveform/
 * voltage-ripple.ts on the pulse's waveform over 1/f_p).
 * Assumptions: one pulse per packet, evenly spaced (a controller that bursts several pulses per packet
 * makes a ripple as many times larger); the drops taken at the ambient temperature for the rate; the
 * losses that take no volt-seconds are paid by a slightly higher peak at that rate (the ledger's power
 * balance) rather than by a slightly higher rate at the exact minimum peak — the same energy to first order.
 * Source: docs/methods.md §14 (the packet picture is common practice; the working is ours).
 */
import type { Design } from '../design/schema.ts';
import type { Conditions, ConductionParameters } from '../operating-point/types.ts';
import { circuitOf, inductanceAt, type Circuit } from '../operating-point/circuit.ts';

/** The pulse rate held at no load, as a fraction of the switching frequency (see header). */
export const MIN_RATE_FRACTION = 1e-6;

export interface Pulse {
  peakA: number;
  onS: number;
  offS: number;
  /** Charge delivered to the output node per pulse, C. */
  outputChargeC: number;
}

/** One pulse to `peakA` in circuit `c` at output `voutV` (see header); null where an interval cannot ramp. */
export function pulseOf(c: Circuit, peakA: number, voutV: number): Pulse | null {
  const io = c.loadA;
  const esr = c.esrOhm * c.capacitorShare;
  const vo1 = voutV + c.rOutputSenseOhm * io;
  // The input sense drop at the source current of a lossless converter (light load: millivolts at most).
  const vin1 = c.vinV - c.rInputSenseOhm * ((voutV * io) / c.vinV);
  const onOut = c.onToOutput;
  const offIn = c.offFromInput;
  const eon = onOut ? vin1 - vo1 + esr * io : vin1;
  const ron = onOut ? c.rOnOhm + esr : c.rOnOhm;
  const eoff = offIn ? vo1 + c.vf0V - vin1 - esr * io : vo1 + c.vf0V - esr * io;
  const roff = c.rOffOhm + esr;
  const vOn = eon - (ron * peakA) / 2;
  const vOff = eoff + (roff * peakA) / 2;
  if (!(vOn > 0 && vOff > 0 && peakA > 0)) return null;
  const L = inductanceAt(c, peakA / 2);
  const onS = (L * peakA) / vOn;
  const offS = (L * peakA) / vOff;
  return { peakA, onS, offS, outputChargeC: (peakA / 2) * ((onOut ? onS : 0) + offS) };
}

export interface PulseSkipping {
  /** True below the mode-change load: the point is evaluated at the pulse rate. */
  active: boolean;
  minPeakA: number;
  sleepCurrentA: number;
  /** The load at which the pulse rate reaches the switching frequency, A (null: no pulse fits, see note). */
  modeChangeLoadA: number | null;
  /** The equivalent switching frequency: the pulse rate when active, else the switching frequency. */
  pulseRateHz: number;
  /** Fraction of the time the controller is awake (a pulse runs): (t_on + t_off)·f_p; 1 when not active. */
  awakeFraction: number;
  /** Why pulse skipping does not apply although asked for (null when it applies or was not asked for). */
  note: string | null;
}

/**
 * The pulse-skipping state of `design` at `conditions` with the drops of `conduction` (see header);
 * null when the design does not use pulse skipping.
 */
export function pulseSkippingAt(design: Design, conditions: Conditions, conduction: ConductionParameters): PulseSkipping | null {
  const p = design.topology.pulseSkipping;
  if (design.topology.lightLoad !== 'pulse-skipping' || !p) return null;
  const fs = conditions.switchingFrequencyHz;
  const out: PulseSkipping = {
    active: false, minPeakA: p.minPeakCurrentA, sleepCurrentA: p.sleepCurrentA, modeChangeLoadA: null,
    pulseRateHz: fs, awakeFraction: 1, note: null,
  };
  const c = circuitOf(design, conditions, conduction);
  const pulse = pulseOf(c, p.minPeakCurrentA, design.spec.voutV);
  if (!pulse) {
    out.note = `A pulse to the minimum peak current cannot ramp at this input (the inductor voltage of one interval is not positive); pulse skipping is not modelled here.`;
    return out;
  }
  const lengthS = pulse.onS + pulse.offS;
  if (lengthS * fs >= 1) {
    out.note = `One pulse to the minimum peak current lasts ${Number((lengthS * 1e6).toPrecision(3))} µs, longer than the switching period: pulse skipping cannot start below a load that still switches every period; it is not modelled here.`;
    return out;
  }
  out.modeChangeLoadA = pulse.outputChargeC * fs;
  if (!(conditions.loadA < out.modeChangeLoadA)) return out;
  out.active = true;
  out.pulseRateHz = Math.max(conditions.loadA / pulse.outputChargeC, MIN_RATE_FRACTION * fs);
  out.awakeFraction = conditions.loadA > 0 ? Math.min(lengthS * out.pulseRateHz, 1) : 0;
  return out;
}

/** The conditions the point is solved at: the pulse rate as the switching frequency while pulses skip. */
export function solveConditions(conditions: Conditions, state: PulseSkipping | null): Conditions {
  return state?.active ? { ...conditions, switchingFrequencyHz: state.pulseRateHz } : conditions;
}
