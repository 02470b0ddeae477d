/**
 * Cross-field rules of the part records.
 *   MOSFET gate charge: the plateau lies above the threshold (Vth < Vplateau) and below the drive voltage,
 *   else the gate-charge method has no gate current to switch with (Ig = (Vdrv − Vpl)/R, docs/methods.md §4);
 *   Qgs + Qgd ≤ Qg and Qgs2 ≤ Qgs (Qgs2 is the part of Qgs after the threshold); one of Qgs2 or Qgs is
 *   needed to estimate the current-rise time [common practice: datasheet gate-charge curve].
 *   A two-point RDS(on) law needs its hot point above 25 °C.
 *   A datasheet curve rises in x point by point and its y keeps the direction physics gives it: Coss
 *   never rises with VDS, the RDS(on) ratio never falls with Tj (sources at COSS_CURVE and RDS_CURVE).
 *   ESR(f), ESR(T) and core-loss(T) tables: x rising, y above zero, no direction imposed on y.
 *   Inductance falls with current (roll-off ≤ L); the magnetic path length le = Ve/Ae of a real core
 *   lies between 1 mm and 1 m [common practice].
 *   A resistor's derating starts before its zero-power temperature.
 *   A linear regulator cannot raise a voltage: a drive rail made from Vin needs Vdrv < Vin,min.
 *   Every part's temperature limit lies above the ambient temperature.
 */
import type { Problem } from './problems.ts';
import { inUnit, problem } from './problems.ts';
import { at, num, str } from './read.ts';
import { tableShapeProblem } from '../curves/table.ts';

/** How a digitised curve must be shaped, and the words its sentences use. */
interface CurveRule {
  x: string;
  y: string;
  xName: string;
  yName: string;
  curve: string;
  monotonic: 'non-increasing' | 'non-decreasing' | 'any';
  why: string;
}

/** Coss falls as VDS rises: the depletion region only widens with voltage (Sze & Ng, 3rd ed., §2.3 [memory]). */
const COSS_CURVE: CurveRule = { x: 'vdsV', y: 'cossF', xName: 'VDS', yName: 'Coss', curve: 'Coss(VDS) table', monotonic: 'non-increasing', why: 'Coss must not rise with VDS (the datasheet curve falls as the voltage rises; check the columns are VDS then Coss)' };
/** RDS(on) of a silicon MOSFET rises with Tj: carrier mobility falls (Baliga, Fundamentals of Power Semiconductor Devices, §6 [memory]). */
const RDS_CURVE: CurveRule = { x: 'tjC', y: 'ratio', xName: 'Tj', yName: 'RDS(on) ratio', curve: 'RDS(on)(Tj) table', monotonic: 'non-decreasing', why: 'the RDS(on) ratio must not fall as Tj rises (a silicon MOSFET\'s channel resistance grows with temperature; check the columns are Tj then the ratio)' };

/** Inductance falls as the DC current rises: the core's permeability falls towards saturation (common practice). */
const L_CURVE: CurveRule = { x: 'currentA', y: 'inductanceH', xName: 'current', yName: 'inductance', curve: 'L(I) table', monotonic: 'non-increasing', why: 'the inductance must not rise with current (the core\'s permeability falls towards saturation; check the columns are current then inductance)' };

/** ESR against frequency falls, then rises again with skin and proximity effects: no direction is imposed (common practice). */
const ESR_F_CURVE: CurveRule = { x: 'frequencyHz', y: 'esrOhm', xName: 'frequency', yName: 'ESR', curve: 'ESR(f) table', monotonic: 'any', why: '' };
/** ESR(T)/ESR(25 °C): electrolytics fall as they warm, ceramics barely move (common practice): no direction imposed. */
const ESR_T_CURVE: CurveRule = { x: 'tC', y: 'ratio', xName: 'temperature', yName: 'ESR ratio', curve: 'ESR(T) table', monotonic: 'any', why: '' };
/** Ferrite core loss has a minimum near 80–100 °C (common practice): no direction imposed. */
const CORE_T_CURVE: CurveRule = { x: 'tC', y: 'factor', xName: 'temperature', yName: 'core-loss factor', curve: 'core loss (T) table', monotonic: 'any', why: '' };

