/**
 * The operating-point table as rows of data (quantity, SI value, unit, optional rating), so the
 * component only renders and the numbers can be checked against the engine in tests. Values are the
 * engine's own numbers; nothing is recomputed here except the share of a rating.
 */
import { CONDITION_LABELS, formatEngineering, ROLE_LABELS, type Design, type OperatingPoint } from '../../shared-model/index.ts';

export interface OperatingPointRow {
  /** Stable key for tests and the data table ("inductor.rmsA"). */
  key: string;
  group: string;
  label: string;
  value: number;
  /** Canonical unit for formatEngineering ("%" shows a fraction as a percentage). */
  unit: string;
  /** A rating the value is checked against (same unit); `usable` is the design's derating fraction. */
  rating?: { label: string; value: number; usable: number };
}

/**
 * `evaluatedHz`: the switching frequency the evaluation was asked at. Where the point was solved at
 * another rate (pulse skipping: the pulse rate), the frequency row says it is the equivalent one.
 */
export function operatingPointRows(op: OperatingPoint, design: Design, evaluatedHz?: number): OperatingPointRow[] {
  const rows: OperatingPointRow[] = [];
  const add = (group: string, key: string, label: string, value: number, unit: string, rating?: OperatingPointRow['rating']) =>
    rows.push({ group, key, label, value, unit, ...(rating ? { rating } : {}) });
  const parts = design.parts;
  const rectifierRating = parts.rectifier.kind === 'diode' ? parts.rectifier.vrRatingV : parts.rectifier.vdsRatingV;
  const vUse = design.margins.voltageDerating;
  const rippleUse = design.margins.rippleCurrentDerating;

  add('Conditions', 'conditions.vinV', CONDITION_LABELS.vinV, op.conditions.vinV, 'V');
  add('Conditions', 'conditions.loadA', CONDITION_LABELS.loadA, op.conditions.loadA, 'A');
  const skipping = evaluatedHz !== undefined && op.conditions.switchingFrequencyHz !== evaluatedHz;
  const fsLabel = skipping ? `Equivalent switching frequency (pulse skipping; ${CONDITION_LABELS.switchingFrequencyHz.toLowerCase()} while awake: ${formatEngineering(evaluatedHz, 'Hz', 4)})` : CONDITION_LABELS.switchingFrequencyHz;
  add('Conditions', 'conditions.switchingFrequencyHz', fsLabel, op.conditions.switchingFrequencyHz, 'Hz');
  add('Conditions', 'voutV', 'Output voltage', op.voutV, 'V');
  add('Conditions', 'outputPowerW', 'Output power', op.outputPowerW, 'W');
  add('Timing', 'dutyCycle', 'Duty cycle', op.dutyCycle, '%');
  add('Timing', 'rectifierFraction', 'Rectifier conducts', op.rectifierFraction, '%');
  if (op.mode === 'DCM') add('Timing', 'idleFraction', 'Zero-current interval', op.idleFraction, '%');
  add(ROLE_LABELS.inductor, 'inductor.averageA', 'Average current', op.inductor.averageA, 'A');
  add(ROLE_LABELS.inductor, 'inductor.rmsA', 'RMS current', op.inductor.rmsA, 'A', { label: 'RMS rating', value: parts.inductor.irmsRatingA, usable: 1 });
  add(ROLE_LABELS.inductor, 'inductor.peakA', 'Peak current', op.inductor.peakA, 'A', { label: 'Isat', value: parts.inductor.isatA, usable: 1 });
  add(ROLE_LABELS.inductor, 'inductor.valleyA', 'Valley current', op.inductor.valleyA, 'A');
  add(ROLE_LABELS.inductor, 'inductor.rippleA', 'Ripple, peak to peak', op.inductor.rippleA, 'A');
  add(ROLE_LABELS.switch, 'stats.switch.averageA', 'Average current', op.stats.switch.averageA, 'A');
  add(ROLE_LABELS.switch, 'stats.switch.rmsA', 'RMS current', op.stats.switch.rmsA, 'A');
  add(ROLE_LABELS.switch, 'stats.switch.peakA', 'Peak current', op.stats.switch.peakA, 'A', { label: 'ID rating', value: parts.switch.idRatingA, usable: 1 });
  add(ROLE_LABELS.switch, 'stress.switchV', 'Blocking voltage', op.stress.switchV, 'V', { label: 'VDS rating', value: parts.switch.vdsRatingV, usable: vUse });
  add(ROLE_LABELS.rectifier, 'stats.rectifier.averageA', 'Average current', op.stats.rectifier.averageA, 'A');
  add(ROLE_LABELS.rectifier, 'stats.rectifier.rmsA', 'RMS current', op.stats.rectifier.rmsA, 'A');
  add(ROLE_LABELS.rectifier, 'stats.rectifier.peakA', 'Peak current', op.stats.rectifier.peakA, 'A');
  add(ROLE_LABELS.rectifier, 'stress.rectifierV', 'Blocking voltage', op.stress.rectifierV, 'V', {
    label: parts.rectifier.kind === 'diode' ? 'VR rating' : 'VDS rating',
    value: rectifierRating,
    usable: vUse,
  });
  const inCap = parts.inputCapacitor;
  const outCap = parts.outputCapacitor;
  add('Capacitors', 'stats.inputCapacitor.rmsA', 'Input capacitor RMS current', op.stats.inputCapacitor.rmsA, 'A', {
    label: 'ripple rating',
    value: inCap.part.rippleRatingA * inCap.count,
    usable: rippleUse,
  });
  add('Capacitors', 'stats.outputCapacitor.rmsA', 'Output capacitor RMS current', op.stats.outputCapacitor.rmsA, 'A', {
    label: 'ripple rating',
    value: outCap.part.rippleRatingA * outCap.count,
    usable: rippleUse,
  });
  if (parts.senseResistor) add(ROLE_LABELS.senseResistor, 'stats.sense.rmsA', 'RMS current', op.stats.sense.rmsA, 'A');
  add('Source and output', 'waveforms.inputA', 'Average input current', op.waveforms.inputA, 'A');
  add('Source and output', 'outputRipple.capacitiveV', 'Output ripple from charge', op.outputRipple.capacitiveV, 'V');
  add('Source and output', 'outputRipple.esrV', 'Output ripple from ESR', op.outputRipple.esrV, 'V');
  add('Source and output', 'outputRipple.totalV', 'Output ripple, total', op.outputRipple.totalV, 'V');
  if (op.smallSignal) {
    add('Control landmarks (small signal)', 'smallSignal.rhpZeroHz', 'Right-half-plane zero', op.smallSignal.rhpZeroHz, 'Hz');
    add('Control landmarks (small signal)', 'smallSignal.outputPoleHz', 'Output pole (current mode)', op.smallSignal.outputPoleHz, 'Hz');
  }
  return rows;
}

/** Share of a rating used, as a fraction (absolute value, so reverse currents count too). */
export function ratingShare(row: OperatingPointRow): number | null {
  if (!row.rating || !(row.rating.value > 0)) return null;
  return Math.abs(row.value) / row.rating.value;
}

/** "over": above the rating; "derated": above the usable share the design allows; else "ok". */
export function ratingState(row: OperatingPointRow): 'ok' | 'derated' | 'over' | null {
  const share = ratingShare(row);
  if (share === null || !row.rating) return null;
  if (share > 1) return 'over';
  return share > row.rating.usable ? 'derated' : 'ok';
}
