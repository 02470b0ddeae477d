/**
 * Version handling of the design document: checks the format tag, refuses documents from a newer
 * WattLedger, and migrates older versions step by step to the current one (design/schema.ts).
 *
 * Version 0 (the early shape, before the first release) differs from version 1 in four places:
 *   spec.fsHz            → spec.switchingFrequencyHz
 *   spec.loadA           → spec.ratedLoadA
 *   topology.deadTimeS   → topology.deadTimeBeforeOnS and topology.deadTimeAfterOffS (same value)
 *   thermal.customTouchLimits did not exist → [] (the shipped table is used)
 * The optional `topology.phases`, `topology.phaseMismatch` and `topology.phaseShedding` (issue 13 §1) were
 * added within version 1: absent, they mean one phase, no mismatch and no shedding, exactly the converter
 * an older file described, so they need no migration step (and its canonical text, and hash, are unchanged).
 * The optional `measurements` and `calibration` sections (issue 12) were added within version 1: a document
 * without them is unchanged, so they need no migration step; likewise the optional `missionProfile`
 * (issue 11 §4): a version-1 document without it reads as before and is evaluated at its rated point.
 * Migration does not validate: validateDesign() checks the result. It never modifies its input.
 */
import { DESIGN_FORMAT, DESIGN_VERSION } from './schema.ts';
import type { DesignNotice, Problem } from './problems.ts';
import { compactValue, describeValue, problem } from './problems.ts';

export type MigrationResult =
  | { ok: true; json: Record<string, unknown>; fromVersion: number; notes: DesignNotice[] }
  | { ok: false; problems: Problem[] };

type Json = Record<string, unknown>;
const isObject = (v: unknown): v is Json => typeof v === 'object' && v !== null && !Array.isArray(v);

function renameKey(parent: unknown, from: string, to: string, where: string, notes: DesignNotice[]): void {
  if (!isObject(parent) || !Object.hasOwn(parent, from)) return;
  if (!Object.hasOwn(parent, to)) parent[to] = parent[from];
  delete parent[from];
  notes.push({ path: `${where}.${to}`, value: compactValue(parent[to]), message: `${where}.${from} was renamed ${where}.${to}.` });
}

/** Version 0 → 1 (see the header). Works on a deep copy. */
function from0(doc: Json, notes: DesignNotice[]): Json {
  renameKey(doc.spec, 'fsHz', 'switchingFrequencyHz', 'spec', notes);
  renameKey(doc.spec, 'loadA', 'ratedLoadA', 'spec', notes);
  const topology = doc.topology;
  if (isObject(topology) && Object.hasOwn(topology, 'deadTimeS')) {
    const t = topology.deadTimeS;
    if (!Object.hasOwn(topology, 'deadTimeBeforeOnS')) topology.deadTimeBeforeOnS = t;
    if (!Object.hasOwn(topology, 'deadTimeAfterOffS')) topology.deadTimeAfterOffS = t;
    delete topology.deadTimeS;
    notes.push({
      path: 'topology.deadTimeBeforeOnS',
      value: compactValue(t),
      message: 'topology.deadTimeS was split into topology.deadTimeBeforeOnS and topology.deadTimeAfterOffS (same value).',
    });
  }
  if (isObject(doc.thermal) && !Object.hasOwn(doc.thermal, 'customTouchLimits')) doc.thermal.customTouchLimits = [];
  return { ...doc, version: 1 };
}

const STEPS: Readonly<Record<number, (doc: Json, notes: DesignNotice[]) => Json>> = { 0: from0 };

/** Checks `format` and `version` and brings an older document up to the current version. */
export function migrateDesign(json: unknown): MigrationResult {
  if (!isObject(json))
    return {
      ok: false,
      problems: [problem('', json, 'a JSON object', `The design document is ${describeValue(json)}; it must be a JSON object.`)],
    };
  const problems: Problem[] = [];
  if (json.format !== DESIGN_FORMAT)
    problems.push(
      problem('format', json.format, JSON.stringify(DESIGN_FORMAT),
        `format is ${describeValue(json.format)}; a WattLedger design says "format": "${DESIGN_FORMAT}" (is this a design file?).`),
    );
  const version = json.version;
  if (typeof version !== 'number' || !Number.isInteger(version) || version < 0)
    problems.push(problem('version', version, `a whole number from 0 to ${DESIGN_VERSION}`));
  else if (version > DESIGN_VERSION)
    problems.push(
      problem('version', version, `0 to ${DESIGN_VERSION}`,
        `This design was made by a newer WattLedger: version ${version}, this build reads up to ${DESIGN_VERSION}. Update WattLedger to open it.`),
    );
  if (problems.length > 0 || typeof version !== 'number') return { ok: false, problems };
  let doc = structuredCloneJson(json);
  const notes: DesignNotice[] = [];
  for (let v = version; v < DESIGN_VERSION; v += 1) {
    const step = STEPS[v];
    if (!step) return { ok: false, problems: [problem('version', version, `0 to ${DESIGN_VERSION}`)] };
    doc = step(doc, notes);
  }
  if (version < DESIGN_VERSION)
    notes.unshift({ path: 'version', value: version, message: `Migrated from version ${version} to ${DESIGN_VERSION}; saving writes version ${DESIGN_VERSION}.` });
  return { ok: true, json: doc, fromVersion: version, notes };
}

/** Deep copy of plain JSON data to the depth migrations touch (deeper values are shared, never edited). */
function structuredCloneJson(doc: Json): Json {
  const copy = (v: unknown, depth: number): unknown => {
    if (depth > 8) return v;
    if (Array.isArray(v)) return v.map((x) => copy(x, depth + 1));
    if (isObject(v)) return Object.fromEntries(Object.entries(v).map(([k, x]) => [k, copy(x, depth + 1)]));
    return v;
  };
  return copy(doc, 0) as Json;
}