/** The first point of the curve at `p` that breaks its rule, as a problem naming the point. */
function curveTable(doc: unknown, p: string, rule: CurveRule, out: Problem[]): void {
  const points = at(doc, p);
  if (!Array.isArray(points)) return;
  const xs = points.map((point) => num(point, rule.x) ?? Number.NaN);
  const ys = points.map((point) => num(point, rule.y) ?? Number.NaN);
  if (xs.some((x) => !Number.isFinite(x)) || ys.some((y) => !Number.isFinite(y))) return; // the schema reports these
  const bad = tableShapeProblem(xs, ys, rule.monotonic);
  if (!bad) return;
  const i = bad.index;
  const pt = (k: number) => `(${inUnit(xs[k]!, rule.x)}, ${inUnit(ys[k]!, rule.y)})`;
  const [key, value, allowed, reason] =
    bad.kind === 'not-positive'
      ? [rule.y, ys[i]!, `${rule.y} > 0`, `its ${rule.yName} must be above zero`]
      : bad.kind === 'x-not-rising'
        ? [rule.x, xs[i]!, `${rule.x} > ${inUnit(xs[i - 1]!, rule.x)}`, `each point must lie at a higher ${rule.xName} than the one before it (sort the rows by ${rule.xName})`]
        : [rule.y, ys[i]!, `${rule.y} ${rule.monotonic === 'non-increasing' ? '≤' : '≥'} ${inUnit(ys[i - 1]!, rule.y)}`, rule.why];
  out.push(problem(`${p}[${i}].${key}`, value, allowed, `Point ${i + 1} ${pt(i)}${i > 0 ? ` after ${pt(i - 1)}` : ''} of the ${rule.curve} ${p}: ${reason}.`));
}

function mosfet(doc: unknown, role: string, out: Problem[]): void {
  const p = `parts.${role}`;
  const vth = num(doc, `${p}.vthV`);
  const plateau = num(doc, `${p}.plateauV`);
  const drive = num(doc, 'parts.controller.driveV');
  if (vth !== undefined && plateau !== undefined && plateau <= vth)
    out.push(problem(`${p}.plateauV`, plateau, `plateauV > ${p}.vthV (${inUnit(vth, 'vthV')})`,
      `${p}.plateauV (${inUnit(plateau, 'plateauV')}) must be above the threshold ${p}.vthV (${inUnit(vth, 'vthV')}).`));
  if (plateau !== undefined && drive !== undefined && plateau >= drive)
    out.push(problem(`${p}.plateauV`, plateau, `plateauV < parts.controller.driveV (${inUnit(drive, 'driveV')})`,
      `${p}.plateauV (${inUnit(plateau, 'plateauV')}) must be below the drive voltage parts.controller.driveV (${inUnit(drive, 'driveV')}), or the gate never gets past the plateau.`));
  const qg = num(doc, `${p}.qgC`);
  const qgd = num(doc, `${p}.qgdC`);
  const qgs = num(doc, `${p}.qgsC`);
  const qgs2 = num(doc, `${p}.qgs2C`);
  if (at(doc, `${p}.kind`) === 'mosfet' && at(doc, `${p}.qgs2C`) === undefined && at(doc, `${p}.qgsC`) === undefined)
    out.push(problem(`${p}.qgs2C`, undefined, 'qgs2C or qgsC (one of them)',
      `${p}.qgs2C (gate charge from threshold to plateau) or ${p}.qgsC (whole gate-source charge) is needed; both are missing.`));
  const gs = qgs ?? qgs2;
  if (qg !== undefined && qgd !== undefined && gs !== undefined && gs + qgd > qg * (1 + 1e-9)) {
    const gsKey = qgs !== undefined ? 'qgsC' : 'qgs2C';
    out.push(problem(`${p}.qgC`, qg, `qgC ≥ ${gsKey} + qgdC (${inUnit(gs + qgd, 'qgC')})`,
      `${p}.qgC (${inUnit(qg, 'qgC')}) must be at least ${p}.${gsKey} + ${p}.qgdC = ${inUnit(gs + qgd, 'qgC')}; the total gate charge contains both.`));
  }
  if (qgs !== undefined && qgs2 !== undefined && qgs2 > qgs)
    out.push(problem(`${p}.qgs2C`, qgs2, `qgs2C ≤ ${p}.qgsC (${inUnit(qgs, 'qgsC')})`,
      `${p}.qgs2C (${inUnit(qgs2, 'qgs2C')}) is the part of qgsC after the threshold, so it cannot exceed qgsC (${inUnit(qgs, 'qgsC')}).`));
  if (str(doc, `${p}.outputCapacitance.kind`) === 'table') curveTable(doc, `${p}.outputCapacitance.points`, COSS_CURVE, out);
  if (str(doc, `${p}.rdsTemperatureLaw.law`) === 'table') curveTable(doc, `${p}.rdsTemperatureLaw.points`, RDS_CURVE, out);
  const hot = num(doc, `${p}.rdsTemperatureLaw.hotC`);
  if (str(doc, `${p}.rdsTemperatureLaw.law`) === 'two-point' && hot !== undefined && hot <= 25)
    out.push(problem(`${p}.rdsTemperatureLaw.hotC`, hot, 'hotC > 25 °C',
      `${p}.rdsTemperatureLaw.hotC (${inUnit(hot, 'hotC')}) must be above 25 °C: it is the hot datasheet point compared with RDS(on) at 25 °C.`));
}

