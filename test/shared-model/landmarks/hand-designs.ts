/**
 * Test-only designs whose landmarks can be computed by hand, derived from the shipped demo synchronous
 * buck (assets/designs/synchronous-buck.json, an invented scenario). Each change is stated with the reason.
 */
import type { Design, Mosfet } from '../../../shared-model/index.ts';
import { demoDesign } from '../../helpers/demo.ts';

export { evaluate } from '../../../shared-model/index.ts';

/** Inductor values of the hand thermal-ceiling design. */
export const CEILING = { dcr20Ohm: 0.02, thetaKPerW: 150, tMaxC: 125, marginK: 15, ambientC: 40 } as const;

/**
 * A buck whose inductor loss is I²·DCR(T) alone: 10 mH (ripple ~0.5 mA, so IL,rms² = Io² to 1e-8),
 * core loss coefficient 1e-12 (negligible), no AC winding loss, Isat and RMS rating far above the range,
 * and the inductor alone on a 150 K/W direct path so it, not another part, sets the ceiling.
 */
export function handCeilingDesign(): Design {
  const d = demoDesign('synchronous-buck.json');
  const { rolloff: _rolloff, ...inductor } = d.parts.inductor;
  return {
    ...d,
    spec: { ...d.spec, ambientC: CEILING.ambientC },
    parts: {
      ...d.parts,
      inductor: {
        ...inductor,
        inductanceH: 0.01,
        dcr20Ohm: CEILING.dcr20Ohm,
        isatA: 100,
        irmsRatingA: 100,
        coreLoss: { kind: 'steinmetz', k: 1e-12, alpha: 1.5, beta: 2.5 },
        acWinding: { kind: 'none' },
        tMaxC: CEILING.tMaxC,
      },
    },
    thermal: { ...d.thermal, paths: { ...d.thermal.paths, inductor: { kind: 'direct', thetaJaKPerW: CEILING.thetaKPerW } } },
    margins: { ...d.margins, temperatureMarginK: CEILING.marginK },
  };
}

/**
 * A buck for a MOSFET crossover by hand: a 10 mH inductor (ripple-free, so the switch turns on and off at
 * Io and Isw,rms² = D·Io²), RDS(on) independent of temperature, and every part on its own direct path.
 */
export function handCrossoverDesign(): Design {
  const d = demoDesign('synchronous-buck.json');
  const { rolloff: _rolloff, ...inductor } = d.parts.inductor;
  const direct = { kind: 'direct', thetaJaKPerW: 30 } as const;
  return {
    ...d,
    parts: { ...d.parts, inductor: { ...inductor, inductanceH: 0.01, isatA: 100, irmsRatingA: 100 } },
    thermal: { ...d.thermal, heatsinks: [], paths: { ...d.thermal.paths, switch: direct, rectifier: direct } },
  };
}

/** Two invented control switches that differ only in RDS(on) and Qgd. */
export function crossoverFets(design: Design): { low: Mosfet; fast: Mosfet } {
  const base: Mosfet = { ...design.parts.switch, rdsTemperatureLaw: { law: 'linear', alphaPerK: 0 }, invented: true };
  return {
    low: { ...base, id: 'inv-low-rds', name: 'Invented FET, 5 mΩ, Qgd 6 nC', rdsOn25Ohm: 0.005, qgdC: 6e-9, qgC: 15e-9 },
    fast: { ...base, id: 'inv-fast', name: 'Invented FET, 40 mΩ, Qgd 1.5 nC', rdsOn25Ohm: 0.04, qgdC: 1.5e-9, qgC: 15e-9 },
  };
}
