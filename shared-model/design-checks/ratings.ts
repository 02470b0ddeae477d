/**
 * Stresses at the regulated corners against the parts' ratings, the same rules as the ranking's role fit
 * (compare/role-fit.ts):
 * - switch and rectifier blocking voltage ≤ rating × voltage derating (margins.voltageDerating);
 * - MOSFET peak |current| ≤ ID rating × current derating; diode mean current ≤ IF rating × derating;
 * - inductor peak |current| ≤ Isat at its hot-spot temperature at that corner, Isat·(1 + c·(T − T_isat));
 *   inductor RMS current ≤ RMS rating × current derating;
 * - capacitor DC voltage ≤ rating × voltage derating; RMS current per capacitor ≤ ripple rating × ripple
 *   derating (equal sharing assumed).
 * Between the derated and the full rating a check warns; past the full rating it fails (Isat has no
 * derating: past it fails). Each check is read at the corner where value/limit is largest. When it does
 * not pass, the rating the sizing found (sizing/stresses.ts, sizing/inductor.ts) is named.
 * The current derating is a setting (default 0.8, common practice). Ringing is not modelled.
 * Source: common practice (derating); docs/methods.md §1 (currents), §7 (saturation), §9 (ratings), §23, §24.
 */
import type { Design, Role } from '../design/schema.ts';
import { isatAt } from '../hazards/ratings.ts';
import type { SolvedCorner } from '../sizing/corners.ts';
import type { Sizing } from '../sizing/types.ts';
import type { DesignCheck, DesignCheckId } from './types.ts';
import { designCheck, worstOf } from './verdict.ts';
import { eng, pct } from './words.ts';

const op = (c: SolvedCorner) => c.evaluation.operatingPoint;
const absPeak = (s: { peakA: number; minA: number }) => Math.max(Math.abs(s.peakA), Math.abs(s.minA));
const RATING_SOURCE = 'common practice (derating); docs/methods.md §9, §23, §24';

interface RatedStress {
  id: DesignCheckId;
  label: string;
  part: Role;
  unit: string;
  /** The stress at a corner. */
  valueOf: (c: SolvedCorner) => number;
  rating: number;
  derating: number;
  /** "blocks", "peaks at", … (the verb with what is compared). */
  what: string;
  /** What the sizing says is needed, as a phrase (used when the check does not pass). */
  needs: string;
  source?: string;
}

function ratedCheck(usable: readonly SolvedCorner[], r: RatedStress): DesignCheck | null {
  const limit = r.rating * r.derating;
  const at = worstOf(usable, r.valueOf);
  if (!at) return null;
  const value = r.valueOf(at);
  return designCheck({
    id: r.id, label: r.label, part: r.part, value, limit, unit: r.unit, bound: 'max', failAt: r.rating, at,
    source: r.source ?? RATING_SOURCE,
    message: (s) => {
      const head = `The ${r.what} ${eng(value, r.unit)} at ${at.corner.label} against ${pct(r.derating)} of its ${eng(r.rating, r.unit)} rating`;
      if (s === 'pass') return `${head}.`;
      return `${head}${s === 'fail' ? ', past the full rating' : ''}; ${r.needs}.`;
    },
  });
}

