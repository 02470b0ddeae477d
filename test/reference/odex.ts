/**
 * Typed access to `odex` 2.0.4 (E. Hairer & G. Wanner's ODEX Gragg–Bulirsch–Stoer extrapolation
 * integrator, ported to JavaScript; BSD licence), used only to cross-check the reference integrator.
 *
 * The package ships TypeScript source but no .d.ts; importing it by name makes the type checker compile
 * that source under our strict settings, where it fails. So it is loaded with require() and typed by the
 * small declaration below (only the members used here).
 */
import { createRequire } from 'node:module';

export type Derivative = (x: number, y: number[]) => number[];

export interface OdexSolution {
  y: number[];
  /** 0 converged, 1 maximum steps exceeded, 2 early return. */
  outcome: number;
  nStep: number;
  nAccept: number;
  nReject: number;
  nEval: number;
}

export interface OdexSolver {
  relativeTolerance: number | number[];
  absoluteTolerance: number | number[];
  maxSteps: number;
  solve(f: Derivative, x: number, y0: number[], xEnd: number): OdexSolution;
}

interface OdexModule {
  Solver: new (n: number) => OdexSolver;
}

const load = createRequire(import.meta.url);

/** A new ODEX solver for a system of n equations. */
export function odexSolver(n: number): OdexSolver {
  return new (load('odex') as OdexModule).Solver(n);
}
