/**
 * What each datasheet curve of a design gave at an evaluated point, for the report and any reviewer: the
 * curve, where it was read (the quantity, its value and unit), what it gave, and whether that lay inside
 * the table's points or was held from its nearest end (extrapolation). Read from the evaluation's own
 * temperatures, currents and voltages with the same curve functions the models use; no new physics.
 */
import type { Design, Role } from '../design/schema.ts';
import type { Evaluation } from '../ledger/types.ts';
import { cossTableAt } from './coss-table.ts';
import { esrAtFrequency } from './esr-spectrum.ts';
import { forwardTableSpanC, forwardTableTopA, forwardVoltageAt } from './forward-table.ts';
import { inductanceOnCurve, inductanceTableTopA } from './inductance-table.ts';
import { pointCurveAt } from './temperature-curves.ts';

export interface CurveReading {
  part: Role;
  /** The curve in words ("ESR(f) table"). */
  curve: string;
  /** The design path of the table. */
  path: string;
  /** Where it was read: the quantity, its value and unit. */
  at: { quantity: string; value: number; unit: string };
  /** What it gave. */
  value: number;
  unit: string;
  /** What the value is ("ESR at fs"). */
  gives: string;
  /** The point lay outside the table's points (the end value held or the last segment followed). */
  outside: boolean;
}

const within = (lo: number, hi: number, x: number): boolean => x >= lo && x <= hi;

/** Every curve table of the design read at the evaluation `e` of it. */
export function curveReadings(design: Design, e: Evaluation): CurveReading[] {
  const out: CurveReading[] = [];
  const temp = (role: Role) => e.temperatures.find((t) => t.part === role)?.celsius ?? e.conditions.ambientC;
  const op = e.operatingPoint;
  const fs = 1 / op.periodS;
  for (const role of ['switch', 'rectifier'] as const) {
    const fet = design.parts[role];
    if (fet.kind !== 'mosfet') continue;
    const law = fet.rdsTemperatureLaw;
    if (law.law === 'table') {
      const tj = temp(role);
      const p = law.points;
      out.push({ part: role, curve: 'RDS(on)(Tj) table', path: `parts.${role}.rdsTemperatureLaw.points`, at: { quantity: 'Tj', value: tj, unit: '°C' },
        value: pointCurveAt(p, (x) => x.tjC, (x) => x.ratio, tj), unit: '', gives: 'RDS(on)(Tj) / RDS(on)(25 °C)', outside: !within(p[0]!.tjC, p[p.length - 1]!.tjC, tj) });
    }
    const oc = fet.outputCapacitance;
    if (role === 'switch' && oc.kind === 'table') {
      const v = op.stress.switchV;
      const p = oc.points;
      const { qossC, eossJ } = cossTableAt(p, v);
      const outside = !within(p[0]!.vdsV, p[p.length - 1]!.vdsV, v);
      const path = `parts.${role}.outputCapacitance.points`;
      out.push({ part: role, curve: 'Coss(VDS) table', path, at: { quantity: 'VDS', value: v, unit: 'V' }, value: qossC, unit: 'C', gives: 'Qoss (∫C dv from 0 V)', outside });
      out.push({ part: role, curve: 'Coss(VDS) table', path, at: { quantity: 'VDS', value: v, unit: 'V' }, value: eossJ, unit: 'J', gives: 'Eoss (∫v·C dv from 0 V)', outside });
    }
  }
  const rect = design.parts.rectifier;
  if (rect.kind === 'diode' && rect.vfCurves) {
    const p = rect.vfCurves.points;
    const i = op.stats.rectifier.peakA;
    const tj = temp('rectifier');
    const span = forwardTableSpanC(p);
    out.push({ part: 'rectifier', curve: 'VF(IF, Tj) table', path: 'parts.rectifier.vfCurves.points', at: { quantity: `IF (peak) at Tj ${tj.toFixed(1)} °C`, value: i, unit: 'A' },
      value: forwardVoltageAt(p, i, tj), unit: 'V', gives: 'VF', outside: i > forwardTableTopA(p) || !within(span.lowC, span.highC, tj) });
  }
  const ind = design.parts.inductor;
  if (ind.inductanceCurve) {
    const p = ind.inductanceCurve.points;
    const i = Math.max(Math.abs(op.inductor.peakA), Math.abs(op.inductor.minA));
    out.push({ part: 'inductor', curve: 'L(I) table', path: 'parts.inductor.inductanceCurve.points', at: { quantity: 'I (peak)', value: i, unit: 'A' },
      value: inductanceOnCurve(p, i), unit: 'H', gives: 'L at the peak', outside: i > inductanceTableTopA(p) });
  }
  if (ind.coreLossTemperatureCurve) {
    const p = ind.coreLossTemperatureCurve.points;
    const t = temp('inductor');
    out.push({ part: 'inductor', curve: 'core loss (T) table', path: 'parts.inductor.coreLossTemperatureCurve.points', at: { quantity: 'T', value: t, unit: '°C' },
      value: pointCurveAt(p, (x) => x.tC, (x) => x.factor, t), unit: '', gives: 'core-loss factor', outside: !within(p[0]!.tC, p[p.length - 1]!.tC, t) });
  }
  for (const bank of ['inputCapacitor', 'outputCapacitor'] as const) {
    const cap = design.parts[bank].part;
    const f = cap.esrFrequencyCurve;
    if (f) {
      const p = f.points;
      const path = `parts.${bank}.part.esrFrequencyCurve.points`;
      const outside = !within(p[0]!.frequencyHz, p[p.length - 1]!.frequencyHz, fs);
      out.push({ part: bank, curve: 'ESR(f) table', path, at: { quantity: 'f (switching)', value: fs, unit: 'Hz' }, value: esrAtFrequency(p, fs), unit: 'Ω', gives: 'ESR at fs, 25 °C', outside });
      const term = e.losses.find((l) => l.part === bank && l.mechanism === 'ESR');
      const weighted = term?.inputs.find((x) => x.name === 'ESR(25 °C)')?.value;
      if (weighted !== undefined)
        out.push({ part: bank, curve: 'ESR(f) table', path, at: { quantity: 'harmonics of the bank current, from', value: fs, unit: 'Hz' }, value: weighted, unit: 'Ω', gives: 'ESR weighted by the current spectrum, 25 °C', outside });
    }
    const tc = cap.esrTemperatureCurve;
    if (tc) {
      const p = tc.points;
      const t = temp(bank);
      out.push({ part: bank, curve: 'ESR(T) table', path: `parts.${bank}.part.esrTemperatureCurve.points`, at: { quantity: 'T', value: t, unit: '°C' },
        value: pointCurveAt(p, (x) => x.tC, (x) => x.ratio, t), unit: '', gives: 'ESR(T) / ESR(25 °C)', outside: !within(p[0]!.tC, p[p.length - 1]!.tC, t) });
    }
  }
  return out;
}
