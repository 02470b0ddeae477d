/**
 * Warnings of the operating point: conduction mode, regulation limits and part ratings.
 *
 * - DCM (info), reverse inductor current in forced PWM (info), inductance beyond its roll-off point.
 * - Duty limit / conversion-ratio limit / a boost asked to step down: the point is shown at the limit
 *   with the output it reaches, never as regulated.
 * - A resistive or constant-power load outside the load model's validity (load.ts); past the regulation
 *   limit the point holds the load current, which such a load would not draw (flagged, not solved).
 * - No load in DCM where the power balance cannot be met: the model shows no pulse (flagged).
 * - Inductor peak against Isat at the ambient temperature: Isat(T) = Isat · (1 + tc · (T − T_isat));
 *   the ledger repeats the check at the hot-spot temperature.
 * - Blocking voltage against VDS / VR (beyond the derating margin: caution; beyond the rating: danger);
 *   MOSFET peak current against its ID rating; diode mean current against its IF rating (an average
 *   rating). Ringing and spikes are not modelled: measure them on hardware.
 * Source: common practice for rating checks; docs/methods.md §7 (saturation at the hot corner).
 */
import type { Design } from '../design/schema.ts';
import type { Warning } from '../warnings.ts';
import type { Circuit } from './circuit.ts';
import type { DutyLimit } from './duty.ts';
import type { OperatingPoint } from './types.ts';
import { loadModelWarnings } from './load.ts';
import { curvatureWarnings } from './curvature.ts';

const f4 = (x: number) => (Number.isFinite(x) ? Number(x.toPrecision(4)).toString() : String(x));

/** The fields of an operating point the warnings read (the solver's record, or the ledger's lean summary). */
export interface CheckedPoint {
  conditions: { ambientC: number };
  voutV: number;
  dutyCycle: number;
  mode: OperatingPoint['mode'];
  idleFraction: number;
  inductor: { averageA: number; rmsA: number; peakA: number; valleyA: number };
  stats: { switch: { peakA: number }; rectifier: { peakA: number; minA: number; averageA: number } };
  stress: { switchV: number; rectifierV: number };
  warnings: Warning[];
}

export interface CheckContext {
  design: Design;
  circuit: Circuit;
  limit: DutyLimit;
  /** The power balance could not be met within the duty limit (volt-second duty kept). */
  powerBalanceFallback: boolean;
}

function ratingWarnings(design: Design, op: CheckedPoint, out: Warning[]): void {
  const derate = design.margins.voltageDerating;
  const voltage = (role: 'switch' | 'rectifier', stress: number, rating: number, path: string) => {
    if (stress > rating) {
      out.push({ code: 'over-voltage-rating', severity: 'danger', part: role, path,
        message: `The ${role} blocks ${f4(stress)} V, above its ${f4(rating)} V rating (ringing not included).` });
    } else if (stress > rating * derate) {
      out.push({ code: 'over-voltage-rating', severity: 'caution', part: role, path,
        message: `The ${role} blocks ${f4(stress)} V, above ${f4(derate * 100)} % of its ${f4(rating)} V rating (ringing not included).` });
    }
  };
  const current = (role: 'switch' | 'rectifier', value: number, rating: number, what: string, path: string) => {
    if (value > rating) {
      out.push({ code: 'over-current-rating', severity: 'caution', part: role, path,
        message: `The ${role} ${what} current ${f4(value)} A is above its ${f4(rating)} A rating.` });
    }
  };
  const sw = design.parts.switch;
  voltage('switch', op.stress.switchV, sw.vdsRatingV, 'parts.switch.vdsRatingV');
  current('switch', op.stats.switch.peakA, sw.idRatingA, 'peak', 'parts.switch.idRatingA');
  const rect = design.parts.rectifier;
  if (rect.kind === 'mosfet') {
    voltage('rectifier', op.stress.rectifierV, rect.vdsRatingV, 'parts.rectifier.vdsRatingV');
    current('rectifier', Math.max(op.stats.rectifier.peakA, -op.stats.rectifier.minA), rect.idRatingA, 'peak', 'parts.rectifier.idRatingA');
  } else {
    voltage('rectifier', op.stress.rectifierV, rect.vrRatingV, 'parts.rectifier.vrRatingV');
    current('rectifier', op.stats.rectifier.averageA, rect.ifRatingA, 'mean forward', 'parts.rectifier.ifRatingA');
  }
}

/**
 * No load in DCM: the shape sizes each pulse from the load's charge (shape.ts), so with no load there is
 * no pulse (duty 0) and the standing losses the output side bears are booked as drawn from the source.
 * A real controller pulses just enough to hold the output; the pulse-skipping mode models that.
 */
function noLoadWarning(op: CheckedPoint): Warning {
  return { code: 'model-limit', severity: 'caution', path: 'topology.lightLoad',
    message: `No load: in discontinuous conduction this model sizes each pulse from the load current, so with no load it shows no pulse (duty ${f4(op.dutyCycle)}) and books the standing losses as drawn straight from the source at the specified output. A real controller pulses just often enough to hold the output; for a model of that choose pulse skipping under “At light load”.` };
}

