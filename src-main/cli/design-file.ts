/**
 * Loads the design a command names: reads the file, parses and validates it (migrating older versions),
 * and on failure prints every problem — its sentence, then path, value and allowed range — to stderr.
 */
import nodePath from 'node:path';
import type { Design, DesignNotice, Problem } from '../../shared-model/index.ts';
import { describeValue, parseDesignText, unitOfPath } from '../../shared-model/index.ts';
import type { CliIo } from './io.ts';

export type LoadedDesign = { ok: true; design: Design; notices: DesignNotice[]; name: string } | { ok: false };

export function formatProblem(p: Problem): string {
  const where = p.line === undefined ? '' : ` | line ${p.line}, column ${p.column ?? '?'}`;
  const label = p.fieldLabels?.[p.path];
  return `  - ${p.message}\n    ${label === undefined ? '' : `field: ${label} | `}path: ${p.path || '(whole document)'} | value: ${describeValue(p.value, unitOfPath(p.path))} | allowed: ${p.allowed}${where}`;
}

export async function loadDesign(path: string, io: CliIo, prefix: string): Promise<LoadedDesign> {
  const name = nodePath.basename(path);
  const read = await io.readText(path);
  if (!read.ok) {
    io.err(`${prefix}: ${read.message}`);
    return { ok: false };
  }
  const result = parseDesignText(read.text);
  if (!result.ok) {
    const n = result.problems.length;
    io.err(`${prefix}: "${name}" is not a usable WattLedger design (${n} problem${n === 1 ? '' : 's'}):\n${result.problems.map(formatProblem).join('\n')}`);
    return { ok: false };
  }
  return { ok: true, design: result.design, notices: result.warnings ?? [], name };
}

/** Notes on a valid design file, for the end of a table. */
export function formatNotices(notices: readonly DesignNotice[]): string {
  return notices.map((n) => `  - ${n.message}`).join('\n');
}
