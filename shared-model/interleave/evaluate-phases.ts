/**
 * evaluatePhases: one operating point of an interleaved design, composed from one-phase evaluations.
 *
 * 1. Each active phase is the one-phase design (phase-design.ts) at its share of the load, evaluated by the
 *    ordinary ledger (`ledgerEvaluator`): duty, losses and temperatures of its own switch, rectifier,
 *    inductor (and a sense resistor in the switch or inductor). With a sharing mismatch m, phase 1 is the
 *    worst phase at (1 + m)·I/N; the others are one evaluation at the rest of the current.
 * 2. The shared banks carry the phase-shifted sum of the phases' capacitor currents (phase-shift.ts: the
 *    segments summed exactly, not a closed form); their losses, temperatures and checks are rescaled from
 *    the one-phase point (shared-parts.ts). The controller pays gate drive per phase, its supply once.
 * 3. Totals: output power Σ Vout·Ik; total loss Σ rows; input power = output + total loss.
 * The closed forms this reproduces (and is tested against): docs/methods.md §15.
 * Never throws for physics; every number finite (the one-phase records are).
 */
import type { Design, Role } from '../design/schema.ts';
import { ledgerEvaluator, type EvaluateOptions, type LedgerEvaluator } from '../ledger/evaluate.ts';
import type { Evaluation, LossTerm } from '../ledger/types.ts';
import type { Conditions } from '../operating-point/types.ts';
import type { Warning, WarningCode } from '../warnings.ts';
import { perPhaseRoles, phaseCount, phaseDesign, phaseLoads } from './phase-design.ts';
import {
  controllerTerms, rescaledCheck, rescaledHazard, rescaledTemperature, resistiveScale, scaledTerms, sharedCurrent, sharedWave,
} from './shared-parts.ts';
import type { PhaseCheck, PhasedEvaluation, PhaseHazard, PhaseLossRow, PhaseTemperature, SharedCurrent } from './types.ts';

export interface PhaseOptions extends EvaluateOptions {
  /** Stages switching (1 … phases; absent: all). Fewer stages: the others are shed. */
  activePhases?: number;
}

/** Warnings about a shared part that the one-phase point got wrong; rebuilt from the rescaled checks. */
const RESCALED_CODES: ReadonlySet<WarningCode> = new Set<WarningCode>([
  'ripple-current-rating', 'capacitor-life', 'over-temperature', 'burn-hazard', 'resistor-power',
]);

/** Beyond this difference between the shared part's temperature and the one-phase point's, say its resistance is uncertain (our own rule). */
const RESCALE_VALID_K = 10;

const CHECK_WARNING: Partial<Record<string, WarningCode>> = {
  'ripple-current': 'ripple-current-rating',
  temperature: 'over-temperature',
  'capacitor-life': 'capacitor-life',
  'resistor-power': 'resistor-power',
};

/** Evaluates `design` (any phase count) at `conditions`; `activePhases` below the design's count sheds phases. */
export function evaluatePhases(design: Design, conditions?: Partial<Conditions>, options?: PhaseOptions): PhasedEvaluation {
  return evaluatePhasesWith(design, phaseLedgers(design), conditions, options);
}

/** The one-phase ledger evaluators of a design, one per active-phase count, made when first asked for. */
export type PhaseLedgers = (activePhases: number) => LedgerEvaluator;

/** One-phase ledger evaluators for `design`, kept for as long as the caller keeps the function. */
export function phaseLedgers(design: Design): PhaseLedgers {
  const made = new Map<number, LedgerEvaluator>();
  return (active) => {
    let e = made.get(active);
    if (!e) {
      e = ledgerEvaluator(phaseDesign(design, active));
      made.set(active, e);
    }
    return e;
  };
}

