/**
 * The ledger's rating and life checks (hazards/ratings.ts) at the solved temperatures, with a warning for
 * each check that fails. The operating point already warns on switch/rectifier voltage and current
 * against their ratings; here they are repeated as RatingCheck records (no second warning), and the
 * checks that need temperatures or the ledger are added with their warnings.
 */
import type { Design } from '../design/schema.ts';
import type { OperatingPoint } from '../operating-point/types.ts';
import type { Warning } from '../warnings.ts';
import {
  currentCheck,
  electrolyticLifeHours,
  isatAt,
  lifeCheck,
  resistorPowerCheck,
  resistorRatingAt,
  rippleCheck,
  saturationCheck,
  temperatureCheck,
  voltageCheck,
} from '../hazards/ratings.ts';
import type { PartTemperature, RatingCheck } from './types.ts';

const f3 = (x: number) => (Number.isFinite(x) ? Number(x.toPrecision(3)).toString() : String(x));

export function ratingChecks(design: Design, op: OperatingPoint, temps: PartTemperature[], warnings: Warning[]): RatingCheck[] {
  const out: RatingCheck[] = [];
  const m = design.margins;
  const parts = design.parts;
  const tempOf = (role: PartTemperature['part']) => temps.find((t) => t.part === role);

  for (const t of temps) {
    const c = temperatureCheck(t.part, t.celsius, t.limit, m.temperatureMarginK);
    out.push(c);
    if (!c.ok) {
      const over = t.celsius > t.limit;
      warnings.push({
        code: 'over-temperature', severity: over ? 'danger' : 'caution', part: t.part, path: `thermal.paths.${t.part}`,
        message: over
          ? `The ${t.part} reaches about ${f3(t.celsius)} °C, above its ${f3(t.limit)} °C limit (estimate: measure on hardware).`
          : `The ${t.part} reaches about ${f3(t.celsius)} °C, inside the ${f3(m.temperatureMarginK)} K margin below its ${f3(t.limit)} °C limit (estimate: measure on hardware).`,
      });
    }
  }

  const ind = parts.inductor;
  const tL = tempOf('inductor')?.celsius ?? op.conditions.ambientC;
  const peak = Math.max(op.inductor.peakA, -op.inductor.minA);
  const sat = saturationCheck(peak, isatAt(ind.isatA, ind.isatAtC, ind.isatTempCoPerK, tL));
  out.push(sat);
  const irms = currentCheck('inductor', op.inductor.rmsA, ind.irmsRatingA, 'RMS current');
  out.push(irms);
  if (!sat.ok) {
    const i = warnings.findIndex((w) => w.code === 'saturation' && w.part === 'inductor');
    if (i >= 0) warnings.splice(i, 1);
    warnings.push({
      code: 'saturation', severity: 'danger', part: 'inductor', path: 'parts.inductor.isatA',
      message: `Inductor peak ${f3(sat.value)} A exceeds its saturation current ${f3(sat.limit)} A at its ${f3(tL)} °C hot spot.`,
    });
  }
  if (!irms.ok) {
    warnings.push({ code: 'over-current-rating', severity: 'caution', part: 'inductor', path: 'parts.inductor.irmsRatingA',
      message: `Inductor RMS current ${f3(irms.value)} A is above its ${f3(irms.limit)} A rating.` });
  }

  out.push(voltageCheck('switch', op.stress.switchV, parts.switch.vdsRatingV, m.voltageDerating));
  out.push(currentCheck('switch', op.stats.switch.peakA, parts.switch.idRatingA, 'peak current'));
  const rect = parts.rectifier;
  if (rect.kind === 'mosfet') {
    out.push(voltageCheck('rectifier', op.stress.rectifierV, rect.vdsRatingV, m.voltageDerating));
    out.push(currentCheck('rectifier', Math.max(op.stats.rectifier.peakA, -op.stats.rectifier.minA), rect.idRatingA, 'peak current'));
  } else {
    out.push(voltageCheck('rectifier', op.stress.rectifierV, rect.vrRatingV, m.voltageDerating));
    out.push(currentCheck('rectifier', op.stats.rectifier.averageA, rect.ifRatingA, 'mean forward current'));
  }

  const banks = [
    { role: 'inputCapacitor' as const, slot: parts.inputCapacitor, irms: op.stats.inputCapacitor.rmsA, v: op.conditions.vinV },
    { role: 'outputCapacitor' as const, slot: parts.outputCapacitor, irms: op.stats.outputCapacitor.rmsA, v: op.voutV },
  ];
  for (const b of banks) {
    const cap = b.slot.part;
    const v = voltageCheck(b.role, b.v, cap.voltageRatingV, m.voltageDerating);
    out.push(v);
    if (!v.ok) {
      warnings.push({ code: 'over-voltage-rating', severity: b.v > cap.voltageRatingV ? 'danger' : 'caution', part: b.role,
        path: `parts.${b.role}.part.voltageRatingV`,
        message: `The ${b.role} sees ${f3(b.v)} V, above ${f3(m.voltageDerating * 100)} % of its ${f3(cap.voltageRatingV)} V rating.` });
    }
    const r = rippleCheck(b.role, b.irms / b.slot.count, cap.rippleRatingA, m.rippleCurrentDerating);
    out.push(r);
    if (!r.ok) {
      warnings.push({ code: 'ripple-current-rating', severity: 'caution', part: b.role, path: `parts.${b.role}.part.rippleRatingA`,
        message: `Each ${b.role} carries ${f3(r.value)} A RMS, above ${f3(r.limit)} A (rating × ${f3(m.rippleCurrentDerating)}).` });
    }
    const t = tempOf(b.role);
    if (cap.dielectric === 'electrolytic' && cap.life && m.requiredLifeHours !== undefined && t) {
      const life = lifeCheck(b.role, electrolyticLifeHours(cap.life.ratedHours, cap.life.ratedC, t.celsius), m.requiredLifeHours);
      out.push(life);
      if (!life.ok) {
        warnings.push({ code: 'capacitor-life', severity: 'caution', part: b.role, path: 'margins.requiredLifeHours',
          message: `The ${b.role} lasts about ${f3(life.value)} h at ${f3(t.celsius)} °C (10 K rule, common practice), short of the required ${f3(life.limit)} h.` });
      }
    }
  }

  const sense = parts.senseResistor;
  const ts = tempOf('senseResistor');
  if (sense && ts) {
    const rated = resistorRatingAt(sense.powerRatingW, sense.deratingStartC, sense.zeroPowerC, ts.celsius);
    const c = resistorPowerCheck('senseResistor', ts.dissipationW, rated, m.resistorPowerDerating);
    out.push(c);
    if (!c.ok) {
      warnings.push({ code: 'resistor-power', severity: 'caution', part: 'senseResistor', path: 'parts.senseResistor.powerRatingW',
        message: `The sense resistor dissipates ${f3(c.value)} W, above ${f3(c.limit)} W (its rating derated at ${f3(ts.celsius)} °C × ${f3(m.resistorPowerDerating)}).` });
    }
  }
  return out;
}
