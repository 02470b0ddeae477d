/**
 * A validation problem in the user's words, on the field the user touched.
 *
 * Wording: the validator's sentence (taken back to paths by pathMessage) names fields by their document paths ("parts.inductor.inductanceH
 * is -0.0000047 H (-4.7 µH); allowed: 1 nH ≤ inductanceH ≤ 1 H."). On screen a range problem reads
 * "Inductor — Inductance: −4.7 µH; must be at least 1 nH and at most 1 H." (a bound set by another
 * field reads "must be below “Input voltage, lowest” (10.8 V)"); any other sentence keeps
 * its words with every path replaced by the field's on-screen label. The paths stay in the CLI and JSON.
 *
 * Placement: a rule that relates two fields (Vin,min ≤ Vin,max) is reported by the validator on one of
 * them. When the field the user just edited is among the fields the sentence names, the problem is
 * shown on that field, and the other named fields are marked as related.
 */
import { formatEngineering, pathMessage, type Design, type PartKind, type Problem } from '../../shared-model/index.ts';
import { fieldName, findSpec, pathSegments, type FieldName } from './field-labels.ts';
import { PART_FIELDS } from './part-fields.ts';

/** A document path as the validator writes it ("spec.vinMaxV", "thermal.heatsinks[0].id"). */
const PATH = /\b(?:spec|topology|parts|thermal|margins)(?:\.[A-Za-z][A-Za-z0-9_]*|\[\d+\])+/g;

const minus = (text: string): string => text.replace(/(^|[\s(])-(?=\d)/g, '$1−');

function shownValue(value: unknown, unit: string | null): string {
  if (value === undefined) return 'empty';
  if (typeof value === 'number' && Number.isFinite(value)) return minus(unit === null ? String(value) : formatEngineering(value, unit, 4));
  if (typeof value === 'string') return `“${value.length > 40 ? `${value.slice(0, 40)}…` : value}”`;
  return String(value);
}

/** "1 nH ≤ inductanceH ≤ 1 H" → "at least 1 nH and at most 1 H"; null for any other form. */
function rangeWords(allowed: string, key: string, bound: (text: string) => string): string | null {
  const escaped = key.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
  const match = new RegExp(`^(?:(.+?) (≤|<) )?${escaped}(?: (≤|<) (.+))?$`).exec(allowed);
  if (!match || (match[1] === undefined && match[4] === undefined)) return null;
  const parts: string[] = [];
  if (match[1] !== undefined) parts.push(`${match[2] === '<' ? 'above' : 'at least'} ${minus(bound(match[1]))}`);
  if (match[4] !== undefined) parts.push(`${match[3] === '<' ? 'below' : 'at most'} ${minus(bound(match[4]))}`);
  return parts.join(' and ');
}

/** The on-screen label of a path, or the path itself when the editor has no field for it. */
export function labelOf(path: string, design: Design): string {
  return fieldName(path, design)?.label ?? path;
}

/** The problem's sentence as the screen shows it. */
export function problemWords(problem: Problem, design: Design): string {
  return wordsWith(problem, fieldName(problem.path, design), (path) => `“${labelOf(path, design)}”`, PATH);
}

/** A part-library problem (path relative to the part, "rdsOn25Ohm") in the words of the part editor. */
export function partProblemWords(problem: Problem, kind: PartKind): string {
  const fields = PART_FIELDS[kind];
  const name = findSpec([...fields.identity, ...fields.values], pathSegments(problem.path));
  return wordsWith(problem, name, (path) => path, null);
}

function wordsWith(problem: Problem, name: FieldName | null, relabel: (path: string) => string, paths: RegExp | null): string {
  const key = String(pathSegments(problem.path).at(-1) ?? '');
  if (name) {
    const plain = (text: string) => (paths ? text.replace(paths, relabel) : text);
    // A percent field's bounds are plain fractions in the validator's words: say them in percent too.
    const bound = name.unit === '%' ? (text: string) => (/^[-+]?\d*\.?\d+(?:e[-+]?\d+)?$/i.test(text.trim()) ? formatEngineering(Number(text), '%', 4) : plain(text)) : plain;
    const range = rangeWords(problem.allowed, key, bound);
    if (range !== null) return `${name.label}: ${shownValue(problem.value, name.unit)}; must be ${range}.`;
  }
  const message = pathMessage(problem);
  let text = paths ? message.replace(paths, relabel) : message;
  if (name && key.length > 2) text = text.replaceAll(problem.path, name.label).replaceAll(key, name.label);
  return minus(text);
}

/** The document paths a problem's sentence names, its own first. */
export function pathsNamed(problem: Problem): string[] {
  const named = [problem.path, ...(pathMessage(problem).match(PATH) ?? [])];
  return [...new Set(named)];
}

export interface PlacedProblem {
  /** Where the problem is shown. */
  path: string;
  /** Other fields the rule concerns (marked "related"). */
  related: string[];
  text: string;
  /** The on-screen label of the field it is shown at. */
  label: string;
}

/** Every problem in words, placed on the field just edited when the rule names it. */
export function placeProblems(problems: readonly Problem[], design: Design, editedPath: string | null): PlacedProblem[] {
  return problems.map((problem) => {
    const named = pathsNamed(problem);
    const path = editedPath !== null && named.includes(editedPath) ? editedPath : problem.path;
    return { path, related: named.filter((p) => p !== path), text: problemWords(problem, design), label: labelOf(path, design) };
  });
}

export interface ShownAtField {
  own: string[];
  related: string[];
}

export const NOT_SHOWN: ShownAtField = { own: [], related: [] };

/** By field path: the sentences shown there, and the labels of the fields whose problem concerns it. */
export function groupPlaced(placed: readonly PlacedProblem[]): ReadonlyMap<string, ShownAtField> {
  const map = new Map<string, ShownAtField>();
  const at = (path: string): ShownAtField => {
    let entry = map.get(path);
    if (!entry) map.set(path, (entry = { own: [], related: [] }));
    return entry;
  };
  for (const problem of placed) {
    at(problem.path).own.push(problem.text);
    for (const other of problem.related) at(other).related.push(problem.label);
  }
  return map;
}

/** A part draft's problems (by path) in the part editor's words. */
export function partWordsByPath(problems: ReadonlyMap<string, readonly Problem[]>, kind: PartKind): ReadonlyMap<string, string[]> {
  return new Map([...problems].map(([path, list]) => [path, list.map((p) => partProblemWords(p, kind))]));
}
