/**
 * Expected results computed in Node by calling the engine directly (shared-model/index.ts), so the
 * numbers the page shows are checked against an independent run of the engine, never typed in.
 */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { evaluate, nominalConditions, validateDesign } from '../../../shared-model/index.ts';
import type { Conditions, Design, Evaluation, OperatingPoint } from '../../../shared-model/index.ts';
import { repoRoot } from './build.ts';

export function demoText(name = 'synchronous-buck'): string {
  return readFileSync(join(repoRoot, 'assets', 'designs', `${name}.json`), 'utf8');
}

export function demoDesign(name = 'synchronous-buck'): Design {
  const check = validateDesign(JSON.parse(demoText(name)));
  if (!check.ok) throw new Error(`demo ${name} is invalid: ${check.problems.map((p) => p.message).join(' ')}`);
  return check.design;
}

/** The full electro-thermal evaluation the results area should show for `design` at `overrides`. */
export function expectedEvaluation(design: Design, overrides: Partial<Conditions> = {}): Evaluation {
  return evaluate(design, nominalConditions(design, overrides));
}

/** Its operating point (self-consistent with the losses and temperatures). */
export function expectedOperatingPoint(design: Design, overrides: Partial<Conditions> = {}): OperatingPoint {
  return expectedEvaluation(design, overrides).operatingPoint;
}
