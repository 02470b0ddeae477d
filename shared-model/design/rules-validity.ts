/**
 * Cross-field rules that refuse designs whose ripple, edges or drops leave the models' validity by orders
 * of magnitude. They refuse only what makes the models meaningless; a design that is merely poor (a
 * large ripple, a hot part, a duty limit at low line) stays valid and gets warnings in its results.
 * Each rule uses the ideal (lossless) relations, so it errs towards accepting:
 *   buck D = Vout/Vin, inductor current = load; boost D = 1 − Vin/Vout, inductor current = load·Vout/Vin;
 *   CCM ripple ΔI = V_L·D·T/L with V_L = Vin − Vout (buck) or Vin (boost) (docs/methods.md §1).
 *
 * 1. Ripple. At the nominal input, ΔI must not exceed 100 × the rated inductor current [our own rule:
 *    CCM designs run at 0.2–0.4 of it, DCM designs at rated load up to about 10 (common practice); at
 *    100 the DCM on time is a few % of the period and the edges are no longer short beside it]. Refuses
 *    an inductance absurdly small for the switching frequency (a missing prefix: 4.7 nH for 4.7 µH).
 * 2. Edges. The period must be longer than the control switch's turn-on and turn-off transitions
 *    (gate-charge method, docs/methods.md §4: t = (Qgs2 + Qgd)/Ig at each edge) plus, with a synchronous
 *    rectifier, both dead times [our own rule: every loss model treats an edge as a short part of the
 *    period; a period shorter than its edges has no conduction interval at all].
 * 3. Output bank. At rated load and the nominal input, the ideal capacitive ripple of the output bank
 *    must stay below the output voltage [our own rule: every current waveform assumes an output nearly
 *    constant over a period; a ripple as large as the output itself means the output would reverse].
 *    Charge drawn per period: buck CCM ΔI·T/8; buck DCM (ΔI > 2·I) (Ipk − I)²·I·T/Ipk² with
 *    Ipk = √(2·I·ΔI) (docs/methods.md §2, worked here); boost I·D·T, so the rule reads R·C ≤ D·T: the
 *    bank's time constant with the load resistance far below one period.
 * 4. Sense resistor. At rated load and the lowest input, its drop (resistance × the current through its
 *    position while it conducts) must not exceed half the lower of Vin,min and Vout [our own rule; sense
 *    resistors are sized to drop 50–200 mV, common practice]. Refuses a value typed in the wrong unit.
 * Thresholds are named constants below; each problem names the field, its value and the valid range.
 */
import { qgs2Of, turnOffGateCurrentA, turnOnGateCurrentA } from '../losses/gate-charge.ts';
import { controllerSchema, mosfetSchema } from './parts.ts';
import type { Problem } from './problems.ts';
import { topologyOfKind } from '../topology/registry.ts';
import type { ConverterTopology } from '../topology/types.ts';
import { inUnit, problem } from './problems.ts';
import { at, num, str } from './read.ts';

/** Largest ideal inductor ripple, as a multiple of the rated inductor current (rule 1). */
export const MAX_RIPPLE_OVER_CURRENT = 100;
/** Largest sense-resistor drop, as a fraction of the lower of Vin,min and Vout (rule 4). */
export const MAX_SENSE_DROP_FRACTION = 0.5;

interface IdealPoint {
  topology: ConverterTopology;
  vinV: number;
  voutV: number;
  loadA: number;
  duty: number;
  periodS: number;
  /** Mean inductor current. */
  inductorA: number;
  /** Volts across the inductor while the switch is on. */
  onVoltsV: number;
}

/** The ideal CCM point at the input voltage found at `vinPath` and rated load; undefined when unreadable. */
function idealPoint(doc: unknown, vinPath: string): IdealPoint | undefined {
  const topology = topologyOfKind(str(doc, 'topology.kind'));
  const vinV = num(doc, vinPath);
  const voutV = num(doc, 'spec.voutV');
  const loadA = num(doc, 'spec.ratedLoadA');
  const fs = num(doc, 'spec.switchingFrequencyHz');
  if (topology === undefined || vinV === undefined || voutV === undefined || loadA === undefined || fs === undefined) return undefined;
  if (!(vinV > 0 && voutV > 0 && loadA > 0 && fs > 0)) return undefined;
  const periodS = 1 / fs;
  const duty = topology.idealDuty(vinV, voutV);
  if (!(duty > 0 && duty < 1)) return undefined;
  // Charge balance (topology/types.ts): the output receives IL over the delivering intervals.
  const inductorA = topology.intervals.on.toOutput ? loadA : loadA / (1 - duty);
  return { topology, vinV, voutV, loadA, periodS, duty, inductorA, onVoltsV: topology.idealOnVoltsV(vinV, voutV) };
}

