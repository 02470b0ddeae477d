/**
 * Builds the OperatingPoint record from a solved inductor-current shape.
 *
 * Every branch current comes from the one table (branch-table.ts: t = 0 at control-switch turn-on; on D·T,
 * rectifier D2·T, idle (1 − D − D2)·T in DCM), and every number of the record — statistics, edges,
 * blocking voltages (edges.ts) — from the lean point filled as a record (lean-point.ts), which the
 * sweep's final point is too: the two paths hold the same numbers by construction, not by a second
 * derivation. The record adds the waveforms (the same table as segments), the output ripple and the
 * small-signal figures from the topology record (topology/boost.ts: ωz = D'²R/L, current-mode output pole
 * ωp = (1/R + g)/C with g the load's incremental conductance, load.ts).
 * Source: Erickson & Maksimović 2nd ed. ch. 2, 5 and 8 [memory for chapters]; docs/methods.md §1, §2, §13.
 */
import type { Circuit } from './circuit.ts';
import type { Shape } from './shape.ts';
import type { Conditions, CurrentStats, OperatingPoint, Segment, Waveform } from './types.ts';
import type { Warning } from '../warnings.ts';
import type { IntervalStats } from '../waveform/interval-stats.ts';
import { capacitorVoltageRipple } from '../waveform/voltage-ripple.ts';
import { branchIntervals, BRANCH_COUNT, INDUCTOR, INPUT_CAPACITOR, OUTPUT_CAPACITOR, RECTIFIER, SENSE, SWITCH } from './branch-table.ts';
import { leanPointAt, newLeanPoint, type LeanPoint } from './lean-point.ts';

export interface PointMeta {
  regulated: boolean;
  dutyMethod: OperatingPoint['dutyMethod'];
  /** Extra source current from sourceLossOf (A), 0 otherwise. */
  extraInputA: number;
  warnings: Warning[];
}

/** The three intervals of v = [t_on, t_off, t_idle, a0, a1, b0, b1, c] as segments; zero-length ones are left out. */
function wave(v: Float64Array): Waveform {
  const segments: Segment[] = [];
  if (v[0]! > 0) segments.push({ durationS: v[0]!, i0A: v[3]!, i1A: v[4]! });
  if (v[1]! > 0) segments.push({ durationS: v[1]!, i0A: v[5]!, i1A: v[6]! });
  if (v[2]! > 0) segments.push({ durationS: v[2]!, i0A: v[7]!, i1A: v[7]! });
  return { segments };
}

/** A record's statistics (fresh object, the record's key order) from the table's. */
function statsOf(x: IntervalStats): CurrentStats {
  return { averageA: x.averageA, rmsA: x.rmsA, acRmsA: x.acRmsA, peakA: x.peakA, minA: x.minA };
}

/**
 * The solver's record of shape `s`. Its numbers are those of the lean point filled `asRecord`
 * (lean-point.ts: one table reader, one statistics fill); pass `table`, already filled so at this shape,
 * to build the record on it without computing anything twice. The waveforms are read from the same table.
 */
export function buildOperatingPoint(c: Circuit, s: Shape, conditions: Conditions, meta: PointMeta, table?: LeanPoint): OperatingPoint {
  const p = table ?? leanPointAt(c, s, newLeanPoint(), true, conditions);
  const T = c.periodS;
  const io = c.loadA;
  const v = p.intervals;
  const waves: Waveform[] = [];
  for (let b = 0; b < BRANCH_COUNT; b++) {
    branchIntervals(c, s, b, v);
    waves.push(wave(v));
  }
  const outputCapacitor = waves[OUTPUT_CAPACITOR]!;
  const ripple = capacitorVoltageRipple(outputCapacitor, c.outputCapacitanceF, c.esrOhm);
  const vo = s.vo;
  const ind = p.inductor;
  const st = p.stats;
  const op: OperatingPoint = {
    conditions,
    periodS: T,
    voutV: vo,
    targetVoutV: c.targetVoutV,
    regulated: meta.regulated,
    dutyMethod: meta.dutyMethod,
    outputPowerW: p.outputPowerW,
    dutyCycle: p.dutyCycle,
    rectifierFraction: p.rectifierFraction,
    idleFraction: p.idleFraction,
    mode: p.mode,
    inductanceH: p.inductanceH,
    // Fields listed, not spread: an object spread here cost ~4 µs per point (measured, V8 in Node 20).
    inductor: {
      averageA: ind.averageA,
      rmsA: ind.rmsA,
      acRmsA: ind.acRmsA,
      peakA: ind.peakA,
      minA: ind.minA,
      rippleA: ind.rippleA,
      valleyA: ind.valleyA,
    },
    waveforms: {
      inductor: waves[INDUCTOR]!,
      switch: waves[SWITCH]!,
      rectifier: waves[RECTIFIER]!,
      inputCapacitor: waves[INPUT_CAPACITOR]!,
      outputCapacitor,
      sense: waves[SENSE]!,
      inputA: s.iin + meta.extraInputA,
    },
    stats: {
      switch: statsOf(st.switch),
      rectifier: statsOf(st.rectifier),
      inputCapacitor: statsOf(st.inputCapacitor),
      outputCapacitor: statsOf(st.outputCapacitor),
      sense: statsOf(st.sense),
    },
    edges: {
      turnOn: { currentA: p.edges.turnOn.currentA, voltageV: p.edges.turnOn.voltageV, hard: p.edges.turnOn.hard },
      turnOff: { currentA: p.edges.turnOff.currentA, voltageV: p.edges.turnOff.voltageV, hard: p.edges.turnOff.hard },
    },
    stress: { switchV: p.stress.switchV, rectifierV: p.stress.rectifierV },
    outputRipple: ripple,
    warnings: meta.warnings,
  };
  if (!s.dcm && io > 0) {
    // The load line of the regulated design (target Vout at this current): a point that cannot regulate
    // has collapsed its own Vo (to 0 V under overload, R → 0 and a pole at infinity), and has no loop to
    // close; its figures then say where the design's would lie (issue 10 §5: every figure finite).
    const loadOhm = (meta.regulated ? vo : c.targetVoutV) / io;
    const figures = c.topology.smallSignal(s.d, loadOhm, s.inductanceH, c.outputCapacitanceF, c.loadConductanceS);
    if (figures) op.smallSignal = figures;
  }
  return op;
}
