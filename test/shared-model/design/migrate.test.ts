import { describe, expect, it } from 'vitest';
import { DESIGN_VERSION, validateDesign } from '../../../shared-model/index.ts';
import { migrateDesign } from '../../../shared-model/design/migrate.ts';
import versionZero from './fixtures/synchronous-buck.v0.json';
import { demo } from './fixtures.ts';

const withoutNotes = (doc: Record<string, unknown>): Record<string, unknown> => ({ ...doc, notes: '' });

describe('migrateDesign brings a version 0 document to version 1', () => {
  it('renames fsHz and loadA, splits deadTimeS, adds an empty customTouchLimits', () => {
    const r = migrateDesign(versionZero);
    if (!r.ok) throw new Error(JSON.stringify(r.problems));
    expect(r.fromVersion).toBe(0);
    // The v0 fixture was written from the v1 demo by the inverse renames (fixtures/synchronous-buck.v0.json).
    expect(withoutNotes(r.json)).toEqual(withoutNotes(demo('synchronous-buck')));
    expect(r.notes.map((n) => n.path)).toEqual([
      'version',
      'spec.switchingFrequencyHz',
      'spec.ratedLoadA',
      'topology.deadTimeBeforeOnS',
    ]);
  });

  it('does not change the document it was given', () => {
    const before = JSON.stringify(versionZero);
    migrateDesign(versionZero);
    expect(JSON.stringify(versionZero)).toBe(before);
  });

  it('lets validateDesign open a version 0 file, with a notice that it was migrated', () => {
    const r = validateDesign(versionZero);
    if (!r.ok) throw new Error(JSON.stringify(r.problems));
    expect(r.design.version).toBe(DESIGN_VERSION);
    expect(r.design.spec.switchingFrequencyHz).toBe(versionZero.spec.fsHz);
    expect(r.design.topology.deadTimeAfterOffS).toBe(versionZero.topology.deadTimeS);
    expect(r.warnings?.[0]?.message).toBe('Migrated from version 0 to 1; saving writes version 1.');
  });

  it('reports problems of a migrated file under their version 1 names', () => {
    const broken = { ...structuredClone(versionZero), spec: { ...versionZero.spec, fsHz: -1 } };
    const r = validateDesign(broken);
    expect(r.ok ? [] : r.problems.map((p) => p.path)).toContain('spec.switchingFrequencyHz');
  });
});

describe('migrateDesign refuses what it cannot read', () => {
  it('refuses a newer version with a clear message', () => {
    const r = migrateDesign({ format: 'wattledger.design', version: 5 });
    expect(r.ok ? '' : r.problems[0]?.message).toBe(
      'This design was made by a newer WattLedger: version 5, this build reads up to 1. Update WattLedger to open it.',
    );
  });

  it.each([
    [{ format: 'wattledger.parts', version: 1 }, 'format'], // a parts library is not a design
    [{ format: 'wattledger.design', version: 1.5 }, 'version'], // versions are whole numbers
    [{ format: 'wattledger.design', version: -1 }, 'version'],
    [{ format: 'wattledger.design', version: '1' }, 'version'], // a version is a number, not text
    [{ version: 1 }, 'format'],
  ])('refuses %j at %s', (json, path) => {
    const r = migrateDesign(json);
    expect(r.ok ? [] : r.problems.map((p) => p.path)).toEqual([path]);
  });
});
