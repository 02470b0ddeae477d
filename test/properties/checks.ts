/**
 * The properties every evaluated point must have (issue 10 §7), as checks that return what is wrong
 * (an empty list: the point passes). Written from the record's documented meaning (DEVELOPERS.md,
 * "Result keys"), not from the engine's code.
 */
import type { Warning } from '../../shared-model/index.ts';

/** Relative tolerance of the independent power balance: input = output + Σ loss terms. */
export const BALANCE_RTOL = 1e-6;
/** Relative tolerance on "the output reaches its specified voltage" (DEVELOPERS.md: regulated, 1e-6). */
export const REGULATION_RTOL = 1e-6;

/** Paths of every number in `x` that is not finite, and of every null (iterative walk). */
export function nonFinite(x: unknown): string[] {
  const out: string[] = [];
  const pending: [unknown, string][] = [[x, '$']];
  while (pending.length > 0) {
    const [here, path] = pending.pop() as [unknown, string];
    if (here === null) out.push(`${path} = null`);
    else if (typeof here === 'number') {
      if (!Number.isFinite(here)) out.push(`${path} = ${here}`);
    } else if (typeof here === 'object') for (const [k, v] of Object.entries(here)) pending.push([v, `${path}.${k}`]);
  }
  return out;
}

export interface PointFacts {
  ambientC: number;
  targetVoutV: number;
  voutV: number;
  loadA: number;
  regulated: boolean;
  converged: boolean;
  inputPower: number;
  outputPower: number;
  lossesW: number[];
  /** Every temperature of the point: junctions, hot spots, surfaces, heatsinks. */
  temperaturesC: { what: string; celsius: number }[];
  warnings: Pick<Warning, 'code' | 'message'>[];
}

const has = (f: PointFacts, code: string, text?: string) => f.warnings.some((w) => w.code === code && (text === undefined || w.message.includes(text)));

export function violations(f: PointFacts): string[] {
  const out: string[] = [];
  f.lossesW.forEach((w, i) => {
    if (!(w >= 0)) out.push(`loss term ${i} is ${w} W (every loss term ≥ 0)`);
  });
  for (const t of f.temperaturesC) {
    if (!(t.celsius >= f.ambientC - 1e-9)) out.push(`${t.what} ${t.celsius} °C is below the ${f.ambientC} °C ambient`);
  }
  // Independent power balance: the output from Vout·I, the losses summed here.
  const sum = f.lossesW.reduce((a, w) => a + w, 0);
  const pout = f.voutV * f.loadA;
  if (!(Math.abs(f.outputPower - pout) <= 1e-9 * Math.max(pout, 1e-12) + 1e-15)) out.push(`output power ${f.outputPower} W is not Vout·I = ${pout} W`);
  const gap = Math.abs(f.inputPower - pout - sum);
  const balanced = gap <= BALANCE_RTOL * Math.max(f.inputPower, 1e-12) + 1e-15;
  if (f.converged && !balanced && !has(f, 'model-limit', 'power balance')) {
    out.push(`input ${f.inputPower} W ≠ output ${pout} W + Σ losses ${sum} W (gap ${gap} W) and no power-balance warning`);
  }
  if (!f.converged && !has(f, 'thermal-runaway') && !has(f, 'not-converged')) out.push('not converged, and no thermal-runaway or not-converged warning');
  const reaches = Math.abs(f.voutV - f.targetVoutV) <= REGULATION_RTOL * Math.abs(f.targetVoutV);
  if (f.regulated !== reaches) out.push(`regulated is ${f.regulated} but the output is ${f.voutV} V for ${f.targetVoutV} V`);
  if (!f.regulated && !has(f, 'cannot-regulate')) out.push('not regulated, and no cannot-regulate warning');
  return out;
}
