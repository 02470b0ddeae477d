/**
 * The ledger's rating and life checks (hazards/ratings.ts) at the solved temperatures, with a warning for
 * each check that fails. The operating point already warns on switch/rectifier voltage and current
 * against their ratings; here they are repeated as RatingCheck records (no second warning), and the
 * checks that need temperatures or the ledger are added with their warnings.
 * Where the records go is the keeper's (keep.ts): the full record keeps them all, a sweep makes each in
 * one scratch record and keeps none (same comparisons, same warnings).
 */
import type { Design } from '../design/schema.ts';
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
import type { PartTemperature } from './types.ts';
import type { PointSummary } from '../operating-point/lean-point.ts';
import type { Keeper } from './keep.ts';

const f3 = (x: number) => (Number.isFinite(x) ? Number(x.toPrecision(3)).toString() : String(x));

/** The part's temperature record, or undefined. */
function temperatureOf(temps: readonly PartTemperature[], role: PartTemperature['part']): PartTemperature | undefined {
  for (let i = 0; i < temps.length; i++) if (temps[i]!.part === role) return temps[i];
  return undefined;
}

/** Every check to the keeper, and the failures' warnings to `warnings`. */
export function ratingChecks(
  design: Design,
  op: PointSummary,
  temps: readonly PartTemperature[],
  warnings: Warning[],
  keeper: Keeper,
): void {
  const into = keeper.scratch;
  const m = design.margins;
  const parts = design.parts;

  for (let k = 0; k < temps.length; k++) {
    const t = temps[k]!;
    const c = temperatureCheck(t.part, t.celsius, t.limit, m.temperatureMarginK, into);
    keeper.check(c);
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
  const tL = temperatureOf(temps, 'inductor')?.celsius ?? op.conditions.ambientC;
  const peak = Math.max(op.inductor.peakA, -op.inductor.minA);
  const sat = saturationCheck(peak, isatAt(ind.isatA, ind.isatAtC, ind.isatTempCoPerK, tL), into);
  keeper.check(sat);
  if (!sat.ok) {
    const i = warnings.findIndex((w) => w.code === 'saturation' && w.part === 'inductor');
    if (i >= 0) warnings.splice(i, 1);
    warnings.push({
      code: 'saturation', severity: 'danger', part: 'inductor', path: 'parts.inductor.isatA',
      message: `Inductor peak ${f3(sat.value)} A exceeds its saturation current ${f3(sat.limit)} A at its ${f3(tL)} °C hot spot.`,
    });
  }
  // Made after the saturation warning (the scratch record then holds this check).
  const irms = currentCheck('inductor', op.inductor.rmsA, ind.irmsRatingA, 'RMS current', into);
  keeper.check(irms);
  if (!irms.ok) {
    warnings.push({ code: 'over-current-rating', severity: 'caution', part: 'inductor', path: 'parts.inductor.irmsRatingA',
      message: `Inductor RMS current ${f3(irms.value)} A is above its ${f3(irms.limit)} A rating.` });
  }

  if (keeper.records) {
    // Records only: the operating point has already warned on these (checks.ts of the operating point).
    keeper.check(voltageCheck('switch', op.stress.switchV, parts.switch.vdsRatingV, m.voltageDerating));
    keeper.check(currentCheck('switch', op.stats.switch.peakA, parts.switch.idRatingA, 'peak current'));
    const rect = parts.rectifier;
    if (rect.kind === 'mosfet') {
      keeper.check(voltageCheck('rectifier', op.stress.rectifierV, rect.vdsRatingV, m.voltageDerating));
      keeper.check(currentCheck('rectifier', Math.max(op.stats.rectifier.peakA, -op.stats.rectifier.minA), rect.idRatingA, 'peak current'));
    } else {
      keeper.check(voltageCheck('rectifier', op.stress.rectifierV, rect.vrRatingV, m.voltageDerating));
      keeper.check(currentCheck('rectifier', op.stats.rectifier.averageA, rect.ifRatingA, 'mean forward current'));
    }
  }

  for (let k = 0; k < 2; k++) {
    const role = k === 0 ? 'inputCapacitor' : 'outputCapacitor';
    const bank = k === 0 ? parts.inputCapacitor : parts.outputCapacitor;
    const irmsBank = k === 0 ? op.stats.inputCapacitor.rmsA : op.stats.outputCapacitor.rmsA;
    const vBank = k === 0 ? op.conditions.vinV : op.voutV;
    const cap = bank.part;
    const v = voltageCheck(role, vBank, cap.voltageRatingV, m.voltageDerating, into);
    keeper.check(v);
    if (!v.ok) {
      warnings.push({ code: 'over-voltage-rating', severity: vBank > cap.voltageRatingV ? 'danger' : 'caution', part: role,
        path: `parts.${role}.part.voltageRatingV`,
        message: `The ${role} sees ${f3(vBank)} V, above ${f3(m.voltageDerating * 100)} % of its ${f3(cap.voltageRatingV)} V rating.` });
    }
    const r = rippleCheck(role, irmsBank / bank.count, cap.rippleRatingA, m.rippleCurrentDerating, into);
    keeper.check(r);
    if (!r.ok) {
      warnings.push({ code: 'ripple-current-rating', severity: 'caution', part: role, path: `parts.${role}.part.rippleRatingA`,
        message: `Each ${role} carries ${f3(r.value)} A RMS, above ${f3(r.limit)} A (rating × ${f3(m.rippleCurrentDerating)}).` });
    }
    const t = temperatureOf(temps, role);
    if (cap.dielectric === 'electrolytic' && cap.life && m.requiredLifeHours !== undefined && t) {
      const life = lifeCheck(role, electrolyticLifeHours(cap.life.ratedHours, cap.life.ratedC, t.celsius), m.requiredLifeHours, into);
      keeper.check(life);
      if (!life.ok) {
        warnings.push({ code: 'capacitor-life', severity: 'caution', part: role, path: 'margins.requiredLifeHours',
          message: `The ${role} lasts about ${f3(life.value)} h at ${f3(t.celsius)} °C (10 K rule, common practice), short of the required ${f3(life.limit)} h.` });
      }
    }
  }

  const sense = parts.senseResistor;
  const ts = temperatureOf(temps, 'senseResistor');
  if (sense && ts) {
    const rated = resistorRatingAt(sense.powerRatingW, sense.deratingStartC, sense.zeroPowerC, ts.celsius);
    const c = resistorPowerCheck('senseResistor', ts.dissipationW, rated, m.resistorPowerDerating, into);
    keeper.check(c);
    if (!c.ok) {
      warnings.push({ code: 'resistor-power', severity: 'caution', part: 'senseResistor', path: 'parts.senseResistor.powerRatingW',
        message: `The sense resistor dissipates ${f3(c.value)} W, above ${f3(c.limit)} W (its rating derated at ${f3(ts.celsius)} °C × ${f3(m.resistorPowerDerating)}).` });
    }
  }
}
