/**
 * Seeded designs for checking the load models (test-only): buck and boost, diode and synchronous, in
 * CCM at a heavy load, each with a load kind and an output bank whose ESR is comparable to the load.
 *
 * Drawn: Vin 5–48 V (buck) or 3–24 V (boost), ratio 0.15–0.75 or 1.3–3.5, Io 0.5–10 A, 100 kHz–1 MHz,
 * inductor ripple up to 40 % of its mean current (a buck: small enough for its drawn ESR, below), every other resistive drop 0.1–0.5 % of the smaller
 * terminal voltage, any sense-resistor location, R·C ≥ 60 periods. The bank's ESR is drawn log-uniformly
 * from 1 % of the load resistance R = Vo/Io up to R (drawn first; a buck's ripple is then drawn in
 * [1/8, 1] × min(40 %, RIPPLE_MAX·R/ESR) of IL) (constant power: up to R/3, where its negative
 * incremental resistance already pushes 1.5 × the node's ripple into the bank), then lowered where it
 * would break an assumption that is not the load model's, so that what is checked is the load model:
 * - output ripple: ESR times the node current's swing (buck: the inductor ripple; boost: the rectifier's
 *   step to the peak) at most RIPPLE_MAX of Vo — beyond it the output is not a regulated DC output;
 * - curvature: the loop resistances including the node's share k·ESR give λ = ΣR·T/L·ΔI/IL ≤ LAMBDA_LOAD
 *   (random-designs.ts header: the straight-line error is about 0.055·λ).
 * Sizing uses the ideal formulas of docs/methods.md §1 only.
 */
import type { Design, Topology } from '../../shared-model/index.ts';
import { makeDesign, type DesignSketch } from '../helpers/designs.ts';
import { logUniform, mulberry32, pick, uniform } from './prng.ts';
import { drawRatings } from './random-designs.ts';

export type LoadKindName = 'constant-current' | 'resistive' | 'constant-power';
export const LOAD_KINDS: readonly LoadKindName[] = ['constant-current', 'resistive', 'constant-power'];

/** Largest ESR-driven output ripple drawn, as a fraction of Vo. */
export const RIPPLE_MAX = 0.05;
/** Largest curvature λ drawn, ESR share included. */
export const LAMBDA_LOAD = 0.03;

export interface LoadCase {
  label: string;
  loadKind: LoadKindName;
  /** The bank's ESR over the load resistance Vo/Io. */
  esrToLoad: number;
  design: Design;
  loadA: number;
}

const SENSE: Topology['senseLocation'][] = ['none', 'input', 'switch', 'inductor', 'output'];

export function loadCases(seed: number, perFamily: number): LoadCase[] {
  const rand = mulberry32(seed);
  const out: LoadCase[] = [];
  for (let rep = 0; rep < perFamily; rep++) {
    for (const kind of ['buck', 'boost'] as const) {
      for (const rectifier of ['diode', 'synchronous'] as const) {
        for (const loadKind of LOAD_KINDS) {
          const buck = kind === 'buck';
          const { vinV, voutV, loadA, fsHz, d, inductorA: il } = drawRatings(rand, buck);
          // Buck: the ESR target first, then an inductor ripple small enough for it (the ripple limit below).
          const target = logUniform(rand, 0.01, loadKind === 'constant-power' ? 1 / 3 : 1);
          const rippleTop = buck ? Math.min(0.4, RIPPLE_MAX / target) : 0.4;
          const ripple = logUniform(rand, rippleTop / 8, rippleTop) * il;
          const inductanceH = ((buck ? vinV - voutV : vinV) * d) / (ripple * fsHz);
          const r = voutV / loadA;
          const swing = buck ? ripple : il + ripple / 2;
          const perOhm = (ripple / il) / (inductanceH * fsHz); // λ per ohm of loop resistance
          const rOf = () => (Math.min(vinV, voutV) / il) * uniform(rand, 0.001, 0.005);
          const drops = { dcr: rOf(), sw: rOf(), rect: rOf(), rd: rOf(), sense: rOf() / 2 };
          const others = drops.dcr + drops.sw + Math.max(drops.rect, drops.rd) + drops.sense;
          const wanted = r * target;
          // The node sees k·ESR ≤ 1.5·ESR (constant power up to R/3); leave λ room for the other drops.
          const byCurvature = Math.max((LAMBDA_LOAD / perOhm - others) / 1.5, 0);
          const esr = Math.min(wanted, (RIPPLE_MAX * voutV) / swing, byCurvature);
          const shrink = others * perOhm > LAMBDA_LOAD / 2 ? LAMBDA_LOAD / 2 / (others * perOhm) : 1;
          const capacitanceF = Math.max(buck ? ripple / (8 * fsHz * 0.002 * voutV) : loadA * d / (fsHz * 0.002 * voutV), 60 / (fsHz * r));
          const senseLocation = pick(rand, SENSE);
          const sketch: DesignSketch = {
            kind, rectifier, lightLoad: 'forced-pwm', loadKind, vinV, voutV, loadA, fsHz, inductanceH, maxDuty: 0.97,
            dcr20Ohm: drops.dcr * shrink, switchOhm: drops.sw * shrink, rectifierOhm: drops.rect * shrink,
            vf0V: uniform(rand, 0.3, 0.7), rdOhm: drops.rd * shrink, outputCapacitanceF: capacitanceF, outputEsrOhm: esr,
            senseLocation, senseOhm: drops.sense * shrink, vdsRatingV: 1000, idRatingA: 1000, vrRatingV: 1000, ifRatingA: 1000,
          };
          out.push({
            label: `#${out.length} ${kind}/${rectifier}/${loadKind}/sense ${senseLocation} ESR/R ${(esr / r).toFixed(3)}`,
            loadKind, esrToLoad: esr / r, design: makeDesign(sketch), loadA,
          });
        }
      }
    }
  }
  return out;
}
