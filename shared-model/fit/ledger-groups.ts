/**
 * The loss ledger in six groups for saying where a calibration moved the loss (our own grouping):
 * conduction (conduction, forward drop, winding DC, ESR, sense), switching (overlap, output capacitance,
 * gate drive, dead time, reverse recovery, junction capacitance), core, winding AC, controller (quiescent),
 * leakage (reverse leakage).
 */
import type { LossTerm, Mechanism } from '../ledger/types.ts';
import type { LossGroup } from './types.ts';

const GROUP: Readonly<Record<Mechanism, LossGroup>> = {
  conduction: 'conduction',
  'forward drop': 'conduction',
  'winding DC': 'conduction',
  ESR: 'conduction',
  sense: 'conduction',
  'turn-on overlap': 'switching',
  'turn-off overlap': 'switching',
  'output capacitance': 'switching',
  'gate drive': 'switching',
  'dead-time diode': 'switching',
  'reverse recovery': 'switching',
  'junction capacitance': 'switching',
  core: 'core',
  'winding AC': 'winding AC',
  quiescent: 'controller',
  'reverse leakage': 'leakage',
};

export const LOSS_GROUPS: readonly LossGroup[] = ['conduction', 'switching', 'core', 'winding AC', 'controller', 'leakage'];

export function lossByGroup(terms: readonly Pick<LossTerm, 'mechanism' | 'watts'>[]): Record<LossGroup, number> {
  const out = Object.fromEntries(LOSS_GROUPS.map((g) => [g, 0])) as Record<LossGroup, number>;
  for (const t of terms) out[GROUP[t.mechanism]] += t.watts;
  return out;
}