/**
 * Past the regulation limit the output is lower than specified, but the point holds the load current: a
 * resistor R = Vout/I would draw less (I·Vout,reached/Vout), a constant-power load more (I·Vout/Vout,reached).
 */
function heldLoadWarning(design: Design, c: Circuit, op: CheckedPoint, out: Warning[]): void {
  const kind = design.spec.loadKind ?? 'constant-current';
  if (kind === 'constant-current' || !(c.loadA > 0) || !(op.voutV > 0) || op.voutV >= c.targetVoutV) return;
  const ratio = op.voutV / c.targetVoutV;
  const drawn = kind === 'resistive' ? c.loadA * ratio : c.loadA / ratio;
  const what = kind === 'resistive' ? `a resistor of ${f4(c.targetVoutV / c.loadA)} Ω would draw only` : `a constant-power load of ${f4(c.targetVoutV * c.loadA)} W would draw`;
  out.push({ code: 'model-limit', severity: 'caution', path: 'spec.loadKind',
    message: `The load current is held at ${f4(c.loadA)} A at this unregulated point, but at the ${f4(op.voutV)} V the output reaches ${what} ${f4(drawn)} A; losses, temperatures and efficiency here are those of ${f4(c.loadA)} A, not of the load as specified.` });
}

/** Appends the operating point's warnings to op.warnings. */
export function addWarnings(ctx: CheckContext, op: CheckedPoint): void {
  const { design, circuit: c } = ctx;
  const out = op.warnings;
  // Formatted only when a limit is reached (this runs once per swept point).
  const vTarget = ctx.limit === 'none' ? '' : f4(c.targetVoutV);
  switch (ctx.limit) {
    case 'duty-limit':
      out.push({ code: 'duty-limit', severity: 'caution', path: 'spec.maxDuty',
        message: `The duty cycle for ${vTarget} V exceeds the ${f4(design.spec.maxDuty)} limit; it is held at the limit.` });
      out.push({ code: 'cannot-regulate', severity: 'danger', path: 'spec.voutV',
        message: `Not regulated: at the duty limit the output reaches only ${f4(op.voutV)} V instead of ${vTarget} V at ${f4(c.loadA)} A.` });
      break;
    case 'conversion-ratio':
      out.push({ code: 'cannot-regulate', severity: 'danger', path: 'spec.voutV',
        message: `Not regulated: beyond the boost's highest conversion ratio at ${f4(c.loadA)} A the resistive drops limit the output to ${f4(op.voutV)} V (duty ${f4(op.dutyCycle)}) instead of ${vTarget} V.` });
      break;
    case 'step-down':
      out.push({ code: 'cannot-regulate', severity: 'danger', path: 'spec.voutV',
        message: `Not regulated: a boost cannot step down; with Vin ${f4(c.vinV)} V the output follows the input at ${f4(op.voutV)} V instead of ${vTarget} V.` });
      break;
    default:
      break;
  }
  if (ctx.powerBalanceFallback) {
    if (c.loadA === 0 && op.mode === 'DCM') out.push(noLoadWarning(op));
    else
      out.push({ code: 'model-limit', severity: 'caution',
        message: `The power balance needs more than the duty limit allows (losses too large for the load current, typical at light load); the duty shown comes from volt-second balance and the input current from the power balance. Near full load this means the converter may not regulate.` });
  }
  if (ctx.limit !== 'none') heldLoadWarning(design, c, op, out);
  if (op.mode === 'DCM') {
    out.push({ code: 'dcm', severity: 'info', path: c.synchronous ? 'topology.lightLoad' : undefined,
      message: `Discontinuous conduction: the inductor current is zero for ${f4(op.idleFraction * 100)} % of each period.` });
  }
  if (!c.blocksReverse && op.inductor.valleyA < 0) {
    out.push({ code: 'negative-current', severity: 'info', path: 'topology.lightLoad',
      message: `Forced PWM: the inductor current reverses to ${f4(op.inductor.valleyA)} A each period (circulating current through the rectifier MOSFET).` });
  }
  if (c.rolloffA > 0 && Math.abs(op.inductor.averageA) > c.rolloffA) {
    out.push({ code: 'model-limit', severity: 'info', part: 'inductor', path: 'parts.inductor.rolloff.currentA',
      message: `The mean inductor current ${f4(op.inductor.averageA)} A is beyond the roll-off point ${f4(c.rolloffA)} A; the inductance is held at its roll-off value ${f4(c.rolloffH)} H there.` });
  }
  const ind = design.parts.inductor;
  const isatAmb = Math.max(ind.isatA * (1 + ind.isatTempCoPerK * (op.conditions.ambientC - ind.isatAtC)), 0);
  if (op.inductor.peakA > isatAmb) {
    out.push({ code: 'saturation', severity: 'danger', part: 'inductor', path: 'parts.inductor.isatA',
      message: `Inductor peak ${f4(op.inductor.peakA)} A exceeds its saturation current ${f4(isatAmb)} A at the ${f4(op.conditions.ambientC)} °C ambient (it falls further when hot).` });
  }
  loadModelWarnings(c, out);
  curvatureWarnings(c, op, out);
  ratingWarnings(design, op, out);
}
