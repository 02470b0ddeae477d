/**
 * Seeded random designs for the time-domain comparison (test-only).
 *
 * Each case draws a buck or boost, a rectifier and light-load behaviour, and a target regime:
 * CCM (rated load), DCM (load 15–80 % of the ideal boundary load) or forced-PWM reverse current
 * (10–70 %). Values are drawn in ranges typical of discrete converters of a few W to a few hundred W:
 * Vin 5–48 V (buck) or 3–24 V (boost), ratio 0.15–0.75 or 1.3–3.5, 0.5–10 A, 100 kHz–1 MHz, each
 * resistive drop 0.2–1.5 % of the lower terminal voltage at the rated inductor current, inductor ripple
 * 20–120 % of the rated mean current, output ripple 0.05–0.3 % of Vout, any sense-resistor location.
 * The ideal formulas (docs/methods.md §1–2) only size the parts.
 *
 * Every drawn design states a resistive load (spec.loadKind), which both references model exactly. The
 * analytic engine assumes straight-line currents and a capacitor bank that is an AC short over a period
 * (its voltage ripple drives no load current); the reference has neither assumption. Three bounds keep the drawn designs where those assumptions are meant to hold
 * (measured: the discrepancy grows roughly in proportion to each quantity beyond them):
 * - curvature λ = ΣR·T/L · ΔI/|IL| ≤ LAMBDA_MAX (resistances are scaled down to meet it): the inductor
 *   slope changes with its own current through the resistances; the straight-line error in a branch
 *   mean or RMS was measured below about 0.055·λ, levelling off near 1 % (λ ≥ 0.2, e.g. lossy
 *   forced-PWM light load);
 * - R·C ≥ RC_MIN_PERIODS · T and ESR ≤ R / ESR_MAX_LOAD_FRACTION_INV: a resistive load takes a share of
 *   the ripple current (about T/(8RC) + ESR/R of it) that a constant-current load does not.
 */
import type { Design, Topology } from '../../shared-model/index.ts';
import { makeDesign, type DesignSketch } from '../helpers/designs.ts';
import { logUniform, mulberry32, pick, uniform } from './prng.ts';

export type Regime = 'ccm' | 'dcm' | 'reverse';

export interface RandomCase {
  index: number;
  label: string;
  regime: Regime;
  /** Curvature parameter λ of the drawn design after any scaling (see the header). */
  lambda: number;
  sketch: DesignSketch;
  design: Design;
  loadA: number;
}

interface Family {
  kind: 'buck' | 'boost';
  rectifier: 'diode' | 'synchronous';
  lightLoad: Topology['lightLoad'];
  regime: Regime;
}

export const FAMILIES: Family[] = (['buck', 'boost'] as const).flatMap((kind) => [
  { kind, rectifier: 'diode', lightLoad: 'forced-pwm', regime: 'ccm' },
  { kind, rectifier: 'diode', lightLoad: 'forced-pwm', regime: 'dcm' },
  { kind, rectifier: 'synchronous', lightLoad: 'forced-pwm', regime: 'ccm' },
  { kind, rectifier: 'synchronous', lightLoad: 'forced-pwm', regime: 'reverse' },
  { kind, rectifier: 'synchronous', lightLoad: 'diode-emulation', regime: 'ccm' },
  { kind, rectifier: 'synchronous', lightLoad: 'diode-emulation', regime: 'dcm' },
]);

/** Largest curvature parameter λ admitted (resistances are scaled down to meet it). */
export const LAMBDA_MAX = 0.02;
/** Smallest output time constant R·C at the test load, in switching periods. */
export const RC_MIN_PERIODS = 60;
/** The output bank's ESR is at most R / this. */
export const ESR_MAX_LOAD_FRACTION_INV = 600;

const SENSE: Topology['senseLocation'][] = ['none', 'input', 'switch', 'inductor', 'output'];

/** The ratings every drawn design starts from (see the header): Vin, Vout, load, fs, ideal duty and IL. */
export function drawRatings(rand: () => number, buck: boolean) {
  const vinV = buck ? uniform(rand, 5, 48) : uniform(rand, 3, 24);
  const voutV = buck ? vinV * uniform(rand, 0.15, 0.75) : vinV * uniform(rand, 1.3, 3.5);
  const loadA = logUniform(rand, 0.5, 10);
  const fsHz = logUniform(rand, 100e3, 1e6);
  const d = buck ? voutV / vinV : 1 - vinV / voutV;
  return { vinV, voutV, loadA, fsHz, d, inductorA: buck ? loadA : loadA / (1 - d) };
}