/** Ideal CCM peak-to-peak inductor ripple, A. */
const rippleOf = (p: IdealPoint, inductanceH: number): number => (p.onVoltsV * p.duty * p.periodS) / inductanceH;

function inductorRipple(doc: unknown, out: Problem[]): void {
  const p = idealPoint(doc, 'spec.vinNomV');
  const l = num(doc, 'parts.inductor.inductanceH');
  if (p === undefined || l === undefined || !(l > 0)) return;
  const ripple = rippleOf(p, l);
  const limit = MAX_RIPPLE_OVER_CURRENT * p.inductorA;
  if (ripple <= limit) return;
  const minL = (p.onVoltsV * p.duty * p.periodS) / limit;
  const path = 'parts.inductor.inductanceH';
  out.push(problem(path, l, `inductanceH ≥ ${inUnit(minL, path)} at ${inUnit(1 / p.periodS, 'spec.switchingFrequencyHz')}`,
    `${path} (${inUnit(l, path)}) is far too small for spec.switchingFrequencyHz (${inUnit(1 / p.periodS, 'spec.switchingFrequencyHz')}): at the nominal input spec.vinNomV (${inUnit(p.vinV, 'vinNomV')}) the inductor ripple would be ${inUnit(ripple, 'currentA')} peak to peak, more than ${MAX_RIPPLE_OVER_CURRENT} times the rated inductor current (${inUnit(p.inductorA, 'currentA')}), where the waveform models mean nothing; allowed: inductanceH ≥ ${inUnit(minL, path)} at this frequency.`));
}

/** The control switch's turn-on and turn-off transition times, s; undefined when the records are unreadable. */
function transitionTimes(doc: unknown): { onS: number; offS: number } | undefined {
  const fet = mosfetSchema.safeParse(at(doc, 'parts.switch'));
  const ctl = controllerSchema.safeParse(at(doc, 'parts.controller'));
  if (!fet.success || !ctl.success) return undefined;
  const f = fet.data;
  const c = ctl.data;
  const igOn = turnOnGateCurrentA(c.driveV, f.plateauV, c.pullUpOhm, f.rgInternalOhm);
  const igOff = turnOffGateCurrentA(f.plateauV, c.pullDownOhm, f.rgInternalOhm);
  if (!(igOn > 0 && igOff > 0)) return undefined; // a drive that cannot pass the plateau has its own problem
  const charge = qgs2Of(f, c.driveV).qgs2C + f.qgdC;
  return { onS: charge / igOn, offS: charge / igOff };
}

function edgesFitPeriod(doc: unknown, out: Problem[]): void {
  const fs = num(doc, 'spec.switchingFrequencyHz');
  const edges = transitionTimes(doc);
  if (fs === undefined || !(fs > 0) || edges === undefined) return;
  const sync = str(doc, 'topology.rectifier') === 'synchronous';
  const dead = sync ? (num(doc, 'topology.deadTimeBeforeOnS') ?? 0) + (num(doc, 'topology.deadTimeAfterOffS') ?? 0) : 0;
  const total = edges.onS + edges.offS + dead;
  if (total < 1 / fs) return;
  const path = 'spec.switchingFrequencyHz';
  const s = (t: number): string => inUnit(t, 'deadTimeBeforeOnS');
  const deadText = sync ? ` plus the dead times topology.deadTimeBeforeOnS + topology.deadTimeAfterOffS (${s(dead)})` : '';
  out.push(problem(path, fs, `switchingFrequencyHz < ${inUnit(1 / total, path)}`,
    `${path} (${inUnit(fs, path)}) gives a period of ${s(1 / fs)}, no longer than the control switch's turn-on and turn-off transitions (${s(edges.onS)} + ${s(edges.offS)}, from its gate charge and the drive, docs/methods.md §4)${deadText}; allowed: switchingFrequencyHz < ${inUnit(1 / total, path)}.`));
}

