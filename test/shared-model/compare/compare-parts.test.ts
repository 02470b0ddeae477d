import { describe, expect, it } from 'vitest';
import { compareParts, substitutePart } from '../../../shared-model/index.ts';
import type { Design, Mosfet } from '../../../shared-model/index.ts';
import { closeTo } from '../../helpers/close-to.ts';
import { crossoverFets, evaluate, handCrossoverDesign } from '../landmarks/hand-designs.ts';
import { demoDesign } from '../../helpers/demo.ts';

function withSwitch(design: Design, fet: Mosfet): Design {
  const s = substitutePart(design, 'switch', fet);
  if (!s.ok) throw new Error(s.problem.message);
  return s.design;
}

/**
 * Crossover of two control switches by hand (docs/methods.md §4 gate-charge method, §1 RMS):
 * ripple-free, the switch turns on and off at Io, so the overlap loss is
 *   Psw = ½·Vin·Io·fs·(Qgs2 + Qgd)·(1/Ig,on + 1/Ig,off),
 *   Ig,on = (Vdrv − Vpl)/(Rup + Rg), Ig,off = Vpl/(Rdn + Rg),
 * and conduction is RDS(on)·D·Io². With everything else equal, the losses are equal where
 *   (R_low − R_fast)·D·Io² = ½·Vin·fs·(Qgd,low − Qgd,fast)·(1/Ig,on + 1/Ig,off)·Io,
 * i.e. Io× = ½·Vin·fs·ΔQgd·(1/Ig,on + 1/Ig,off) / (ΔR·D). At that load the two designs lose the same
 * power, so their power-balanced duty cycles D are equal too.
 */
describe('compareParts', () => {
  const design = handCrossoverDesign();
  const { low, fast } = crossoverFets(design);

  it('finds the crossover of a low-RDS(on) and a low-Qgd MOSFET where the hand formula puts it', () => {
    const out = compareParts(design, { role: 'switch', parts: [low, fast] });
    expect(out.ok).toBe(true); // both parts fill the switch role (schema.ts: the switch is a MOSFET)
    if (!out.ok) return;
    const c = out.comparison;
    expect(c.crossovers).toHaveLength(1); // a quadratic against a linear term cross once for Io > 0 (by hand)
    const x = c.crossovers[0];
    expect([x.fromPartId, x.toPartId]).toEqual(['inv-fast', 'inv-low-rds']); // switching dominates at light load, I²R at heavy load (docs/methods.md §4)
    const eLow = evaluate(withSwitch(design, low), { loadA: x.load });
    const eFast = evaluate(withSwitch(design, fast), { loadA: x.load });
    closeTo(eLow.totalLoss, eFast.totalLoss, 1e-7); // definition of the crossover: equal total loss
    closeTo(eLow.dutyCycle, eFast.dutyCycle, 1e-7); // equal loss → equal power-balanced duty (docs/methods.md §1 last item)
    const drv = design.parts.controller;
    const vin = design.spec.vinNomV;
    const fs = design.spec.switchingFrequencyHz;
    const igOn = (drv.driveV - low.plateauV) / (drv.pullUpOhm + low.rgInternalOhm); // docs/methods.md §4 turn-on gate current
    const igOff = low.plateauV / (drv.pullDownOhm + low.rgInternalOhm); // docs/methods.md §4 turn-off gate current
    const perAmp = 0.5 * vin * fs * (low.qgdC - fast.qgdC) * (1 / igOn + 1 / igOff); // docs/methods.md §4 Eon + Eoff difference per ampere
    const byHand = perAmp / ((fast.rdsOn25Ohm - low.rdsOn25Ohm) * eLow.dutyCycle); // I²R (docs/methods.md §1 Isw,rms² = D·Io²) equals the switching difference
    // Tolerance 2e-3: the engine switches Vin plus the rectifier drop (≈ +0.11 % here), docs/methods.md §4 uses Vin.
    closeTo(x.load, byHand, 2e-3); // docs/methods.md §4 gate-charge method and §1 RMS, hand formula above
  });

  it('reports side-by-side ledgers, overlaid sweeps and the difference at every point', () => {
    const out = compareParts(design, { role: 'switch', parts: [low, fast], refine: false, sweep: { points: 50 } });
    if (!out.ok) throw new Error('comparison refused');
    const [a, b] = out.comparison.alternatives;
    expect(a.sweep.points.map((p) => p.loadA)).toEqual(b.sweep.points.map((p) => p.loadA)); // overlaid sweeps share one load axis (issue 4)
    b.lossDifferenceW.forEach((d, i) => closeTo(d, b.sweep.points[i].totalLoss - a.sweep.points[i].totalLoss, 1e-12)); // difference = B − A by definition
    expect(a.evaluation.conditions.loadA).toBe(design.spec.ratedLoadA); // ledgers at rated load by default (issue 4: "at a chosen load")
    expect(out.comparison.winners[0]).toBe(1); // light load: the low-Qgd part wins (docs/methods.md §4 switching term dominates)
    expect(out.comparison.winners[49]).toBe(0); // heavy load: the low-RDS(on) part wins (I²R dominates)
  });

  it('accepts any role, changing the rectifier kind with the part', () => {
    const boost = demoDesign('diode-boost.json');
    const fet = { ...design.parts.rectifier, id: 'inv-sync-fet' };
    const swap = substitutePart(boost, 'rectifier', fet);
    expect(swap.ok && swap.design.topology.rectifier).toBe('synchronous'); // a MOSFET rectifier makes the design synchronous (schema.ts topology.rectifier)
    const cap = { ...design.parts.outputCapacitor.part, id: 'inv-cap-2', esrOhm: 0.02 };
    const out = compareParts(design, { role: 'outputCapacitor', parts: [design.parts.outputCapacitor.part, cap], sweep: { points: 20 } });
    expect(out.ok).toBe(true); // capacitor roles compare too (issue 4: any role)
  });

  it('refuses a part of the wrong kind, naming the field and what is allowed', () => {
    const out = compareParts(design, { role: 'switch', parts: [low, design.parts.inductor] });
    expect(out.ok).toBe(false); // refused as data, not thrown (team brief: errors as data)
    if (!out.ok) {
      expect(out.problems[0].path).toBe('parts[1]'); // team brief rule 6: name the field
      expect(out.problems[0].allowed).toBe('mosfet'); // and the allowed values
    }
  });
});