export function randomCases(seed: number, perFamily: number, lambdaMax = LAMBDA_MAX): RandomCase[] {
  const rand = mulberry32(seed);
  const cases: RandomCase[] = [];
  for (let rep = 0; rep < perFamily; rep++) {
    for (const f of FAMILIES) {
      const buck = f.kind === 'buck';
      const { vinV, voutV, loadA: ratedA, fsHz, d, inductorA: ilRated } = drawRatings(rand, buck);
      // Each resistive drop at the rated inductor current: 0.2–1.5 % of the smaller terminal voltage.
      const rOf = () => (Math.min(vinV, voutV) / ilRated) * uniform(rand, 0.002, 0.015);
      const ripple = uniform(rand, 0.2, 1.2) * ilRated;
      const inductanceH = ((buck ? vinV - voutV : vinV) * d) / (ripple * fsHz);
      // Ideal boundary load at this duty: valley = 0 when IL = ΔI/2 (docs/methods.md §2, K = Kcrit).
      const boundaryA = buck ? ripple / 2 : (ripple / 2) * (1 - d);
      const loadA =
        f.regime === 'ccm' ? ratedA : boundaryA * uniform(rand, f.regime === 'dcm' ? 0.15 : 0.1, f.regime === 'dcm' ? 0.8 : 0.7);
      const q = uniform(rand, 0.0005, 0.003) * voutV;
      const peak = ilRated + ripple / 2;
      const loadOhm = voutV / loadA;
      // Output bank: the ripple target, but at least RC = RC_MIN_PERIODS · T at the test load (see the header).
      const capacitanceF = Math.max(buck ? ripple / (8 * fsHz * q) : (ratedA * d) / (fsHz * q), RC_MIN_PERIODS / (fsHz * loadOhm));
      // ESR: up to the ripple target, and at most R / ESR_MAX_LOAD_FRACTION_INV (see the header).
      const esr = Math.min(uniform(rand, 0.2, 1) * (q / (buck ? ripple : peak)), loadOhm / ESR_MAX_LOAD_FRACTION_INV);
      const senseLocation = pick(rand, SENSE);
      const resistances = { dcr: rOf(), sw: rOf(), rect: rOf(), rd: rOf(), sense: rOf() / 2 };
      // Curvature bound λ = (ΣR)·T/L · ΔI/|IL| at the test load (ideal ΔI, IL), see the header.
      const ilTest = buck ? loadA : loadA / (1 - d);
      const total = resistances.dcr + resistances.sw + Math.max(resistances.rect, resistances.rd) + resistances.sense;
      const lambda = ((total / fsHz / inductanceH) * ripple) / ilTest;
      const shrink = lambda > lambdaMax ? lambdaMax / lambda : 1;
      const sketch: DesignSketch = {
        kind: f.kind,
        rectifier: f.rectifier,
        lightLoad: f.lightLoad,
        loadKind: 'resistive',
        vinV,
        voutV,
        loadA: ratedA,
        fsHz,
        inductanceH,
        maxDuty: 0.97,
        dcr20Ohm: resistances.dcr * shrink,
        switchOhm: resistances.sw * shrink,
        rectifierOhm: resistances.rect * shrink,
        vf0V: uniform(rand, 0.3, 0.7),
        rdOhm: resistances.rd * shrink,
        outputCapacitanceF: capacitanceF,
        outputEsrOhm: esr,
        senseLocation,
        senseOhm: resistances.sense * shrink,
        vdsRatingV: 1000,
        idRatingA: 1000,
        vrRatingV: 1000,
        ifRatingA: 1000,
      };
      const index = cases.length;
      cases.push({
        index,
        label: `#${index} ${f.kind}/${f.rectifier}/${f.lightLoad}/${f.regime}/sense ${senseLocation}`,
        regime: f.regime,
        lambda: lambda * shrink,
        sketch,
        design: makeDesign(sketch),
        loadA,
      });
    }
  }
  return cases;
}
