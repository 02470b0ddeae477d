/**
 * Cross-field rules of the specification and topology: the relations a single field's range cannot say.
 *   Vin,min ≤ Vin,nom ≤ Vin,max.
 *   A buck steps down: its ideal conversion ratio M = Vout/Vin = D < 1, so Vout < Vin,min; a boost steps
 *   up: M = 1/(1 − D) > 1, so Vout > Vin,max (Erickson & Maksimović, Fundamentals of Power Electronics,
 *   2nd ed., ch. 2 [memory for chapter]).
 *   Both dead times sit in the control switch's off time, so tdead,before + tdead,after < (1 − D)/fs with D
 *   the ideal duty at the lowest input voltage (buck Vo/Vin,min; boost 1 − Vin,min/Vo), capped at Dmax.
 *   The rectifier part must be what topology.rectifier says; a sense location needs a sense resistor and
 *   a thermal path for it. An output-ripple target must be smaller than the output voltage. Pulse
 *   skipping needs its parameters (topology.pulseSkipping).
 */
import type { Problem } from './problems.ts';
import { topologyOfKind } from '../topology/registry.ts';
import { inUnit, problem } from './problems.ts';
import { at, num, str } from './read.ts';

function inputVoltageOrder(doc: unknown, out: Problem[]): void {
  const min = num(doc, 'spec.vinMinV');
  const nom = num(doc, 'spec.vinNomV');
  const max = num(doc, 'spec.vinMaxV');
  if (min !== undefined && max !== undefined && min > max) {
    const allowed = `spec.vinMaxV ≥ spec.vinMinV (${inUnit(min, 'spec.vinMinV')})`;
    out.push(problem('spec.vinMaxV', max, allowed,
      `spec.vinMaxV (${inUnit(max, 'spec.vinMaxV')}) is below spec.vinMinV (${inUnit(min, 'spec.vinMinV')}); the highest input voltage must be at least the lowest.`));
    return;
  }
  if (nom === undefined) return;
  if ((min !== undefined && nom < min) || (max !== undefined && nom > max)) {
    const lo = min === undefined ? '' : `${inUnit(min, 'spec.vinMinV')} ≤ `;
    const hi = max === undefined ? '' : ` ≤ ${inUnit(max, 'spec.vinMaxV')}`;
    out.push(problem('spec.vinNomV', nom, `${lo}vinNomV${hi}`,
      `spec.vinNomV (${inUnit(nom, 'spec.vinNomV')}) must lie between spec.vinMinV and spec.vinMaxV (${lo}vinNomV${hi}).`));
  }
}

function conversionDirection(doc: unknown, out: Problem[]): void {
  const topology = topologyOfKind(str(doc, 'topology.kind'));
  const vout = num(doc, 'spec.voutV');
  if (vout === undefined) return;
  const min = num(doc, 'spec.vinMinV');
  const max = num(doc, 'spec.vinMaxV');
  if (topology?.steps === 'down' && min !== undefined && vout >= min) {
    const allowed = `voutV < spec.vinMinV (${inUnit(min, 'spec.vinMinV')})`;
    out.push(problem('spec.voutV', vout, allowed,
      `A ${topology.kind} only steps down: spec.voutV (${inUnit(vout, 'spec.voutV')}) must be below the lowest input voltage spec.vinMinV (${inUnit(min, 'spec.vinMinV')}).`));
  }
  if (topology?.steps === 'up' && max !== undefined && vout <= max) {
    const allowed = `voutV > spec.vinMaxV (${inUnit(max, 'spec.vinMaxV')})`;
    out.push(problem('spec.voutV', vout, allowed,
      `A ${topology.kind} only steps up: spec.voutV (${inUnit(vout, 'spec.voutV')}) must be above the highest input voltage spec.vinMaxV (${inUnit(max, 'spec.vinMaxV')}).`));
  }
  const ripple = num(doc, 'spec.targets.outputRippleV');
  if (ripple !== undefined && ripple >= vout)
    out.push(problem('spec.targets.outputRippleV', ripple, `outputRippleV < spec.voutV (${inUnit(vout, 'spec.voutV')})`,
      `spec.targets.outputRippleV (${inUnit(ripple, 'spec.voutV')}) must be smaller than the output voltage spec.voutV (${inUnit(vout, 'spec.voutV')}).`));
}