export function ratingChecks(design: Design, sizing: Sizing, usable: readonly SolvedCorner[]): DesignCheck[] {
  const { parts, margins } = design;
  const st = sizing.stresses;
  const vd = margins.voltageDerating;
  const cd = st.currentDerating;
  const out: (DesignCheck | null)[] = [];
  out.push(ratedCheck(usable, {
    id: 'switch-voltage', label: 'Switch voltage', part: 'switch', unit: 'V', valueOf: (c) => op(c).stress.switchV,
    rating: parts.switch.vdsRatingV, derating: vd, what: 'switch blocks', needs: `it needs a VDS rating of at least ${eng(st.required.switchVdsV, 'V')} (ringing not included)`,
  }));
  out.push(ratedCheck(usable, {
    id: 'switch-current', label: 'Switch peak current', part: 'switch', unit: 'A', valueOf: (c) => absPeak(op(c).stats.switch),
    rating: parts.switch.idRatingA, derating: cd, what: 'switch current peaks at', needs: `it needs an ID rating of at least ${eng(st.required.switchIdA, 'A')}`,
  }));
  const rect = parts.rectifier;
  const diode = rect.kind === 'diode';
  out.push(ratedCheck(usable, {
    id: 'rectifier-voltage', label: 'Rectifier voltage', part: 'rectifier', unit: 'V', valueOf: (c) => op(c).stress.rectifierV,
    rating: diode ? rect.vrRatingV : rect.vdsRatingV, derating: vd, what: 'rectifier blocks',
    needs: `it needs a ${diode ? 'VR' : 'VDS'} rating of at least ${eng(st.required.rectifierVoltageV, 'V')}`,
  }));
  out.push(ratedCheck(usable, {
    id: 'rectifier-current', label: diode ? 'Rectifier mean current' : 'Rectifier peak current', part: 'rectifier', unit: 'A',
    valueOf: (c) => (diode ? Math.abs(op(c).stats.rectifier.averageA) : absPeak(op(c).stats.rectifier)),
    rating: diode ? rect.ifRatingA : rect.idRatingA, derating: cd, what: diode ? 'rectifier mean current is' : 'rectifier current peaks at',
    needs: `it needs ${diode ? 'an IF' : 'an ID'} rating of at least ${eng(st.required.rectifierCurrentA, 'A')}`,
  }));
  out.push(saturationCheck(design, sizing, usable));
  out.push(ratedCheck(usable, {
    id: 'inductor-rms', label: 'Inductor RMS current', part: 'inductor', unit: 'A', valueOf: (c) => op(c).inductor.rmsA,
    rating: parts.inductor.irmsRatingA, derating: cd, what: 'inductor RMS current is',
    needs: `it needs an RMS rating of at least ${eng(sizing.inductor.requiredRmsA.value / cd, 'A')} with the inductance the ripple target asks for`,
    source: 'common practice (derating); docs/methods.md §1, §23, §24',
  }));
  for (const role of ['inputCapacitor', 'outputCapacitor'] as const) {
    const slot = parts[role];
    const input = role === 'inputCapacitor';
    const name = input ? 'Input' : 'Output';
    out.push(ratedCheck(usable, {
      id: input ? 'input-capacitor-voltage' : 'output-capacitor-voltage', label: `${name} capacitor voltage`, part: role, unit: 'V',
      valueOf: (c) => (input ? c.corner.vinV : op(c).voutV), rating: slot.part.voltageRatingV, derating: vd,
      what: `${name.toLowerCase()} capacitor sees`, needs: `it needs a voltage rating of at least ${eng((input ? design.spec.vinMaxV : design.spec.voutV) / vd, 'V')}`,
    }));
    const rmsOf = (c: SolvedCorner) => (input ? op(c).stats.inputCapacitor.rmsA : op(c).stats.outputCapacitor.rmsA);
    const perPart = slot.part.rippleRatingA * margins.rippleCurrentDerating;
    const at = worstOf(usable, rmsOf);
    const count = at && perPart > 0 ? Math.ceil(rmsOf(at) / perPart) : slot.count;
    out.push(ratedCheck(usable, {
      id: input ? 'input-capacitor-ripple-current' : 'output-capacitor-ripple-current', label: `${name} capacitor ripple current`, part: role, unit: 'A',
      valueOf: (c) => rmsOf(c) / slot.count, rating: slot.part.rippleRatingA, derating: margins.rippleCurrentDerating,
      what: `RMS current per capacitor (${slot.count} in the bank, equal sharing assumed) is`,
      needs: `the bank needs at least ${count} of these capacitors, or a higher ripple rating`,
    }));
  }
  return out.filter((c): c is DesignCheck => c !== null);
}

function saturationCheck(design: Design, sizing: Sizing, usable: readonly SolvedCorner[]): DesignCheck | null {
  const ind = design.parts.inductor;
  const hotC = (c: SolvedCorner) => c.evaluation.temperatures.find((t) => t.part === 'inductor')?.celsius ?? c.evaluation.conditions.ambientC;
  const isatHot = (c: SolvedCorner) => isatAt(ind.isatA, ind.isatAtC, ind.isatTempCoPerK, hotC(c));
  const peak = (c: SolvedCorner) => Math.max(op(c).inductor.peakA, -op(c).inductor.minA);
  const at = worstOf(usable, (c) => (isatHot(c) > 0 ? peak(c) / isatHot(c) : Infinity));
  if (!at) return null;
  const value = peak(at);
  const limit = isatHot(at);
  return designCheck({
    id: 'inductor-saturation', label: 'Inductor peak vs Isat (hot)', part: 'inductor', value, limit, unit: 'A', bound: 'max', at,
    source: 'docs/methods.md §7 (saturation at the hot corner), §23, §24',
    message: (s) => `The inductor peaks at ${eng(value, 'A')} at ${at.corner.label} against its saturation current ${eng(limit, 'A')} at its ${eng(hotC(at), '°C')} hot spot` +
      (s === 'pass' ? '.' : `: it saturates; it needs an Isat of at least ${eng(value, 'A')} hot (${eng(sizing.inductor.requiredIsatA.value, 'A')} with the inductance the ripple target asks for).`),
  });
}
