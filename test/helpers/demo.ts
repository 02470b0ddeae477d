/**
 * The shipped demo designs (assets/designs, invented scenarios) and the demo part library, read and
 * validated with the engine: the one helper every test uses for "a validated demo design".
 */
import { readFileSync } from 'node:fs';
import { DEMO_DESIGNS, validateDesign, validatePartsLibrary } from '../../shared-model/index.ts';
import type { Design, Part } from '../../shared-model/index.ts';

export type DemoId = 'synchronous-buck' | 'diode-boost' | 'hot-fin-buck' | 'multiphase-buck';

const asset = (path: string): string => readFileSync(new URL(`../../assets/${path}`, import.meta.url), 'utf8');

/** The demo design's file as shipped (its exact text). */
export function demoText(id: string = 'synchronous-buck'): string {
  return asset(`designs/${id.replace(/\.json$/, '')}.json`);
}

/** The demo design, validated (throws with every problem if the shipped file were invalid). */
export function demoDesign(id: string = 'synchronous-buck'): Design {
  const demo = DEMO_DESIGNS.find((d) => d.id === id.replace(/\.json$/, ''));
  if (!demo) throw new Error(`no demo design ${id}`);
  const checked = validateDesign(demo.json);
  if (!checked.ok) throw new Error(`demo ${id} is invalid: ${checked.problems.map((p) => p.message).join(' ')}`);
  return checked.design;
}

/** The shipped invented part library, validated. */
export function demoParts(): Part[] {
  const checked = validatePartsLibrary(JSON.parse(asset('parts/library.json')));
  if (!checked.ok) throw new Error(checked.problems.map((p) => p.message).join(' '));
  return checked.library.parts;
}
