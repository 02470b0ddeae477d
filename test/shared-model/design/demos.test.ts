import { describe, expect, it } from 'vitest';
import type { Design, Inductor, Mosfet, PartsLibrary } from '../../../shared-model/index.ts';
import { DEMO_DESIGNS, DEMO_PARTS_LIBRARY, partsOfKind, validatePartsLibrary } from '../../../shared-model/index.ts';
import { demoDesign as design } from '../../helpers/demo.ts';

function library(): PartsLibrary {
  const r = validatePartsLibrary(DEMO_PARTS_LIBRARY);
  if (!r.ok) throw new Error(JSON.stringify(r.problems));
  return r.library;
}

const ALL = DEMO_DESIGNS.map((d) => design(d.id));

/** Ideal CCM duty and inductor current at one input voltage (docs/methods.md §1: buck D = Vo/Vin, boost D = 1 − Vin/Vo). */
function ideal(d: Design, vinV: number): { duty: number; meanA: number; rippleA: number } {
  const { voutV, ratedLoadA, switchingFrequencyHz: fs } = d.spec;
  const L = d.parts.inductor.inductanceH;
  if (d.topology.kind === 'buck') {
    const duty = voutV / vinV;
    return { duty, meanA: ratedLoadA / (d.topology.phases ?? 1), rippleA: ((vinV - voutV) * duty) / (L * fs) }; // docs/methods.md §1: buck ΔI = (Vin − Vo)·D/(L·fs); per phase: I/N (docs/methods.md §15)
  }
  const duty = 1 - vinV / voutV;
  return { duty, meanA: ratedLoadA / (1 - duty), rippleA: (vinV * duty) / (L * fs) }; // docs/methods.md §1: boost ΔI = Vin·D/(L·fs), IL = Io/D'
}

const corners = (d: Design): number[] => [d.spec.vinMinV, d.spec.vinNomV, d.spec.vinMaxV];