/** evaluatePhases with the caller's one-phase evaluators (sweeps reuse them point after point). */
export function evaluatePhasesWith(design: Design, ledgers: PhaseLedgers, conditions?: Partial<Conditions>, options?: PhaseOptions): PhasedEvaluation {
  const phases = phaseCount(design);
  const active = Math.min(phases, Math.max(1, Math.round(options?.activePhases ?? phases)));
  if (!Number.isFinite(active)) throw new RangeError(`activePhases must be a whole number from 1 to ${phases}`);
  const totalA = conditions?.loadA ?? design.spec.ratedLoadA;
  const loads = phaseLoads(totalA, active, active > 1 ? (design.topology.phaseMismatch ?? 0) : 0);
  const evaluator = ledgers(active);
  const worst = evaluator.evaluate({ ...conditions, loadA: loads[0]! }, options);
  const other = active > 1 && loads[1] !== loads[0] ? evaluator.evaluate({ ...conditions, loadA: loads[1]! }, options) : worst;
  const records = loads.map((_, k) => (k === 0 ? worst : other));
  const distinct = other === worst ? [worst] : [worst, other];
  const own = perPhaseRoles(design);
  const sharedRoles: Role[] = ['inputCapacitor', 'outputCapacitor'];
  if (design.parts.senseResistor && !own.has('senseResistor') && design.topology.senseLocation !== 'none') sharedRoles.push('senseResistor');

  const rows: PhaseLossRow[] = [];
  const temperatures: PhaseTemperature[] = [];
  records.forEach((r, k) => {
    for (const t of r.losses) if (own.has(t.part)) rows.push({ ...t, phase: k + 1 });
    for (const t of r.temperatures) if (own.has(t.part)) temperatures.push({ ...t, phase: k + 1 });
  });
  const checks: PhaseCheck[] = worst.checks.filter((c) => own.has(c.part)).map((c) => ({ ...c, phase: 1 }));
  const hazards: PhaseHazard[] = worst.hazards.filter((h) => own.has(h.part)).map((h) => ({ ...h, phase: 1 }));
  const ambientC = worst.conditions.ambientC;
  const marginK = design.margins.temperatureMarginK;
  const sharedWarnings: Warning[] = [];

  const composeShared = (role: Role, terms: LossTerm[], current: SharedCurrent | null): void => {
    const scale = current ? resistiveScale(current) : 1;
    const watts = terms.reduce((a, t) => a + t.watts, 0);
    for (const t of terms) rows.push({ ...t, phase: 'shared' });
    const temp = worst.temperatures.find((t) => t.part === role);
    if (!temp) return;
    const hot = rescaledTemperature(temp, ambientC, watts, marginK);
    temperatures.push({ ...hot, phase: 'shared' });
    if (current && Math.abs(hot.celsius - temp.celsius) > RESCALE_VALID_K)
      sharedWarnings.push({
        code: 'model-limit', severity: 'info', part: role,
        message: `${temp.partName} (shared by every phase) is estimated at ${hot.celsius.toFixed(1)} °C, but its resistance was taken at the one-phase point's ${temp.celsius.toFixed(1)} °C: more than ${RESCALE_VALID_K} K apart, so its loss is less certain.`,
      });
    for (const c of worst.checks.filter((x) => x.part === role)) {
      const value =
        c.check === 'ripple-current' ? c.value * Math.sqrt(scale)
        : c.check === 'temperature' ? hot.celsius
        : c.check === 'capacitor-life' ? c.value * 2 ** ((temp.celsius - hot.celsius) / 10) // 10 K rule, common practice
        : c.check === 'resistor-power' ? c.value * scale
        : c.value;
      const check = rescaledCheck(c, value);
      checks.push({ ...check, phase: 'shared' });
      const code = CHECK_WARNING[c.check];
      if (!check.ok && code)
        sharedWarnings.push({ code, severity: code === 'over-temperature' ? 'danger' : 'caution', part: role, message: `${temp.partName} (shared by every phase): ${c.note} — ${check.value.toPrecision(4)} ${c.unit} against ${check.limit.toPrecision(4)} ${c.unit}.` });
    }
    for (const h of worst.hazards.filter((x) => x.part === role)) {
      const hz = rescaledHazard(h, hot.surfaceC);
      hazards.push({ ...hz, phase: 'shared' });
      if (hz.exceeded) sharedWarnings.push({ code: 'burn-hazard', severity: 'danger', part: role, message: `${h.partName} (shared by every phase): surface ${hz.surfaceC.toFixed(1)} °C against the touch limit ${h.row.limitC} °C. ${h.caution}` });
    }
  };

  const wavesOf = (role: Role) => records.map((r) => sharedWave(r, role));
  const inputCapacitor = sharedCurrent(wavesOf('inputCapacitor'));
  const outputCapacitor = sharedCurrent(wavesOf('outputCapacitor'));
  const inductors = sharedCurrent(records.map((r) => r.operatingPoint.waveforms.inductor));
  const currents: Partial<Record<Role, SharedCurrent>> = { inputCapacitor, outputCapacitor };
  if (sharedRoles.includes('senseResistor')) currents.senseResistor = sharedCurrent(wavesOf('senseResistor'));
  for (const role of sharedRoles) {
    const current = currents[role]!;
    composeShared(role, scaledTerms(worst.losses.filter((t) => t.part === role), resistiveScale(current)), current);
  }
  composeShared('controller', controllerTerms(records), null);

  const phaseLossW = records.map((_, k) => rows.reduce((a, t) => (t.phase === k + 1 ? a + t.watts : a), 0));
  const sharedLossW = rows.reduce((a, t) => (t.phase === 'shared' ? a + t.watts : a), 0);
  const totalLoss = phaseLossW.reduce((a, b) => a + b, 0) + sharedLossW;
  const outputPower = records.reduce((a, r) => a + r.outputPower, 0);
  const inputPower = outputPower + totalLoss;
  const shared = new Set<Role>([...sharedRoles, 'controller']);
  const warnings = mergeWarnings(distinct, shared, sharedWarnings);
  return {
    phases,
    activePhases: active,
    conditions: { ...worst.conditions, loadA: totalA },
    phaseLoadsA: loads,
    regulated: distinct.every((r) => r.regulated),
    converged: distinct.every((r) => r.converged),
    efficiency: inputPower > 0 && outputPower > 0 ? outputPower / inputPower : 0,
    inputPower,
    outputPower,
    totalLoss,
    phaseLossW,
    sharedLossW,
    dutyCycle: worst.dutyCycle,
    conductionMode: worst.conductionMode,
    rows,
    temperatures,
    checks,
    hazards,
    shared: { inputCapacitor, outputCapacitor, inductors },
    rippleFrequencyHz: active * worst.conditions.switchingFrequencyHz,
    warnings,
    assumptions: ASSUMPTIONS,
    phaseRecords: distinct,
  };
}

const ASSUMPTIONS = [
  'Phases are identical and switched 360°/N apart; a sharing mismatch puts (1 + m)·I/N on phase 1.',
  'Shared banks: the phase-shifted sum of the phase currents, its loss at the resistance of the one-phase point.',
  'Heatsinks collect every phase: each phase sees θSA·N (exact for identical phases, conservative for the worst one).',
];

function mergeWarnings(records: readonly Evaluation[], shared: ReadonlySet<Role>, extra: readonly Warning[]): Warning[] {
  const seen = new Set<string>();
  const out: Warning[] = [];
  for (const r of records)
    for (const w of r.warnings) {
      if (w.part && shared.has(w.part as Role) && RESCALED_CODES.has(w.code)) continue;
      const key = `${w.code}|${w.part ?? ''}|${w.message}`;
      if (seen.has(key)) continue;
      seen.add(key);
      out.push(w);
    }
  return out.concat(extra);
}
