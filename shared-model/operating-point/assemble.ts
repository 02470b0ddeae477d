/**
 * Builds the OperatingPoint record from a solved inductor-current shape.
 *
 * Branch currents over one period (t = 0 at control-switch turn-on; intervals on D·T, rectifier D2·T,
 * idle (1 − D − D2)·T in DCM):
 *   inductor: valley → peak → valley (DCM: 0 → Ipk → 0 → 0)
 *   switch = inductor during the on interval; rectifier = inductor during the off interval
 *   input capacitor: buck, switch current − source DC; boost, inductor current − its mean
 *   output capacitor: k·(node current − Io), the node current being the inductor's (buck) or the
 *     rectifier's (boost), k the bank's share of the ripple (load.ts; 1 for a constant-current load)
 *   sense resistor: source DC (input), switch, inductor, or the load current Io + (1 − k)·(node − Io) (output).
 * Edges: turn-on at the valley (0 in DCM, not hard; soft too when the valley is negative, since the
 * reverse current discharges the switch node first), turn-off at the peak. Blocking voltages: buck
 * Vin + rectifier drop; boost Vo + rectifier drop (in DCM at zero current: the swing when the idle interval
 * starts; the ringing toward the resting value is not modelled, a conservative choice).
 * Boost small signal (CCM): ωz = D'²R/L, current-mode output pole ωp = (1/R + g)/C with g the load's
 * incremental conductance (load.ts): 2/(R·C) for a resistor (docs/methods.md §13), 1/(R·C) for a current
 * sink, 0 for a constant-power load (the power stage's constant-power output meets the load's −1/R;
 * Erickson & Maksimović 2nd ed. ch. 12, the current-programmed boost's simple model [memory]).
 * Source: Erickson & Maksimović 2nd ed. ch. 2, 5 and 8 [memory for chapters]; docs/methods.md §1, §2, §13.
 */
import type { Circuit } from './circuit.ts';
import type { Shape } from './shape.ts';
import type { Conditions, CurrentStats, OperatingPoint, Segment, Waveform } from './types.ts';
import type { Warning } from '../warnings.ts';
import { waveformStats } from '../waveform/stats.ts';
import { capacitorVoltageRipple } from '../waveform/voltage-ripple.ts';

export interface PointMeta {
  regulated: boolean;
  dutyMethod: OperatingPoint['dutyMethod'];
  /** Extra source current from sourceLossOf (A), 0 otherwise. */
  extraInputA: number;
  warnings: Warning[];
}

/** Three intervals on, off, idle; zero-length ones are left out. */
function wave(tOn: number, tOff: number, tIdle: number, on0: number, on1: number, off0: number, off1: number, idle: number): Waveform {
  const segments: Segment[] = [];
  if (tOn > 0) segments.push({ durationS: tOn, i0A: on0, i1A: on1 });
  if (tOff > 0) segments.push({ durationS: tOff, i0A: off0, i1A: off1 });
  if (tIdle > 0) segments.push({ durationS: tIdle, i0A: idle, i1A: idle });
  return { segments };
}

/** Forward drop of the rectifier at current i (diode VF0 + Rd·i, synchronous RDS·i). */
export function rectifierDrop(c: Circuit, i: number): number {
  return c.vf0V + c.rRectOhm * i;
}

/**
 * Voltage the control switch blocks just before it turns on. DCM: the swing the switch sees when the idle
 * interval starts (the rectifier has just stopped conducting), as in CCM at zero current. The idle-interval
 * ringing, which moves the node toward its resting value (buck Vo, boost Vin) and usually lowers the swing,
 * is not modelled: this is the conservative choice, and it keeps the capacitive turn-on loss continuous at
 * the CCM/DCM boundary. `vo1` is the output plus any output-sense drop.
 */
export function turnOnVoltageV(c: Circuit, s: Shape, vo1: number): number {
  const drop = rectifierDrop(c, s.dcm ? 0 : s.iv);
  return c.boost ? vo1 + drop : s.vin1 + drop;
}

/** Voltage the control switch blocks just after it turns off (at the peak current). */
export function turnOffVoltageV(c: Circuit, s: Shape, vo1: number): number {
  const drop = rectifierDrop(c, s.ipk);
  return c.boost ? vo1 + drop : s.vin1 + drop;
}

/** Voltage the control switch blocks, for its rating (boost: Vo' + rectifier drop at the peak; buck: Vin + that drop). */
export function switchStressV(c: Circuit, s: Shape, vo1: number): number {
  return c.boost ? vo1 + rectifierDrop(c, s.ipk) : c.vinV + rectifierDrop(c, s.ipk);
}

