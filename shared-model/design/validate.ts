/**
 * validateDesign: the one gate every design passes before the engine sees it.
 * Steps: format and version (migrating older documents), the zod schema (types and ranges of every
 * field), then the cross-field rules (rules-spec, rules-parts, rules-thermal, mission/rules.ts, and rules-validity: where
 * the models stop meaning anything) on the same input, so one call reports every problem. Never throws, whatever the input (NaN, Infinity, wrong types, null...).
 */
import { designSchema } from './schema.ts';
import type { Design } from './schema.ts';
import { migrateDesign } from './migrate.ts';
import type { DesignNotice, Problem } from './problems.ts';
import { designNotices, ignoredKeys } from './notices.ts';
import { partRules } from './rules-parts.ts';
import { specificationRules } from './rules-spec.ts';
import { thermalRules } from './rules-thermal.ts';
import { validityRules } from './rules-validity.ts';
import { missionRules } from '../mission/rules.ts';
import { problemsFromZod } from './zod-problems.ts';
import { labelProblems } from './labelled-problems.ts';

export type DesignValidation =
  | { ok: true; design: Design; warnings?: DesignNotice[] }
  | { ok: false; problems: Problem[] };

/** Cross-field problems of a (possibly invalid) document at the current version. */
export function crossFieldProblems(doc: unknown): Problem[] {
  return [...specificationRules(doc), ...partRules(doc), ...thermalRules(doc), ...validityRules(doc), ...missionRules(doc)];
}

/** Stands in for a value the schema refused: present (not "missing"), but of no usable type. */
const REFUSED = Object.freeze({ refused: true });

/**
 * A copy of `doc` with the values the schema refused replaced by REFUSED, so cross-field rules never
 * reason from a value that already has its own problem (a refused −5 V is not also "below vinMinV", a
 * refused part is not also "missing").
 */
function withoutRefused(doc: unknown, paths: readonly (readonly PropertyKey[])[]): unknown {
  if (paths.length === 0) return doc;
  const copy = (v: unknown, depth: number): unknown => {
    if (depth > 12 || v === null || typeof v !== 'object') return v;
    if (Array.isArray(v)) return v.map((x) => copy(x, depth + 1));
    return Object.fromEntries(Object.entries(v).map(([k, x]) => [k, copy(x, depth + 1)]));
  };
  const clean = copy(doc, 0);
  for (const path of paths) {
    if (path.length === 0) continue;
    let parent: unknown = clean;
    for (const key of path.slice(0, -1)) parent = parent !== null && typeof parent === 'object' ? (parent as Record<PropertyKey, unknown>)[key] : undefined;
    if (parent !== null && typeof parent === 'object') (parent as Record<PropertyKey, unknown>)[path[path.length - 1] as PropertyKey] = REFUSED;
  }
  return clean;
}

function unique(problems: Problem[]): Problem[] {
  const seen = new Set<string>();
  return problems.filter((p) => {
    const key = `${p.path}\u0000${p.message}`;
    if (seen.has(key)) return false;
    seen.add(key);
    return true;
  });
}

/** Checks a parsed JSON value as a WattLedger design; returns the typed design or every problem. */
export function validateDesign(json: unknown): DesignValidation {
  const migrated = migrateDesign(json);
  if (!migrated.ok) return { ok: false, problems: migrated.problems };
  const doc = migrated.json;
  const parsed = designSchema.safeParse(doc);
  const problems = parsed.success ? [] : problemsFromZod(parsed.error.issues, designSchema, doc);
  const refused = parsed.success ? [] : parsed.error.issues.map((issue) => issue.path);
  problems.push(...crossFieldProblems(withoutRefused(doc, refused)));
  if (problems.length > 0 || !parsed.success) return { ok: false, problems: labelProblems(unique(problems), doc) };
  const warnings = [...migrated.notes, ...ignoredKeys(doc, parsed.data), ...designNotices(parsed.data)];
  return warnings.length > 0 ? { ok: true, design: parsed.data, warnings } : { ok: true, design: parsed.data };
}
