/**
 * Notices on a valid design: things that do not stop a calculation but that the engineer should know —
 * keys WattLedger ignored (often a misspelling), parts or paths that are present but unused, heatsinks
 * nobody is mounted on, a life requirement no capacitor can be checked against, a duty limit that cannot
 * reach the output anywhere in the specified input range.
 *
 * The duty reach. Even without losses a buck needs D = Vout/Vin and a boost D = 1 − Vin/Vout
 * (Erickson & Maksimović 2nd ed. ch. 2 [memory for chapter]); the easiest input is Vin,max. When
 * spec.maxDuty is below that duty, no point of the design regulates. This is a notice, not a problem:
 * the models stay meaningful (every result is computed at the duty limit and flagged unregulated, with a
 * cannot-regulate warning), it is a poor design rather than an impossible one [our own rule].
 */
import type { Design } from './schema.ts';
import type { DesignNotice } from './problems.ts';
import { compactValue, pathToString } from './problems.ts';
import { isObject } from './read.ts';
import { formatEngineering } from '../units/engineering.ts';
import { topologyOf } from '../topology/registry.ts';

/** A notice when spec.maxDuty cannot reach the output at any input of the specified range (see the header). */
export function dutyReachNotice(design: Design): DesignNotice | undefined {
  const { spec, topology } = design;
  const needed = topologyOf(design).idealDuty(spec.vinMaxV, spec.voutV);
  if (!(needed > 0 && needed < 1) || spec.maxDuty > needed) return undefined;
  const d = (x: number): string => formatEngineering(x, '', 6);
  return {
    path: 'spec.maxDuty',
    value: spec.maxDuty,
    message: `spec.maxDuty (${d(spec.maxDuty)}) cannot reach spec.voutV (${formatEngineering(spec.voutV, 'V', 6)}) anywhere in the input range: even without losses a ${topology.kind} needs a duty of ${d(needed)} at the highest input spec.vinMaxV (${formatEngineering(spec.vinMaxV, 'V', 6)}), so every result will be unregulated; for a regulated design spec.maxDuty must be above ${d(needed)}.`,
  };
}

/** Keys in `input` that the schema dropped from `parsed` (zod strips unknown keys). */
export function ignoredKeys(input: unknown, parsed: unknown, path: (string | number)[] = []): DesignNotice[] {
  const out: DesignNotice[] = [];
  if (Array.isArray(input) && Array.isArray(parsed)) {
    input.forEach((item, i) => out.push(...ignoredKeys(item, parsed[i], [...path, i])));
  } else if (isObject(input) && isObject(parsed)) {
    for (const [key, value] of Object.entries(input)) {
      const where = pathToString([...path, key]);
      if (!Object.hasOwn(parsed, key))
        out.push({ path: where, value: compactValue(value), message: `${where} is not a WattLedger key and was ignored (misspelt?).` });
      else out.push(...ignoredKeys(value, parsed[key], [...path, key]));
    }
  }
  return out;
}

/**
 * An RDS(on)(Tj) table that ends below the part's Tj max (a hotter junction gets the last ratio), and
 * a Coss(VDS) table that ends below the highest voltage its FET switches (Vin,max for a buck, Vout for a
 * boost, plus a diode's drop ignored): above the last point the capacitance is held at its last value
 * (curves/coss-table.ts), an extrapolation the engineer should know about.
 */