/**
 * A diode's VF(IF, Tj) table: rows grouped by Tj (never falling), at least two temperatures, each curve at
 * least two points with IF strictly rising and VF never falling (a junction's forward current grows with
 * its voltage: Sze & Ng, Physics of Semiconductor Devices, 3rd ed., §2.3 [memory]).
 */
function forwardCurves(doc: unknown, p: string, out: Problem[]): void {
  const points = at(doc, p);
  if (!Array.isArray(points)) return;
  const t = points.map((point) => num(point, 'tjC') ?? Number.NaN);
  const x = points.map((point) => num(point, 'ifA') ?? Number.NaN);
  const y = points.map((point) => num(point, 'vfV') ?? Number.NaN);
  if ([...t, ...x, ...y].some((v) => !Number.isFinite(v))) return; // the schema reports these
  const pt = (k: number) => `(${inUnit(t[k]!, 'tjC')}, ${inUnit(x[k]!, 'ifA')}, ${inUnit(y[k]!, 'vfV')})`;
  const say = (i: number, key: string, value: number, allowed: string, reason: string): void => {
    out.push(problem(`${p}[${i}].${key}`, value, allowed, `Point ${i + 1} ${pt(i)}${i > 0 ? ` after ${pt(i - 1)}` : ''} of the VF(IF, Tj) table ${p}: ${reason}.`));
  };
  let start = 0;
  let curves = 0;
  for (let i = 1; i <= points.length; i++) {
    if (i < points.length && t[i] === t[start]) {
      if (!(x[i]! > x[i - 1]!)) return say(i, 'ifA', x[i]!, `ifA > ${inUnit(x[i - 1]!, 'ifA')}`, `within one temperature each point must lie at a higher IF than the one before it (sort each curve's rows by IF)`);
      if (y[i]! < y[i - 1]!) return say(i, 'vfV', y[i]!, `vfV ≥ ${inUnit(y[i - 1]!, 'vfV')}`, `VF must not fall as IF rises (the forward current of a junction grows with its voltage; check the columns are Tj, IF then VF)`);
      continue;
    }
    // A curve ends at i − 1.
    if (i - start < 2) return say(start, 'tjC', t[start]!, 'at least 2 points at each Tj', `the curve at ${inUnit(t[start]!, 'tjC')} has a single point; each temperature needs at least two (IF, VF) points`);
    curves++;
    if (i < points.length && t[i]! < t[start]!) return say(i, 'tjC', t[i]!, `tjC ≥ ${inUnit(t[start]!, 'tjC')}`, `the rows must be grouped by Tj from the coldest curve to the hottest`);
    start = i;
  }
  if (curves < 2) out.push(problem(p, `${points.length} points`, 'curves at 2 or more Tj', `The VF(IF, Tj) table ${p} has one temperature only (${inUnit(t[0]!, 'tjC')}); give the datasheet curves at two or more junction temperatures.`));
}

