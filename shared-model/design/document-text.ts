/**
 * The design document as text: parse (JSON → validated design) and serialise (design → JSON text).
 * JSON has no NaN or Infinity, and JSON.parse reads an overflowing literal such as 1e999 as Infinity;
 * both directions refuse non-finite numbers with a Problem instead of writing null or losing a field.
 * Reading reports a key repeated in one object (JSON.parse keeps the last) as a notice with its line.
 * Serialising writes the canonical text (design/canonical.ts): the same design always gives the same
 * bytes, whichever route wrote it. It does not require a valid design (a half-finished design may be
 * saved), only one that JSON can represent exactly.
 */
import { canonicalOrder } from './canonical.ts';
import { duplicateKeys } from './json-keys.ts';
import { findJsonSyntaxError, lineColumn } from './json-position.ts';
import { designSchema } from './schema.ts';
import type { DesignNotice } from './problems.ts';
import type { Problem } from './problems.ts';
import { describeValue, pathToString, problem } from './problems.ts';
import type { DesignValidation } from './validate.ts';
import { validateDesign } from './validate.ts';

/** Reads a design from JSON text: syntax errors come back with line and column. Never throws. */
export function parseDesignText(text: string): DesignValidation {
  if (typeof text !== 'string') return { ok: false, problems: [problem('', text, 'JSON text', 'The design must be given as JSON text.')] };
  const body = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  if (body.trim() === '')
    return { ok: false, problems: [{ ...problem('', '', 'a JSON object', 'The design file is empty; it must hold a JSON object.'), line: 1, column: 1 }] };
  let json: unknown;
  try {
    json = JSON.parse(body);
  } catch {
    const where = findJsonSyntaxError(body);
    if (!where)
      return { ok: false, problems: [problem('', undefined, 'JSON text (RFC 8259)', 'The design file is not valid JSON.')] };
    const lineText = body.split('\n')[where.line - 1] ?? '';
    const excerpt = lineText.trim().slice(0, 60);
    const message = `The design file is not valid JSON at line ${where.line}, column ${where.column}: ${where.reason} (line reads: ${excerpt}).`;
    return { ok: false, problems: [{ ...problem('', excerpt, 'JSON text (RFC 8259)', message), line: where.line, column: where.column }] };
  }
  const validation = validateDesign(json);
  if (!validation.ok) {
    // A problem with the whole document (not an object, say) points at where its value starts.
    const start = lineColumn(body, body.length - body.trimStart().length);
    return { ok: false, problems: validation.problems.map((p) => (p.path === '' && p.line === undefined ? { ...p, ...start } : p)) };
  }
  const repeated: DesignNotice[] = duplicateKeys(body).map((d) => ({
    path: d.path,
    value: d.key,
    line: d.line,
    message: `${d.path} appears more than once in the file (line ${d.firstLine} and line ${d.line}); the last one (line ${d.line}) was used.`,
  }));
  const warnings = [...repeated, ...(validation.warnings ?? [])];
  return warnings.length > 0 ? { ...validation, warnings } : validation;
}

/** Every value JSON cannot hold exactly: NaN, ±Infinity, undefined in lists, functions, bigints, cycles. */
export function unrepresentable(value: unknown): Problem[] {
  const out: Problem[] = [];
  const seen = new Set<object>();
  const walk = (v: unknown, path: (string | number)[], inList: boolean): void => {
    const where = pathToString(path);
    if (path.length > 200) {
      out.push(problem(where, 'deep', 'at most 200 levels of nesting', `${where} is nested more than 200 levels deep.`));
      return;
    }
    if (typeof v === 'number') {
      if (!Number.isFinite(v)) out.push(problem(where, v, 'a finite number', `${where || 'The value'} is ${describeValue(v)}; JSON can only store finite numbers.`));
    } else if (typeof v === 'bigint' || typeof v === 'function' || typeof v === 'symbol' || (inList && v === undefined)) {
      out.push(problem(where, typeof v, 'a number, text, true/false, null, list or object', `${where || 'The value'} is ${typeof v === 'undefined' ? 'undefined' : `a ${typeof v}`}, which JSON cannot store.`));
    } else if (typeof v === 'object' && v !== null) {
      if (seen.has(v)) {
        out.push(problem(where, 'cycle', 'a tree without cycles', `${where || 'The value'} refers back to itself; JSON cannot store a cycle.`));
        return;
      }
      seen.add(v);
      if (Array.isArray(v)) v.forEach((x, i) => walk(x, [...path, i], true));
      else for (const [k, x] of Object.entries(v)) walk(x, [...path, k], false);
      seen.delete(v);
    }
  };
  walk(value, [], false);
  return out;
}

/**
 * Writes a design as its canonical text (design/canonical.ts: a valid design after validation, keys in
 * schema order, two-space indent, shortest round-trip numbers, final newline), or returns why it cannot.
 * Never throws.
 */
export function serializeDesign(design: unknown): { ok: true; text: string } | { ok: false; problems: Problem[] } {
  const problems = unrepresentable(design);
  if (problems.length > 0) return { ok: false, problems };
  const checked = validateDesign(design);
  return { ok: true, text: `${JSON.stringify(canonicalOrder(checked.ok ? checked.design : design, designSchema), null, 2)}\n` };
}