/** Charge the output bank gives and takes back each period at the ideal point, C (see the header). */
function bankCharge(p: IdealPoint, inductanceH: number): number {
  // The on interval feeds no output (boost): the bank alone carries the load for D·T.
  if (!p.topology.intervals.on.toOutput) return p.loadA * p.duty * p.periodS;
  const ripple = rippleOf(p, inductanceH);
  if (ripple <= 2 * p.loadA) return (ripple * p.periodS) / 8;
  const peak = Math.sqrt(2 * p.loadA * ripple);
  return ((peak - p.loadA) ** 2 * p.loadA * p.periodS) / peak ** 2;
}

function outputBank(doc: unknown, out: Problem[]): void {
  const p = idealPoint(doc, 'spec.vinNomV');
  const l = num(doc, 'parts.inductor.inductanceH');
  const c = num(doc, 'parts.outputCapacitor.part.capacitanceF');
  const n = num(doc, 'parts.outputCapacitor.count');
  if (p === undefined || l === undefined || c === undefined || n === undefined || !(l > 0 && c > 0 && n >= 1)) return;
  const charge = bankCharge(p, l);
  const swing = charge / (n * c);
  if (swing < p.voutV) return;
  const path = 'parts.outputCapacitor.part.capacitanceF';
  const minC = charge / (p.voutV * n);
  const rc = !p.topology.intervals.on.toOutput
    ? ` (the load resistance times the bank, ${inUnit(((p.voutV / p.loadA) * n * c), 'deadTimeBeforeOnS')}, is not longer than the on time ${inUnit(p.duty * p.periodS, 'deadTimeBeforeOnS')})`
    : '';
  out.push(problem(path, c, `capacitanceF ≥ ${inUnit(minC, path)} with parts.outputCapacitor.count ${n}`,
    `The output bank parts.outputCapacitor (${n} × ${inUnit(c, path)}) is far too small for the load: at rated load (${inUnit(p.loadA, 'ratedLoadA')}) and the nominal input its capacitive ripple would be ${inUnit(swing, 'voutV')} peak to peak, not below the output voltage spec.voutV (${inUnit(p.voutV, 'voutV')}) itself${rc}; the models assume an output nearly constant over a period; allowed: ${path} ≥ ${inUnit(minC, path)} with this count.`));
}

function senseDrop(doc: unknown, out: Problem[]): void {
  const where = str(doc, 'topology.senseLocation');
  const r = num(doc, 'parts.senseResistor.resistanceOhm');
  const p = idealPoint(doc, 'spec.vinMinV');
  if (where === undefined || where === 'none' || r === undefined || p === undefined) return;
  const current = where === 'output' ? p.loadA : where === 'input' ? (p.loadA * p.voutV) / p.vinV : p.inductorA;
  const across = Math.min(p.vinV, p.voutV);
  const drop = r * current;
  if (drop <= MAX_SENSE_DROP_FRACTION * across) return;
  const path = 'parts.senseResistor.resistanceOhm';
  const maxR = (MAX_SENSE_DROP_FRACTION * across) / current;
  const which = p.vinV <= p.voutV ? `the lowest input spec.vinMinV (${inUnit(p.vinV, 'vinMinV')})` : `the output spec.voutV (${inUnit(p.voutV, 'voutV')})`;
  out.push(problem(path, r, `resistanceOhm ≤ ${inUnit(maxR, path)}`,
    `${path} (${inUnit(r, path)}) would drop ${inUnit(drop, 'voutV')} at rated load (${inUnit(current, 'currentA')} through the "${where}" position at the lowest input), more than half of ${which}; current-sense resistors drop tens to a few hundred millivolts; allowed: resistanceOhm ≤ ${inUnit(maxR, path)}.`));
}

/** Problems of designs whose ripple, edges or drops leave the models' validity (see the header). */
export function validityRules(doc: unknown): Problem[] {
  const out: Problem[] = [];
  inductorRipple(doc, out);
  edgesFitPeriod(doc, out);
  outputBank(doc, out);
  senseDrop(doc, out);
  return out;
}