function inductor(doc: unknown, out: Problem[]): void {
  const p = 'parts.inductor';
  const l = num(doc, `${p}.inductanceH`);
  const lr = num(doc, `${p}.rolloff.inductanceH`);
  if (l !== undefined && lr !== undefined && lr > l)
    out.push(problem(`${p}.rolloff.inductanceH`, lr, `rolloff.inductanceH ≤ ${p}.inductanceH (${inUnit(l, 'inductanceH')})`,
      `${p}.rolloff.inductanceH (${inUnit(lr, 'inductanceH')}) must not exceed the zero-current inductance ${inUnit(l, 'inductanceH')}: inductance falls with current.`));
  if (Array.isArray(at(doc, `${p}.inductanceCurve.points`))) curveTable(doc, `${p}.inductanceCurve.points`, L_CURVE, out);
  curveTable(doc, `${p}.coreLossTemperatureCurve.points`, CORE_T_CURVE, out);
  const ae = num(doc, `${p}.aeM2`);
  const ve = num(doc, `${p}.veM3`);
  if (ae !== undefined && ve !== undefined && ae > 0) {
    const le = ve / ae;
    if (le < 1e-3 || le > 1)
      out.push(problem(`${p}.veM3`, ve, '1 mm ≤ veM3 / aeM2 ≤ 1 m',
        `${p}.veM3 / ${p}.aeM2 gives a magnetic path length of ${inUnit(le, 'lengthM')}, outside 1 mm … 1 m; check the units of Ae (m²) and Ve (m³).`));
  }
}

function resistorAndController(doc: unknown, out: Problem[]): void {
  const start = num(doc, 'parts.senseResistor.deratingStartC');
  const zero = num(doc, 'parts.senseResistor.zeroPowerC');
  if (start !== undefined && zero !== undefined && start >= zero)
    out.push(problem('parts.senseResistor.deratingStartC', start, `deratingStartC < zeroPowerC (${inUnit(zero, 'zeroPowerC')})`,
      `parts.senseResistor.deratingStartC (${inUnit(start, 'deratingStartC')}) must be below zeroPowerC (${inUnit(zero, 'zeroPowerC')}).`));
  const drive = num(doc, 'parts.controller.driveV');
  const vinMin = num(doc, 'spec.vinMinV');
  if (at(doc, 'parts.controller.driveFromVinLinear') === true && drive !== undefined && vinMin !== undefined && drive >= vinMin)
    out.push(problem('parts.controller.driveV', drive, `driveV < spec.vinMinV (${inUnit(vinMin, 'vinMinV')})`,
      `parts.controller.driveV (${inUnit(drive, 'driveV')}) cannot come from a linear regulator fed by Vin: it must be below spec.vinMinV (${inUnit(vinMin, 'vinMinV')}), or set driveFromVinLinear to false.`));
}

const LIMIT_KEYS: readonly (readonly [string, string])[] = [
  ['switch', 'tjMaxC'],
  ['rectifier', 'tjMaxC'],
  ['inductor', 'tMaxC'],
  ['inputCapacitor.part', 'tMaxC'],
  ['outputCapacitor.part', 'tMaxC'],
  ['senseResistor', 'zeroPowerC'],
  ['controller', 'tjMaxC'],
];

function limitsAboveAmbient(doc: unknown, out: Problem[]): void {
  const ambient = num(doc, 'spec.ambientC');
  if (ambient === undefined) return;
  for (const [role, key] of LIMIT_KEYS) {
    const path = `parts.${role}.${key}`;
    const limit = num(doc, path);
    if (limit !== undefined && limit <= ambient)
      out.push(problem(path, limit, `${key} > spec.ambientC (${inUnit(ambient, 'ambientC')})`,
        `${path} (${inUnit(limit, key)}) must be above the ambient temperature spec.ambientC (${inUnit(ambient, 'ambientC')}).`));
  }
}

/** Problems between fields of the part records. */
export function partRules(doc: unknown): Problem[] {
  const out: Problem[] = [];
  mosfet(doc, 'switch', out);
  if (str(doc, 'parts.rectifier.kind') === 'mosfet') mosfet(doc, 'rectifier', out);
  if (str(doc, 'parts.rectifier.kind') === 'diode') forwardCurves(doc, 'parts.rectifier.vfCurves.points', out);
  inductor(doc, out);
  for (const bank of ['inputCapacitor', 'outputCapacitor']) {
    curveTable(doc, `parts.${bank}.part.esrFrequencyCurve.points`, ESR_F_CURVE, out);
    curveTable(doc, `parts.${bank}.part.esrTemperatureCurve.points`, ESR_T_CURVE, out);
  }
  resistorAndController(doc, out);
  limitsAboveAmbient(doc, out);
  return out;
}
