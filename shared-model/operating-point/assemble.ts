/**
 * Builds the OperatingPoint record from a solved inductor-current shape.
 *
 * Branch currents over one period (t = 0 at control-switch turn-on; intervals on D·T, rectifier D2·T,
 * idle (1 − D − D2)·T in DCM):
 *   inductor: valley → peak → valley (DCM: 0 → Ipk → 0 → 0)
 *   switch = inductor during the on interval; rectifier = inductor during the off interval
 *   input capacitor: the inductor current in the intervals that draw from the input − source DC
 *     (buck: switch current − Iin; boost: inductor current − its mean)
 *   output capacitor: k·(node current − Io), the node current being the inductor current in the intervals
 *     that deliver to the output (buck: the inductor's; boost: the rectifier's), k the bank's share of its
 *     ripple (load.ts; 1 for a constant-current load)
 *   sense resistor: source DC (input), switch, inductor, or the load current Io + (1 − k)·(node − Io) (output).
 * Edges: turn-on at the valley (0 in DCM, not hard; soft too when the valley is negative, since the
 * reverse current discharges the switch node first), turn-off at the peak. Blocking voltages: buck
 * Vin + rectifier drop; boost Vo + rectifier drop (in DCM at zero current: the swing when the idle interval
 * starts; the ringing toward the resting value is not modelled, a conservative choice).
 * Blocking voltages and small-signal figures come from the topology record (topology/boost.ts: ωz = D'²R/L,
 * current-mode output pole ωp = (1/R + g)/C with g the load's incremental conductance, load.ts).
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
  return c.switchIn * s.vin1 + c.switchOut * vo1 + drop;
}

/** Voltage the control switch blocks just after it turns off (at the peak current). */
export function turnOffVoltageV(c: Circuit, s: Shape, vo1: number): number {
  const drop = rectifierDrop(c, s.ipk);
  return c.switchIn * s.vin1 + c.switchOut * vo1 + drop;
}

/** Voltage the control switch blocks, for its rating (the record's switchBlocks at Vin and Vo', plus the rectifier drop at the peak). */
export function switchStressV(c: Circuit, s: Shape, vo1: number): number {
  return c.switchIn * c.vinV + c.switchOut * vo1 + rectifierDrop(c, s.ipk);
}

/** Voltage the rectifier blocks while the switch conducts (the record's rectifierBlocks at Vin and Vo'). */
export function rectifierStressV(c: Circuit, vo1: number): number {
  return c.rectIn * c.vinV + c.rectOut * vo1;
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
  // Capacitor currents from the record's intervals: input [from input]·iL − Iin, output [to output]·iL − Io.
  const inputCapacitor = c.offFromInput
    ? wave(tOn, tOff, tIdle, lo - iin, hi - iin, hi - iin, lo - iin, -iin)
    : wave(tOn, tOff, tIdle, lo - iin, hi - iin, -iin, -iin, -iin);
  // Output node: the current fed in (the intervals that deliver to the output) less Io, of which the bank
  // carries the share k and the load the rest (load.ts; k = 1 for a current sink).
  const k = c.capacitorShare;
  const nOn0 = c.onToOutput ? lo : 0;
  const nOn1 = c.onToOutput ? hi : 0;
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
    stress: { switchV: switchStressV(c, s, vo1), rectifierV: rectifierStressV(c, vo1) },
    outputRipple: ripple,
    warnings: meta.warnings,
  };
  if (!s.dcm && io > 0) {
    const figures = c.topology.smallSignal(s.d, vo / io, s.inductanceH, c.outputCapacitanceF, c.loadConductanceS);
    if (figures) op.smallSignal = figures;
  }
  return op;
}