describe('the demo designs are plausible to a practitioner', () => {
  it.each(ALL.map((d) => [d.name, d] as const))('%s: inductor ripple is 20–40 % of the mean current at every input corner', (_n, d) => {
    for (const vin of corners(d)) {
      const { meanA, rippleA } = ideal(d, vin);
      expect(rippleA / meanA).toBeGreaterThanOrEqual(0.2); // common practice: size L for 20–40 % ripple (Erickson & Maksimović 2nd ed. ch. 2 example [from memory])
      expect(rippleA / meanA).toBeLessThanOrEqual(0.4); // common practice, same source
    }
  });

  it.each(ALL.map((d) => [d.name, d] as const))('%s: peak flux stays below 0.3 T and peak current below Isat at 100 °C', (_n, d) => {
    const ind: Inductor = d.parts.inductor;
    for (const vin of corners(d)) {
      const { meanA, rippleA } = ideal(d, vin);
      const peakA = meanA + rippleA / 2; // docs/methods.md §1: Ipk = IL + ΔI/2
      const bPeakT = (ind.inductanceH * peakA) / (ind.turns * ind.aeM2); // docs/methods.md §7: Bpk = L·Ipk/(N·Ae)
      expect(bPeakT).toBeLessThan(0.3); // common practice: power ferrite saturates near 0.35–0.5 T at 100 °C [from memory]
      const isatHotA = ind.isatA * (1 + ind.isatTempCoPerK * (100 - ind.isatAtC)); // linear Isat(T) as the schema defines it (design/parts.ts)
      expect(peakA).toBeLessThan(isatHotA);
    }
  });

  it.each(ALL.map((d) => [d.name, d] as const))('%s: the duty cycle needed at the lowest input is below the controller limit', (_n, d) => {
    expect(ideal(d, d.spec.vinMinV).duty).toBeLessThan(d.spec.maxDuty); // docs/methods.md §1 ideal duty; issue 2: honour the duty limit
  });

  it.each(ALL.map((d) => [d.name, d] as const))('%s: voltage ratings hold with the design\'s derating', (_n, d) => {
    const k = d.margins.voltageDerating;
    const blockV = d.topology.kind === 'buck' ? d.spec.vinMaxV : d.spec.voutV; // buck switch and rectifier block Vin; boost ones block Vout (Erickson & Maksimović ch. 2 [from memory])
    const rect = d.parts.rectifier;
    expect(d.parts.switch.vdsRatingV * k).toBeGreaterThan(blockV);
    expect((rect.kind === 'mosfet' ? rect.vdsRatingV : rect.vrRatingV) * k).toBeGreaterThan(blockV);
    expect(d.parts.inputCapacitor.part.voltageRatingV).toBeGreaterThan(d.spec.vinMaxV);
    expect(d.parts.outputCapacitor.part.voltageRatingV).toBeGreaterThan(d.spec.voutV);
  });

  it('parameters sit in the ranges of their trade', () => {
    for (const d of ALL) {
      for (const fet of [d.parts.switch, d.parts.rectifier].filter((p): p is Mosfet => p.kind === 'mosfet')) {
        expect(fet.rdsOn25Ohm).toBeGreaterThan(1e-3); // common practice: low-voltage discrete MOSFETs have RDS(on) of 1–50 mΩ
        expect(fet.rdsOn25Ohm).toBeLessThan(50e-3); // common practice, same range
        expect(fet.qgC).toBeGreaterThan(1e-9); // common practice: Qg of a few nC to tens of nC at this size
        expect(fet.qgC).toBeLessThan(100e-9);
        const coss = fet.outputCapacitance.kind === 'capacitance' ? fet.outputCapacitance.cossF : 0;
        expect(coss).toBeGreaterThan(50e-12); // common practice: Coss of tens to hundreds of pF
        expect(coss).toBeLessThan(2e-9);
      }
      for (const cap of [d.parts.inputCapacitor.part, d.parts.outputCapacitor.part].filter((c) => c.dielectric === 'ceramic')) {
        expect(cap.esrOhm).toBeGreaterThanOrEqual(1e-3); // common practice: MLCC ESR of a few mΩ at hundreds of kHz
        expect(cap.esrOhm).toBeLessThanOrEqual(20e-3);
      }
      const core = d.parts.inductor.coreLoss;
      expect(core.alpha).toBeGreaterThan(1); // Venkatachalam et al., COMPEL 2002: ferrite α typically 1–2 [from memory]
      expect(core.alpha).toBeLessThan(2);
      expect(core.beta).toBeGreaterThan(2); // same source: β typically 2–3 [from memory]
      expect(core.beta).toBeLessThan(3);
      const pv = core.kind === 'point' ? core.lossWPerM3 * (1e5 / core.atHz) ** core.alpha * (0.1 / core.atPeakT) ** core.beta : core.k * 1e5 ** core.alpha * 0.1 ** core.beta; // docs/methods.md §7 Steinmetz
      expect(pv).toBeGreaterThan(50e3); // common practice: power ferrite loses 50–500 kW/m³ at 100 kHz, 100 mT [from memory]
      expect(pv).toBeLessThan(500e3);
      const le = d.parts.inductor.veM3 / d.parts.inductor.aeM2; // effective path length le = Ve/Ae (IEC 60205 [from memory])
      expect(le).toBeGreaterThan(10e-3); // small SMD power inductors: le of 1–10 cm (common practice)
      expect(le).toBeLessThan(100e-3);
    }
  });

  it('each of the two main demos shares one heatsink between two parts', () => {
    for (const d of ALL.slice(0, 2)) {
      const onSink = Object.values(d.thermal.paths).filter((p) => p?.kind === 'heatsink').map((p) => (p?.kind === 'heatsink' ? p.heatsinkId : ''));
      expect(onSink.length).toBe(2);
      expect(new Set(onSink).size).toBe(1);
    }
  });

  it('the touch-hazard demo has an exposed fin hotter than the brief-touch metal limit, by a hand estimate', () => {
    const d = design('hot-fin-buck');
    const rect = d.parts.rectifier;
    if (rect.kind !== 'diode' || d.thermal.paths.rectifier.kind !== 'heatsink') throw new Error('the demo changed shape');
    const sink = d.thermal.heatsinks.find((h) => h.id === 'clip-fin');
    const { duty, meanA } = ideal(d, d.spec.vinNomV);
    const iAvg = meanA * (1 - duty); // diode average current in a buck, docs/methods.md §1 (avg = IL·D')
    const vf0Hot = rect.vf0V + rect.vfTempCoVPerK * (100 - 25); // Vf0 falls about 1–2 mV/K (docs/methods.md §6); 100 °C is above the fin
    const lowerBoundW = vf0Hot * iAvg; // forward-drop loss without the Rd·I² term (docs/methods.md §6): a lower bound
    const finC = d.spec.ambientC + (sink?.thetaSaKPerW ?? 0) * lowerBoundW; // docs/methods.md §10: Ts = Ta + θSA·ΣP
    expect(d.thermal.touch.rectifier?.touchable).toBe(true);
    expect(finC).toBeGreaterThan(60); // IEC 60950-1 Table 4C: metal handles held briefly 60 °C (docs/methods.md §11 [memory])
    expect(finC + lowerBoundW * (rect.thetaJcKPerW + d.thermal.paths.rectifier.thetaCsKPerW)).toBeLessThan(rect.tjMaxC - d.margins.temperatureMarginK); // but the junction itself is fine
  });
});

