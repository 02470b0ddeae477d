/**
 * Tolerances and how a variation is applied to a design.
 *
 * A tolerance is a range for the input voltage and the ambient, and a ± fraction for RDS(on) (both
 * MOSFETs), inductor DCR, capacitor ESR (input and output), inductance (with its roll-off point) and the
 * switching frequency. A variation is one set of values: absolute Vin and ambient, and a scale factor per
 * spread (1 = nominal). Applying it scales the part records and the conditions; nothing else changes.
 * Default spreads are common practice for a first look (RDS(on) ±20 %, DCR ±10 %, ESR ±20 %,
 * inductance ±20 %, switching frequency ±10 %, ambient ±10 K, Vin over the specified range) — set your own
 * from the datasheets.
 */
import type { Design } from '../design/schema.ts';
import type { Conditions } from '../operating-point/types.ts';
import type { OptionProblem } from '../sweep/types.ts';

export interface ToleranceRange {
  min: number;
  max: number;
}

export interface Tolerances {
  vinV?: ToleranceRange;
  ambientC?: ToleranceRange;
  /** ± fraction, e.g. 0.2 for ±20 %. */
  rdsOnFraction?: number;
  dcrFraction?: number;
  esrFraction?: number;
  inductanceFraction?: number;
  frequencyFraction?: number;
}

export type ResolvedTolerances = Required<Tolerances>;

export const DEFAULT_SPREADS = {
  rdsOnFraction: 0.2,
  dcrFraction: 0.1,
  esrFraction: 0.2,
  inductanceFraction: 0.2,
  frequencyFraction: 0.1,
} as const;
export const DEFAULT_AMBIENT_SPREAD_K = 10;

export type SpreadKey = keyof typeof DEFAULT_SPREADS;
export const SPREAD_KEYS: readonly SpreadKey[] = ['rdsOnFraction', 'dcrFraction', 'esrFraction', 'inductanceFraction', 'frequencyFraction'];

export function resolveTolerances(design: Design, t: Tolerances = {}): ResolvedTolerances {
  const s = design.spec;
  return {
    vinV: t.vinV ?? { min: s.vinMinV, max: s.vinMaxV },
    ambientC: t.ambientC ?? { min: s.ambientC - DEFAULT_AMBIENT_SPREAD_K, max: s.ambientC + DEFAULT_AMBIENT_SPREAD_K },
    rdsOnFraction: t.rdsOnFraction ?? DEFAULT_SPREADS.rdsOnFraction,
    dcrFraction: t.dcrFraction ?? DEFAULT_SPREADS.dcrFraction,
    esrFraction: t.esrFraction ?? DEFAULT_SPREADS.esrFraction,
    inductanceFraction: t.inductanceFraction ?? DEFAULT_SPREADS.inductanceFraction,
    frequencyFraction: t.frequencyFraction ?? DEFAULT_SPREADS.frequencyFraction,
  };
}

/** Every problem with the tolerances, naming the field, value and allowed range. */
export function checkTolerances(t: Tolerances): OptionProblem[] {
  const problems: OptionProblem[] = [];
  const range = (key: 'vinV' | 'ambientC', lowest: number, unit: string) => {
    const r = t[key];
    if (!r) return;
    if (!Number.isFinite(r.min) || r.min < lowest || (key === 'vinV' && r.min <= 0)) {
      problems.push({ path: `tolerances.${key}.min`, value: r.min, allowed: key === 'vinV' ? '> 0 V' : `≥ ${lowest} ${unit}`, message: `tolerances.${key}.min must be ${key === 'vinV' ? 'greater than 0 V' : `at least ${lowest} ${unit}`} (got ${r.min}).` });
    }
    if (!Number.isFinite(r.max) || !(r.max >= r.min)) {
      problems.push({ path: `tolerances.${key}.max`, value: r.max, allowed: `≥ min (${r.min}) ${unit}`, message: `tolerances.${key}.max must be a number no smaller than the minimum ${r.min} ${unit} (got ${r.max}).` });
    }
  };
  range('vinV', 0, 'V');
  range('ambientC', -273.15, '°C');
  for (const key of SPREAD_KEYS) {
    const f = t[key];
    if (f !== undefined && !(Number.isFinite(f) && f >= 0 && f < 1)) {
      problems.push({ path: `tolerances.${key}`, value: f, allowed: '0 ≤ fraction < 1', message: `tolerances.${key} must be a fraction from 0 up to (not including) 1, e.g. 0.2 for ±20 % (got ${f}).` });
    }
  }
  return problems;
}

/** One set of values for every tolerance. Scales multiply the nominal value (1 = nominal). */
export interface Variation {
  vinV: number;
  ambientC: number;
  switchRdsOnScale: number;
  rectifierRdsOnScale: number;
  dcrScale: number;
  inductanceScale: number;
  inputEsrScale: number;
  outputEsrScale: number;
  frequencyScale: number;
}

export function nominalVariation(conditions: Conditions): Variation {
  return {
    vinV: conditions.vinV,
    ambientC: conditions.ambientC,
    switchRdsOnScale: 1,
    rectifierRdsOnScale: 1,
    dcrScale: 1,
    inductanceScale: 1,
    inputEsrScale: 1,
    outputEsrScale: 1,
    frequencyScale: 1,
  };
}

