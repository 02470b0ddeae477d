/**
 * Reading and writing design files. Opening never changes the open document unless the whole file is
 * good: not JSON, not a WattLedger design, a newer version, or any invalid field gives a message naming
 * the file and the reason, with the engine's sentences (field, value found, allowed range) as details,
 * and the caller keeps the current design. Older versions are migrated by the engine.
 * Recovery snapshots wrap the draft with its file name so a restore can say what it restores.
 */
import { DESIGN_FORMAT, DESIGN_VERSION, parseDesignText, serializeDesign } from '../../shared-model/index.ts';
import type { Design } from '../../shared-model/index.ts';

export type DesignRead =
  | { ok: true; design: Design; notes: string[] }
  | { ok: false; message: string; details: string[] };

const UNCHANGED = 'Your current design is unchanged.';

/** Reads a design file's text; only a wholly valid design of a version this build reads is accepted. */
export function readDesignText(text: string, fileName: string): DesignRead {
  const read = parseDesignText(text);
  if (read.ok) return { ok: true, design: read.design, notes: (read.warnings ?? []).map((n) => n.message) };
  const details = read.problems.map((p) => p.message);
  const whole = read.problems.find((p) => p.path === '');
  const version = read.problems.find((p) => p.path === 'version');
  const format = read.problems.find((p) => p.path === 'format');
  let reason: string;
  if (whole) reason = 'it is not a readable design file (damaged, cut short or not JSON)';
  else if (version && typeof version.value === 'number' && version.value > DESIGN_VERSION) reason = 'it was written by a newer version of WattLedger';
  else if (format) reason = 'it is not a WattLedger design';
  else if (version) reason = 'its version number is not one this WattLedger reads';
  else reason = `${details.length} field${details.length === 1 ? ' is' : 's are'} invalid`;
  return { ok: false, message: `${fileName} could not be opened: ${reason}. ${UNCHANGED}`, details };
}

/** The file text of a design, or the problems that stop it from being written (non-finite numbers). */
export function designText(design: Design): { ok: true; text: string } | { ok: false; details: string[] } {
  const written = serializeDesign(design);
  return written.ok ? written : { ok: false, details: written.problems.map((p) => p.message) };
}

/** A file name for saving: the current one, or the design name made safe for a file system. */
export function suggestFileName(fileName: string, designName: string): string {
  if (fileName.toLowerCase().endsWith('.json')) return fileName;
  const printable = [...designName].map((c) => (c.charCodeAt(0) < 32 ? ' ' : c)).join('');
  const base = printable.replace(/[\\/:*?"<>|]+/g, ' ').replace(/\s+/g, ' ').trim().slice(0, 100) || 'design';
  return `${base}.json`;
}

const RECOVERY_KIND = 'wattledger.recovery';

export interface Recovered {
  fileName: string;
  filePath: string | null;
  design: Design;
}

export function recoveryText(recovered: Recovered): string {
  return JSON.stringify({ kind: RECOVERY_KIND, ...recovered });
}

/**
 * Reads a recovery snapshot. The draft is returned even when it fails validation (it was written by
 * this app from a draft that was being edited, and losing it would lose work); the editor then shows
 * the problems in place. Anything else unreadable gives null.
 */
export function readRecoveryText(text: string): Recovered | null {
  try {
    const json = JSON.parse(text) as Partial<Recovered> & { kind?: unknown };
    if (json.kind !== RECOVERY_KIND || typeof json.fileName !== 'string' || !json.design) return null;
    const design = json.design as { format?: unknown; version?: unknown };
    if (design.format !== DESIGN_FORMAT || design.version !== DESIGN_VERSION) return null;
    return { fileName: json.fileName, filePath: typeof json.filePath === 'string' ? json.filePath : null, design: json.design as Design };
  } catch {
    return null;
  }
}
