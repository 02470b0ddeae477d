/**
 * Problems and notices of the design document, and the plain sentences they carry.
 * A Problem stops a design from being used: it names the field (dotted path), the value found, the
 * allowed range and says all three in one sentence. A notice is advice on a usable design.
 */
import { formatEngineering } from '../units/engineering.ts';
import { UNITS } from '../units/engineering-units.ts';
import { unitOfPath } from './key-units.ts';

export interface Problem {
  /** Dotted path of the field, e.g. "spec.vinMaxV" or "thermal.heatsinks[1].id"; "" is the whole document. */
  path: string;
  /** The value found there (undefined when missing). */
  value: unknown;
  /** The allowed values, e.g. "0 V < vinMaxV ≤ 10 kV", "one of "buck", "boost"". */
  allowed: string;
  /** One plain sentence naming the field (by its on-screen label where it has one), the value and the allowed range. */
  message: string;
  /** The on-screen label of each field the sentence names (by path), as added by labelProblem. */
  fieldLabels?: Readonly<Record<string, string>>;
  /** Where in the text a JSON syntax error is (1-based), for problems found while reading a file. */
  line?: number;
  column?: number;
}

/** Advice on a valid design (an ignored key, an unused heatsink, a migrated file). */
export interface DesignNotice {
  path: string;
  /** The value concerned, shortened by compactValue when it is large. */
  value: unknown;
  message: string;
  /** Line in the file (1-based), for notices found while reading a file (a repeated key). */
  line?: number;
}

/** ["thermal", "heatsinks", 0, "id"] → "thermal.heatsinks[0].id". */
export function pathToString(path: readonly PropertyKey[]): string {
  let out = '';
  for (const key of path) {
    if (typeof key === 'number') out += `[${key}]`;
    else out += out === '' ? String(key) : `.${String(key)}`;
  }
  return out;
}

/** Reads the value at a path of keys, or undefined. */
export function valueAt(doc: unknown, path: readonly PropertyKey[]): unknown {
  let here: unknown = doc;
  for (const key of path) {
    if (here === null || typeof here !== 'object') return undefined;
    here = (here as Record<PropertyKey, unknown>)[key];
  }
  return here;
}

/** Largest value carried as it is in a problem or notice; anything bigger is summarised (compactValue). */
const COMPACT = { chars: 200, nodes: 50, depth: 6 } as const;

const plural = (n: number, word: string): string => `${n.toLocaleString('en-US')} ${word}${n === 1 ? '' : 's'}`;

/** Summary of a container too large to echo: its size and whether it goes deeper than COMPACT.depth. */
function summarise(value: object): string {
  let depth = 0;
  let here: unknown = value;
  // Follow the first child down (iteratively, so any depth is safe) to say how deep it goes.
  while (here !== null && typeof here === 'object' && depth <= 10_000) {
    depth += 1;
    const first: unknown = Array.isArray(here) ? here[0] : Object.values(here as Record<string, unknown>)[0];
    here = first;
  }
  const size = Array.isArray(value) ? `a list of ${plural(value.length, 'item')}` : `an object with ${plural(Object.keys(value).length, 'key')}`;
  const deep = depth > COMPACT.depth ? `, nested ${depth > 10_000 ? 'more than 10,000' : depth.toLocaleString('en-US')} levels deep` : '';
  return `(${size}${deep}; not shown)`;
}

/**
 * The value as it may travel in a Problem or DesignNotice (and so into JSON output and messages):
 * primitives and small structures unchanged; a text longer than 200 characters cut to its first 40 with
 * its length; a list or object with more than 50 values, nested deeper than 6 levels or holding a long
 * text replaced by a one-line summary. Never recursive on the input's depth.
 */
export function compactValue(value: unknown): unknown {
  if (typeof value === 'string') return value.length > COMPACT.chars ? `${value.slice(0, 40)}… (${plural(value.length, 'character')}; not shown)` : value;
  if (value === null || typeof value !== 'object') return value;
  let nodes = 0;
  const pending: [unknown, number][] = [[value, 1]];
  while (pending.length > 0) {
    const [here, depth] = pending.pop() as [unknown, number];
    nodes += 1;
    if (nodes > COMPACT.nodes || depth > COMPACT.depth || (typeof here === 'string' && here.length > COMPACT.chars)) return summarise(value);
    if (here === null || typeof here !== 'object') continue;
    const children = Array.isArray(here) ? here.length : Object.keys(here).length;
    if (nodes + children > COMPACT.nodes) return summarise(value);
    for (const child of Object.values(here)) pending.push([child, depth + 1]);
  }
  return value;
}

/** A value as words for a message: "-5 V", "4.7e-6 H (4.7 µH)", "the text "12"", "missing". */
export function describeValue(value: unknown, unit = ''): string {
  if (value === undefined) return 'missing';
  if (value === null) return 'null';
  if (typeof value === 'number') {
    if (Number.isNaN(value)) return 'NaN (not a number)';
    if (!Number.isFinite(value)) return `${value > 0 ? '' : '-'}Infinity (not a finite number)`;
    const plain = unit === '' ? String(value) : `${value} ${unit}`;
    const pretty = UNITS[unit]?.prefixes && unit !== '' ? formatEngineering(value, unit, 6) : plain;
    return pretty === plain ? plain : `${plain} (${pretty})`;
  }
  if (typeof value === 'string') {
    const shown = value.length > 40 ? `${value.slice(0, 40)}…` : value;
    return `the text "${shown}"`;
  }
  if (typeof value === 'boolean') return String(value);
  if (Array.isArray(value)) return `a list of ${value.length} item${value.length === 1 ? '' : 's'}`;
  if (typeof value === 'object') return 'an object';
  return `a ${typeof value}`;
}

const label = (path: string): string => (path === '' ? 'The design document' : path);

/** A problem whose message is "<path> is <value>; allowed: <allowed>." unless a sentence is given. */
export function problem(path: string, value: unknown, allowed: string, sentence?: string): Problem {
  const message = sentence ?? `${label(path)} is ${describeValue(value, unitOfPath(path))}; allowed: ${allowed}.`;
  return { path, value: compactValue(value), allowed, message };
}

/** Formats a number in the unit of a path for allowed ranges and sentences ("10.8 V", "25 °C"). */
export function inUnit(value: number, path: string): string {
  return formatEngineering(value, unitOfPath(path), 6);
}