/** The design and conditions with a variation applied (new objects; the inputs are unchanged). */
export function applyVariation(design: Design, conditions: Conditions, v: Variation): { design: Design; conditions: Conditions } {
  return { design: varyDesign(design, v), conditions: varyConditions(conditions, v) };
}

/** True when a variation leaves every part at its nominal value (only Vin, ambient or fs move). */
export function partsNominal(v: Variation): boolean {
  return (
    v.switchRdsOnScale === 1 && v.rectifierRdsOnScale === 1 && v.dcrScale === 1 && v.inductanceScale === 1 &&
    v.inputEsrScale === 1 && v.outputEsrScale === 1
  );
}

/** A key that is equal for two variations exactly when they give the same part values. */
export function partsKey(v: Variation): string {
  return `${v.switchRdsOnScale} ${v.rectifierRdsOnScale} ${v.dcrScale} ${v.inductanceScale} ${v.inputEsrScale} ${v.outputEsrScale}`;
}

/** The conditions with a variation applied (Vin, ambient, switching frequency; a new object). */
export function varyConditions(conditions: Conditions, v: Variation): Conditions {
  return { ...conditions, vinV: v.vinV, ambientC: v.ambientC, switchingFrequencyHz: conditions.switchingFrequencyHz * v.frequencyScale };
}

/** The design with a variation's part scales applied (a new object; the input is unchanged). */
export function varyDesign(design: Design, v: Variation): Design {
  const varied = ownPartsCopy(design);
  varyPartsInto(varied.parts, design.parts, v);
  return varied;
}

/**
 * A copy of `design` with its own records of every part value a variation sets (switch, a MOSFET
 * rectifier, inductor and its roll-off, both capacitor parts); everything else shared with `design`.
 */
export function ownPartsCopy(design: Design): Design {
  const p = design.parts;
  const inductor = { ...p.inductor, ...(p.inductor.rolloff ? { rolloff: { ...p.inductor.rolloff } } : {}) };
  const parts = {
    ...p,
    switch: { ...p.switch },
    rectifier: p.rectifier.kind === 'mosfet' ? { ...p.rectifier } : p.rectifier,
    inductor,
    inputCapacitor: { ...p.inputCapacitor, part: { ...p.inputCapacitor.part } },
    outputCapacitor: { ...p.outputCapacitor, part: { ...p.outputCapacitor.part } },
  };
  return { ...design, parts };
}

/**
 * Writes a variation's part values, scaled from `nominal`, into `into` — the parts of an ownPartsCopy of
 * the design `nominal` belongs to (in place: a tolerance analysis varies one copy sample after sample).
 */
export function varyPartsInto(into: Design['parts'], nominal: Design['parts'], v: Variation): void {
  const n = nominal;
  into.inductor.inductanceH = n.inductor.inductanceH * v.inductanceScale;
  into.inductor.dcr20Ohm = n.inductor.dcr20Ohm * v.dcrScale;
  if (into.inductor.rolloff && n.inductor.rolloff) into.inductor.rolloff.inductanceH = n.inductor.rolloff.inductanceH * v.inductanceScale;
  if (into.rectifier.kind === 'mosfet' && n.rectifier.kind === 'mosfet') into.rectifier.rdsOn25Ohm = n.rectifier.rdsOn25Ohm * v.rectifierRdsOnScale;
  into.switch.rdsOn25Ohm = n.switch.rdsOn25Ohm * v.switchRdsOnScale;
  into.inputCapacitor.part.esrOhm = n.inputCapacitor.part.esrOhm * v.inputEsrScale;
  into.outputCapacitor.part.esrOhm = n.outputCapacitor.part.esrOhm * v.outputEsrScale;
}

/** A short label of a variation, e.g. "Vin 9 V · ambient 50 °C · RDS(on) +20 % · … · fs −10 %". */
export function describeVariation(v: Variation): string {
  const pct = (scale: number) => {
    const p = Math.round((scale - 1) * 1000) / 10;
    return p === 0 ? 'nominal' : `${p > 0 ? '+' : '−'}${Math.abs(p)} %`;
  };
  const rds = v.switchRdsOnScale === v.rectifierRdsOnScale ? `RDS(on) ${pct(v.switchRdsOnScale)}` : `RDS(on) switch ${pct(v.switchRdsOnScale)}, rectifier ${pct(v.rectifierRdsOnScale)}`;
  const esr = v.inputEsrScale === v.outputEsrScale ? `ESR ${pct(v.inputEsrScale)}` : `ESR in ${pct(v.inputEsrScale)}, out ${pct(v.outputEsrScale)}`;
  return [
    `Vin ${Number(v.vinV.toPrecision(4))} V`,
    `ambient ${Number(v.ambientC.toPrecision(4))} °C`,
    rds,
    `DCR ${pct(v.dcrScale)}`,
    esr,
    `L ${pct(v.inductanceScale)}`,
    `fs ${pct(v.frequencyScale)}`,
  ].join(' · ');
}
