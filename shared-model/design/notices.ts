/**
 * Notices on a valid design: things that do not stop a calculation but that the engineer should know —
 * keys WattLedger ignored (often a misspelling), parts or paths that are present but unused, heatsinks
 * nobody is mounted on, a life requirement no capacitor can be checked against.
 */
import type { Design } from './schema.ts';
import type { DesignNotice } from './problems.ts';
import { compactValue, pathToString } from './problems.ts';
import { isObject } from './read.ts';

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
  if (topology.rectifier === 'diode' && (topology.deadTimeBeforeOnS > 0 || topology.deadTimeAfterOffS > 0))
    out.push({ path: 'topology.deadTimeBeforeOnS', value: topology.deadTimeBeforeOnS, message: 'Dead times apply to synchronous rectifiers only; with a diode they are ignored.' });
  return out;
}