describe('the invented parts library', () => {
  it('is valid, invented throughout, and holds every part the demos use', () => {
    const lib = library();
    expect(lib.parts.every((p) => p.invented === true && p.name.startsWith('Invented'))).toBe(true); // team brief rule 2
    for (const d of ALL) {
      const used = [d.parts.switch, d.parts.rectifier, d.parts.inductor, d.parts.inputCapacitor.part, d.parts.outputCapacitor.part, d.parts.controller, ...(d.parts.senseResistor ? [d.parts.senseResistor] : [])];
      for (const part of used) expect(lib.parts.find((p) => p.id === part.id), part.id).toEqual(part);
    }
  });

  it('holds at least four MOSFETs, diodes, inductors, capacitors, resistors and controllers', () => {
    const lib = library();
    expect(partsOfKind(lib, 'mosfet').length).toBeGreaterThanOrEqual(4);
    for (const kind of ['diode', 'inductor', 'capacitor', 'resistor', 'controller'] as const) expect(partsOfKind(lib, kind).length).toBeGreaterThan(0);
  });

  it('its 30 V MOSFETs trade RDS(on) against Qg, so a comparison on the buck demo shows a crossover', () => {
    const fets = partsOfKind(library(), 'mosfet').filter((f) => f.vdsRatingV === 30).sort((a, b) => a.rdsOn25Ohm - b.rdsOn25Ohm);
    expect(fets.length).toBeGreaterThanOrEqual(4);
    for (let i = 1; i < fets.length; i += 1) expect(fets[i]?.qgC).toBeLessThan(fets[i - 1]?.qgC ?? 0); // lower RDS(on) costs gate charge (figure of merit RDS·Qg, common practice)
    const d = design('synchronous-buck');
    const lowR = fets[0] as Mosfet;
    const lowQ = fets[fets.length - 1] as Mosfet;
    // Conduction D·I²·R (docs/methods.md §1, RMS ≈ I√D) against gate drive Qg·Vdrv·fs (docs/methods.md §4): equal at
    // I* = √(ΔQg·Vdrv·fs / (D·ΔR)). The low-side position conducts for D' of the period.
    const dLow = 1 - d.spec.voutV / d.spec.vinNomV;
    const crossA = Math.sqrt(((lowR.qgC - lowQ.qgC) * d.parts.controller.driveV * d.spec.switchingFrequencyHz) / (dLow * (lowQ.rdsOn25Ohm - lowR.rdsOn25Ohm)));
    expect(crossA).toBeGreaterThan(0.1 * d.spec.ratedLoadA);
    expect(crossA).toBeLessThan(d.spec.ratedLoadA);
  });

  it('refuses duplicate ids and a newer version', () => {
    const lib = structuredClone(DEMO_PARTS_LIBRARY) as { parts: unknown[]; version: number };
    lib.parts.push(lib.parts[0]);
    const dup = validatePartsLibrary(lib);
    expect(dup.ok ? [] : dup.problems.map((p) => p.path)).toEqual([`parts[${lib.parts.length - 1}].id`]);
    const newer = validatePartsLibrary({ ...lib, version: 3 });
    expect(newer.ok ? '' : newer.problems[0]?.message).toContain('made by a newer WattLedger: version 3');
  });
});
