/**
 * Does a part fit a role's ratings? The candidate design is evaluated at rated load at minimum and
 * maximum input voltage (the corners of highest current and highest voltage stress for both buck and
 * boost), and the larger stress of the two is checked against the part's ratings:
 * - MOSFET: blocking voltage ≤ VDS rating × voltage derating; peak current ≤ ID rating × current derating;
 * - diode: reverse voltage ≤ VR rating × voltage derating; average current ≤ IF rating × current derating;
 * - inductor: peak current ≤ Isat at its temperature (Isat·(1 + tempco·(T − Tisat))); RMS current ≤
 *   RMS rating × current derating;
 * - capacitor: its DC voltage ≤ rating × voltage derating; RMS ripple per capacitor ≤ rating × ripple derating;
 * - sense resistor: dissipation ≤ power rating × resistor derating;
 * - controller: no rating in the design document; always fits.
 * Voltage, ripple, resistor and current deratings come from the design's margins; the current derating
 * is optional there (absent: 0.8, common practice) and a caller may still pass its own.
 */
import type { Part } from '../design/parts.ts';
import type { Design, Role } from '../design/schema.ts';
import type { Evaluation } from '../ledger/types.ts';

export const DEFAULT_CURRENT_DERATING = 0.8;

/** The design's current derating (margins.currentDerating), or the common-practice 0.8 when it has none. */
export function currentDeratingOf(design: Design): number {
  return design.margins.currentDerating ?? DEFAULT_CURRENT_DERATING;
}

export interface RoleStress {
  switchV: number;
  switchPeakA: number;
  rectifierV: number;
  rectifierPeakA: number;
  rectifierAverageA: number;
  inductorPeakA: number;
  inductorRmsA: number;
  inductorC: number;
  inputCapacitorRmsA: number;
  outputCapacitorRmsA: number;
  inputV: number;
  outputV: number;
  senseW: number;
}

/** The larger stress of each kind over several evaluations. */
export function stressOf(evaluations: readonly Evaluation[]): RoleStress {
  const s: RoleStress = {
    switchV: 0, switchPeakA: 0, rectifierV: 0, rectifierPeakA: 0, rectifierAverageA: 0, inductorPeakA: 0,
    inductorRmsA: 0, inductorC: -Infinity, inputCapacitorRmsA: 0, outputCapacitorRmsA: 0, inputV: 0, outputV: 0, senseW: 0,
  };
  for (const e of evaluations) {
    const op = e.operatingPoint;
    const max = (key: keyof RoleStress, v: number) => {
      if (v > s[key]) s[key] = v;
    };
    max('switchV', op.stress.switchV);
    max('switchPeakA', Math.max(Math.abs(op.stats.switch.peakA), Math.abs(op.stats.switch.minA)));
    max('rectifierV', op.stress.rectifierV);
    max('rectifierPeakA', Math.max(Math.abs(op.stats.rectifier.peakA), Math.abs(op.stats.rectifier.minA)));
    max('rectifierAverageA', Math.abs(op.stats.rectifier.averageA));
    max('inductorPeakA', Math.max(Math.abs(op.inductor.peakA), Math.abs(op.inductor.minA)));
    max('inductorRmsA', op.inductor.rmsA);
    max('inductorC', e.temperatures.find((t) => t.part === 'inductor')?.celsius ?? e.conditions.ambientC);
    max('inputCapacitorRmsA', op.stats.inputCapacitor.rmsA);
    max('outputCapacitorRmsA', op.stats.outputCapacitor.rmsA);
    max('inputV', e.conditions.vinV);
    max('outputV', op.voutV);
    max('senseW', e.losses.filter((l) => l.part === 'senseResistor').reduce((sum, l) => sum + l.watts, 0));
  }
  return s;
}

/** One rating of a part against the role's stress: the compared value and its derated limit. */
export interface RatingLimit {
  what: string;
  value: number;
  limit: number;
  unit: string;
}

/** Every rating the part has for the role, each against the stress (value) and its derated limit. */
export function ratingLimits(design: Design, role: Role, part: Part, s: RoleStress, currentDerating = currentDeratingOf(design)): RatingLimit[] {
  const m = design.margins;
  const out: RatingLimit[] = [];
  const need = (value: number, limit: number, what: string, unit: string) => out.push({ what, value, limit, unit });
  const [v, pk, avg] = role === 'switch' ? [s.switchV, s.switchPeakA, 0] : [s.rectifierV, s.rectifierPeakA, s.rectifierAverageA];
  switch (part.kind) {
    case 'mosfet':
      need(v, part.vdsRatingV * m.voltageDerating, 'Blocking voltage', 'V');
      need(pk, part.idRatingA * currentDerating, 'Peak current', 'A');
      break;
    case 'diode':
      need(v, part.vrRatingV * m.voltageDerating, 'Reverse voltage', 'V');
      need(avg, part.ifRatingA * currentDerating, 'Average forward current', 'A');
      break;
    case 'inductor': {
      const isat = part.isatA * (1 + part.isatTempCoPerK * (s.inductorC - part.isatAtC));
      need(s.inductorPeakA, isat, 'Peak current (against Isat at the hot inductor)', 'A');
      need(s.inductorRmsA, part.irmsRatingA * currentDerating, 'RMS current', 'A');
      break;
    }
    case 'capacitor': {
      const input = role === 'inputCapacitor';
      const count = input ? design.parts.inputCapacitor.count : design.parts.outputCapacitor.count;
      need(input ? s.inputV : s.outputV, part.voltageRatingV * m.voltageDerating, 'DC voltage', 'V');
      need((input ? s.inputCapacitorRmsA : s.outputCapacitorRmsA) / count, part.rippleRatingA * m.rippleCurrentDerating, 'Ripple current per capacitor', 'A');
      break;
    }
    case 'resistor':
      need(s.senseW, part.powerRatingW * m.resistorPowerDerating, 'Dissipation', 'W');
      break;
    case 'controller':
      break;
  }
  return out;
}
