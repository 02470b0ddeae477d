/**
 * The pulse-skipping landmark: the load below which a design with topology.lightLoad "pulse-skipping"
 * fires pulses at its minimum peak current with idle time between them, at a pulse rate below the
 * switching frequency (light-load/pulse-skipping.ts, docs/methods.md §14). It lies where one pulse's
 * charge delivered at the switching frequency equals the load, I_change = Q(Ipk,min)·fs — found from the
 * pulse directly (the charge depends on the load only through the ESR and sense drops, so two fixed-point
 * steps settle it), with the drops at the sweep's ambient. The value is the efficiency there (on the
 * engine when a probe is given, else interpolated between the bracketing sweep points).
 */
import type { Design } from '../design/schema.ts';
import { conductionParameters, nominalConditions, uniformTemps } from '../operating-point/conditions.ts';
import { pulseSkippingAt } from '../light-load/pulse-skipping.ts';
import type { LoadSweep, SweepPoint } from '../sweep/types.ts';
import { interpolateAt } from './search.ts';
import type { Landmark } from './types.ts';

export function findPulseSkipping(sweep: LoadSweep, design?: Design, probe?: (load: number) => SweepPoint): Landmark {
  const none = (reason: string): Landmark => ({ unit: '', load: null, value: null, reason, note: null, method: 'none' });
  if (!design) return none('The design was not given with the sweep.');
  // (Stand-in designs of landmark tests carry no topology.)
  if ((design.topology as Design['topology'] | undefined)?.lightLoad !== 'pulse-skipping') return none('The design does not skip pulses at light load (its light-load behaviour is not pulse skipping).');
  const fixed = { vinV: sweep.vinV, ambientC: sweep.ambientC, switchingFrequencyHz: sweep.switchingFrequencyHz };
  const cp = conductionParameters(design, uniformTemps(sweep.ambientC));
  let load = 0;
  let note: string | null = null;
  for (let k = 0; k < 3; k++) {
    const state = pulseSkippingAt(design, nominalConditions(design, { ...fixed, loadA: load }), cp);
    if (!state || state.modeChangeLoadA === null) return none(state?.note ?? 'Pulse skipping does not apply.');
    load = state.modeChangeLoadA;
    note = state.note;
  }
  const points = sweep.points;
  let value: number | null = null;
  let method: Landmark['method'] = 'refined';
  if (probe) value = probe(load).efficiency;
  else {
    method = 'interpolated';
    for (let i = 1; i < points.length; i++) {
      const a = points[i - 1]!;
      const b = points[i]!;
      if (a.loadA <= load && load <= b.loadA) value = interpolateAt(a.loadA, a.efficiency, b.loadA, b.efficiency, load);
    }
  }
  const first = points[0]?.loadA ?? 0;
  const last = points[points.length - 1]?.loadA ?? 0;
  if (points.length > 0 && (load < first || load > last)) note = `It lies outside the swept loads (${first} A … ${last} A).`;
  return { unit: '', load, value, reason: null, note, method };
}
