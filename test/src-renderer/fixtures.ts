/** The shipped demo design and part library, read and validated with the engine, for renderer tests. */
import { readFileSync } from 'node:fs';
import { validateDesign, validatePartsLibrary } from '../../shared-model/index.ts';
import type { Design, Part } from '../../shared-model/index.ts';

const asset = (path: string) => readFileSync(new URL(`../../assets/${path}`, import.meta.url), 'utf8');

export function demoText(name = 'synchronous-buck'): string {
  return asset(`designs/${name}.json`);
}

export function demoDesign(name = 'synchronous-buck'): Design {
  const check = validateDesign(JSON.parse(demoText(name)));
  if (!check.ok) throw new Error(check.problems.map((p) => p.message).join(' '));
  return check.design;
}

export function demoParts(): Part[] {
  const check = validatePartsLibrary(JSON.parse(asset('parts/library.json')));
  if (!check.ok) throw new Error(check.problems.map((p) => p.message).join(' '));
  return check.library.parts;
}
