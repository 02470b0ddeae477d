/**
 * The shipped demo design and part library, validated, for the results-screen unit tests (the same
 * files the app opens at start).
 */
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { validateDesign, validatePartsLibrary } from '../../../shared-model/index.ts';
import type { Design, Part } from '../../../shared-model/index.ts';

const asset = (path: string) => JSON.parse(readFileSync(fileURLToPath(new URL(`../../../assets/${path}`, import.meta.url)), 'utf8')) as unknown;

export function demoDesign(): Design {
  const check = validateDesign(asset('designs/synchronous-buck.json'));
  if (!check.ok) throw new Error(check.problems.map((p) => p.message).join(' '));
  return check.design;
}

export function demoParts(): Part[] {
  const check = validatePartsLibrary(asset('parts/library.json'));
  if (!check.ok) throw new Error(check.problems.map((p) => p.message).join(' '));
  return check.library.parts;
}

export const labelOf = (role: string) => `label:${role}`;