export function buildOperatingPoint(c: Circuit, s: Shape, conditions: Conditions, meta: PointMeta): OperatingPoint {
  const T = c.periodS;
  const io = c.loadA;
  const tOn = s.d * T;
  const tOff = s.d2 * T;
  const tIdle = s.dcm ? s.idle * T : 0;
  const lo = s.dcm ? 0 : s.iv;
  const hi = s.ipk;
  const inductor = wave(tOn, tOff, tIdle, lo, hi, hi, lo, 0);
  const sw = wave(tOn, tOff, tIdle, lo, hi, 0, 0, 0);
  const rect = wave(tOn, tOff, tIdle, 0, 0, hi, lo, 0);
  const iin = s.iin;
  const inputCapacitor = c.boost
    ? wave(tOn, tOff, tIdle, lo - iin, hi - iin, hi - iin, lo - iin, -iin)
    : wave(tOn, tOff, tIdle, lo - iin, hi - iin, -iin, -iin, -iin);
  // Output node: the current fed in (buck inductor, boost rectifier) less Io, of which the bank carries
  // the share k and the load the rest (load.ts; k = 1 for a current sink).
  const k = c.capacitorShare;
  const nOn0 = c.boost ? 0 : lo;
  const nOn1 = c.boost ? 0 : hi;
  const outputCapacitor = wave(tOn, tOff, tIdle, k * (nOn0 - io), k * (nOn1 - io), k * (hi - io), k * (lo - io), k * -io);
  let sense: Waveform;
  switch (c.senseAt) {
    case 'switch':
      sense = sw;
      break;
    case 'inductor':
      sense = inductor;
      break;
    case 'input':
      sense = { segments: [{ durationS: T, i0A: iin, i1A: iin }] };
      break;
    case 'output':
      // The load current: Io plus the load's share (1 − k) of the node ripple (load.ts).
      sense = k === 1
        ? { segments: [{ durationS: T, i0A: io, i1A: io }] }
        : wave(tOn, tOff, tIdle, io + (1 - k) * (nOn0 - io), io + (1 - k) * (nOn1 - io), io + (1 - k) * (hi - io), io + (1 - k) * (lo - io), io + (1 - k) * -io);
      break;
    default:
      sense = { segments: [{ durationS: T, i0A: 0, i1A: 0 }] };
  }
  const inductorStats: CurrentStats = waveformStats(inductor);
  const vo = s.vo;
  const vo1 = vo + c.rOutputSenseOhm * io;
  const vin = c.vinV;
  const turnOnV = turnOnVoltageV(c, s, vo1);
  const turnOffV = turnOffVoltageV(c, s, vo1);
  const ripple = capacitorVoltageRipple(outputCapacitor, c.outputCapacitanceF, c.esrOhm);
  const op: OperatingPoint = {
    conditions,
    periodS: T,
    voutV: vo,
    targetVoutV: c.targetVoutV,
    regulated: meta.regulated,
    dutyMethod: meta.dutyMethod,
    outputPowerW: vo * io,
    dutyCycle: s.d,
    rectifierFraction: s.d2,
    idleFraction: s.dcm ? s.idle : 0,
    mode: s.dcm ? 'DCM' : 'CCM',
    inductanceH: s.inductanceH,
    // Fields listed, not spread: an object spread here cost ~4 µs per point (measured, V8 in Node 20).
    inductor: {
      averageA: inductorStats.averageA,
      rmsA: inductorStats.rmsA,
      acRmsA: inductorStats.acRmsA,
      peakA: inductorStats.peakA,
      minA: inductorStats.minA,
      rippleA: s.ripple,
      valleyA: lo,
    },
    waveforms: { inductor, switch: sw, rectifier: rect, inputCapacitor, outputCapacitor, sense, inputA: iin + meta.extraInputA },
    stats: {
      switch: waveformStats(sw),
      rectifier: waveformStats(rect),
      inputCapacitor: waveformStats(inputCapacitor),
      outputCapacitor: waveformStats(outputCapacitor),
      sense: waveformStats(sense),
    },
    edges: {
      turnOn: { currentA: lo, voltageV: turnOnV, hard: !s.dcm && lo > 0 },
      turnOff: { currentA: hi, voltageV: turnOffV, hard: hi > 0 },
    },
    stress: { switchV: switchStressV(c, s, vo1), rectifierV: c.boost ? vo1 : vin },
    outputRipple: ripple,
    warnings: meta.warnings,
  };
  if (c.boost && !s.dcm && io > 0) {
    const r = vo / io;
    const dp = 1 - s.d;
    op.smallSignal = {
      rhpZeroHz: (dp * dp * r) / s.inductanceH / (2 * Math.PI),
      // The current-programmed power stage feeds about constant power (output conductance 1/R) beside the
      // load's own incremental conductance g (load.ts): ωp = (1/R + g)/C — 2/(RC) for a resistor.
      // (A constant-power load behind an output sense resistor would put it a hair past the origin: shown as 0.)
      outputPoleHz: Math.max(1 / r + c.loadConductanceS, 0) / c.outputCapacitanceF / (2 * Math.PI),
    };
  }
  return op;
}
