/**
 * The benchmark's record: one `Figure` per measured quantity, printed as one line with its goal and
 * written together to out/bench/figures.json. A figure is a measurement, never a test assertion.
 */
import { mkdirSync, writeFileSync } from 'node:fs';
import { cpus, loadavg } from 'node:os';
import { dirname } from 'node:path';

/** Whether a smaller or a larger value is the better one. */
export type Better = 'lower' | 'higher';

export interface Figure {
  /** Stable name (issue 14's table): `point-full-us`, `rank-10k-parts-s`, … */
  name: string;
  /** The figure: the median of the runs. */
  value: number;
  unit: string;
  /** The goal; null when the figure is informative only. */
  goal: number | null;
  better: Better;
  min: number;
  median: number;
  runs: number;
  /** value meets goal (null when there is no goal). */
  met: boolean | null;
  /** One sentence: what exactly was timed or counted. */
  what: string;
  /** Extra facts printed under the line (answers compared, per-design values, …). */
  detail?: string[];
}

export interface FigureInput {
  name: string;
  unit: string;
  goal: number | null;
  better?: Better;
  /** Per-run values, in `unit`. */
  samples: readonly number[];
  what: string;
  detail?: string[];
}

export function median(values: readonly number[]): number {
  const s = [...values].sort((a, b) => a - b);
  const m = Math.floor(s.length / 2);
  return s.length % 2 ? s[m]! : (s[m - 1]! + s[m]!) / 2;
}

export function figureOf(input: FigureInput): Figure {
  if (input.samples.length === 0) throw new Error(`bench: figure ${input.name} has no runs`);
  const better = input.better ?? 'lower';
  const med = median(input.samples);
  const min = better === 'lower' ? Math.min(...input.samples) : Math.max(...input.samples);
  const met = input.goal === null ? null : better === 'lower' ? med <= input.goal : med >= input.goal;
  return {
    name: input.name,
    value: med,
    unit: input.unit,
    goal: input.goal,
    better,
    min,
    median: med,
    runs: input.samples.length,
    met,
    what: input.what,
    ...(input.detail ? { detail: input.detail } : {}),
  };
}

const digits = (x: number) => (Math.abs(x) >= 100 ? 0 : Math.abs(x) >= 10 ? 1 : Math.abs(x) >= 1 ? 2 : 3);
const show = (x: number) => x.toFixed(digits(x));

/** `name  median unit (best b, n runs)  goal ≤ g: meets|MISSES` and the figure's sentence. */
export function lineOf(f: Figure): string {
  const sign = f.better === 'lower' ? '≤' : '≥';
  const goal = f.goal === null ? 'no goal (informative)' : `goal ${sign} ${show(f.goal)} ${f.unit}: ${f.met ? 'meets' : 'MISSES'}`;
  const head = `${f.name.padEnd(30)} ${show(f.value)} ${f.unit} (best ${show(f.min)}, ${f.runs} run${f.runs === 1 ? '' : 's'})  ${goal}`;
  return [head, `    ${f.what}`, ...(f.detail ?? []).map((d) => `    ${d}`)].join('\n');
}

export interface MachineFacts {
  cores: number;
  cpuModel: string;
  node: string;
  /** One-minute load average at the end of the run: the contention the figures were measured under. */
  loadAverage: number;
  measuredAt: string;
  quick: boolean;
}

export function machineFacts(quick: boolean): MachineFacts {
  const c = cpus();
  return {
    cores: c.length,
    cpuModel: c[0]?.model ?? 'unknown',
    node: process.version,
    loadAverage: loadavg()[0] ?? 0,
    measuredAt: new Date().toISOString(),
    quick,
  };
}

export function writeFigures(path: string, figures: readonly Figure[], machine: MachineFacts): void {
  mkdirSync(dirname(path), { recursive: true });
  writeFileSync(path, `${JSON.stringify({ figures, machine }, null, 2)}\n`);
}