export function curveNotices(design: Design): DesignNotice[] {
  const blocks = topologyOf(design).switchBlocks;
  const swingV = blocks.input * design.spec.vinMaxV + blocks.output * design.spec.voutV;
  const out: DesignNotice[] = [];
  const ind = design.parts.inductor;
  if (ind.inductanceCurve && ind.rolloff) {
    out.push({ path: 'parts.inductor.rolloff', value: ind.rolloff.currentA,
      message: 'The inductor has both an L(I) curve and a roll-off point: the curve is used for the ripple and peak, the roll-off point is ignored.' });
  }
  for (const role of ['switch', 'rectifier'] as const) {
    const part = design.parts[role];
    if (part.kind !== 'mosfet') continue;
    const law = part.rdsTemperatureLaw;
    if (law.law === 'table' && law.points[law.points.length - 1]!.tjC < part.tjMaxC) {
      const lastC = law.points[law.points.length - 1]!.tjC;
      out.push({
        path: `parts.${role}.rdsTemperatureLaw.points`,
        value: lastC,
        message: `The RDS(on)(Tj) table of parts.${role} ends at ${formatEngineering(lastC, '°C', 4)}, below its Tj max of ${formatEngineering(part.tjMaxC, '°C', 4)}: a junction hotter than ${formatEngineering(lastC, '°C', 4)} is given the last ratio (an underestimate of RDS(on)); add points up to Tj max from the datasheet curve.`,
      });
    }
    if (part.outputCapacitance.kind !== 'table') continue;
    const points = part.outputCapacitance.points;
    const lastV = points[points.length - 1]!.vdsV;
    if (lastV >= swingV) continue;
    out.push({
      path: `parts.${role}.outputCapacitance.points`,
      value: lastV,
      message: `The Coss(VDS) table of parts.${role} ends at ${formatEngineering(lastV, 'V', 4)} but the switch node swings to ${formatEngineering(swingV, 'V', 4)}: above the last point Coss is held at its last value (an extrapolation); add points up to ${formatEngineering(swingV, 'V', 4)} from the datasheet curve.`,
    });
  }
  return out;
}

/** Advice on a valid design. */
export function designNotices(design: Design): DesignNotice[] {
  const out: DesignNotice[] = [];
  const { topology, parts, thermal } = design;
  if (topology.senseLocation === 'none' && parts.senseResistor)
    out.push({
      path: 'parts.senseResistor',
      value: parts.senseResistor.id,
      message: 'parts.senseResistor is present but topology.senseLocation is "none", so it is left out of the circuit.',
    });
  if (!parts.senseResistor && thermal.paths.senseResistor)
    out.push({ path: 'thermal.paths.senseResistor', value: 'present', message: 'thermal.paths.senseResistor is unused: there is no sense resistor.' });
  if (!parts.senseResistor && thermal.touch.senseResistor)
    out.push({ path: 'thermal.touch.senseResistor', value: 'present', message: 'thermal.touch.senseResistor is unused: there is no sense resistor.' });
  const used = new Set(Object.values(thermal.paths).flatMap((p) => (p && p.kind === 'heatsink' ? [p.heatsinkId] : [])));
  thermal.heatsinks.forEach((sink, i) => {
    if (!used.has(sink.id))
      out.push({ path: `thermal.heatsinks[${i}]`, value: sink.id, message: `Heatsink "${sink.id}" has no part mounted on it.` });
  });
  if (design.margins.requiredLifeHours !== undefined) {
    for (const slot of ['inputCapacitor', 'outputCapacitor'] as const) {
      const cap = parts[slot].part;
      if ((cap.dielectric === 'electrolytic' || cap.dielectric === 'polymer') && !cap.life)
        out.push({
          path: `parts.${slot}.part.life`,
          value: undefined,
          message: `parts.${slot}.part is ${cap.dielectric} but states no rated life, so margins.requiredLifeHours cannot be checked for it.`,
        });
    }
  }
  const reach = dutyReachNotice(design);
  if (reach) out.push(reach);
  out.push(...curveNotices(design));
  if (topology.rectifier === 'diode' && (topology.deadTimeBeforeOnS > 0 || topology.deadTimeAfterOffS > 0))
    out.push({ path: 'topology.deadTimeBeforeOnS', value: topology.deadTimeBeforeOnS, message: 'Dead times apply to synchronous rectifiers only; with a diode they are ignored.' });
  return out;
}