function deadTimes(doc: unknown, out: Problem[]): void {
  if (str(doc, 'topology.rectifier') !== 'synchronous') return;
  const before = num(doc, 'topology.deadTimeBeforeOnS');
  const after = num(doc, 'topology.deadTimeAfterOffS');
  const fs = num(doc, 'spec.switchingFrequencyHz');
  const dmax = num(doc, 'spec.maxDuty');
  const vout = num(doc, 'spec.voutV');
  const vinMin = num(doc, 'spec.vinMinV');
  const topology = topologyOfKind(str(doc, 'topology.kind'));
  if (before === undefined || after === undefined || fs === undefined || fs <= 0 || dmax === undefined) return;
  // Ideal duty at the lowest input (the longest on time the design needs; the topology record).
  let duty = dmax;
  if (vout !== undefined && vinMin !== undefined && vinMin > 0 && vout > 0) {
    const ideal = topology ? topology.idealDuty(vinMin, vout) : dmax;
    if (ideal > 0 && ideal < 1) duty = Math.min(ideal, dmax);
  }
  const offTime = (1 - duty) / fs;
  if (before + after < offTime) return;
  const path = before >= after ? 'topology.deadTimeBeforeOnS' : 'topology.deadTimeAfterOffS';
  const limit = inUnit(offTime, 'topology.deadTimeBeforeOnS');
  out.push(problem(path, before >= after ? before : after, `deadTimeBeforeOnS + deadTimeAfterOffS < ${limit}`,
    `topology.deadTimeBeforeOnS + topology.deadTimeAfterOffS (${inUnit(before, path)} + ${inUnit(after, path)}) must fit in the shortest off time of the control switch, ${limit} (at the duty cycle needed at the lowest input voltage).`));
}

function rectifierKind(doc: unknown, out: Problem[]): void {
  const wanted = str(doc, 'topology.rectifier');
  const kind = str(doc, 'parts.rectifier.kind');
  if (wanted === undefined || kind === undefined) return;
  const expected = wanted === 'diode' ? 'diode' : 'mosfet';
  if (kind !== expected)
    out.push(problem('parts.rectifier.kind', kind, JSON.stringify(expected),
      `parts.rectifier.kind is "${kind}", but topology.rectifier is "${wanted}", which needs a ${expected}; change one of them.`));
}

function senseResistor(doc: unknown, out: Problem[]): void {
  const where = str(doc, 'topology.senseLocation');
  if (where === undefined || where === 'none') return;
  if (at(doc, 'parts.senseResistor') === undefined)
    out.push(problem('parts.senseResistor', undefined, 'a resistor record',
      `topology.senseLocation is "${where}", so parts.senseResistor is needed; add the resistor or set the location to "none".`));
  if (at(doc, 'thermal') !== undefined && at(doc, 'thermal.paths.senseResistor') === undefined)
    out.push(problem('thermal.paths.senseResistor', undefined, 'a thermal path (direct, rise or heatsink)',
      `topology.senseLocation is "${where}", so thermal.paths.senseResistor is needed to find the resistor's temperature.`));
}

function pulseSkipping(doc: unknown, out: Problem[]): void {
  if (str(doc, 'topology.lightLoad') !== 'pulse-skipping' || at(doc, 'topology.pulseSkipping') !== undefined) return;
  out.push(problem('topology.pulseSkipping', undefined, 'a record { minPeakCurrentA, sleepCurrentA }',
    'topology.lightLoad is "pulse-skipping", so topology.pulseSkipping is needed: the minimum peak current of a pulse and the controller\'s sleep current.'));
}

/** The dead-time rule alone (the condition overrides re-check it at an overridden frequency or input). */
export function deadTimeRule(doc: unknown): Problem[] {
  const out: Problem[] = [];
  deadTimes(doc, out);
  return out;
}

/** Problems between fields of spec and topology (and the parts they require). */
export function specificationRules(doc: unknown): Problem[] {
  const out: Problem[] = [];
  inputVoltageOrder(doc, out);
  conversionDirection(doc, out);
  deadTimes(doc, out);
  rectifierKind(doc, out);
  senseResistor(doc, out);
  pulseSkipping(doc, out);
  return out;
}
