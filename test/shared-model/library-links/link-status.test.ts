/**
 * Issue 17, done-when: a design whose library is gone still opens and evaluates; a changed library entry
 * is reported, field by field, and one action updates it. Parts and libraries are invented.
 */
import { describe, expect, it } from 'vitest';
import { evaluate, linkStatus, parseDesignText, serializeDesign, takeLibraryPart, unlinkPart, updateFromLibrary, validatePartsLibrary, DEMO_PARTS_LIBRARY, type Design, type PartsLibrary } from '../../../shared-model/index.ts';
import { partDifferences } from '../../../shared-model/library-links/link-status.ts';
import { demoDesign } from '../../helpers/demo.ts';

function library(): PartsLibrary {
  const checked = validatePartsLibrary(DEMO_PARTS_LIBRARY);
  if (!checked.ok) throw new Error('demo library invalid');
  return { ...checked.library, id: 'team-approved', name: 'Team approved parts (invented)' };
}

function linked(): { design: Design; lib: PartsLibrary } {
  const lib = library();
  const design = takeLibraryPart(demoDesign('synchronous-buck'), 'switch', lib, 'nfet-30v-8m');
  if (!design) throw new Error('no such part');
  return { design, lib };
}

describe('design links to library parts', () => {
  it('takes a library part as a copy and names the entry it came from', () => {
    const { design, lib } = linked();
    expect(design.parts.switch).toEqual(lib.parts.find((p) => p.id === 'nfet-30v-8m'));
    expect(design.sources).toEqual({ switch: { libraryId: 'team-approved', libraryName: 'Team approved parts (invented)', partId: 'nfet-30v-8m' } });
    expect(linkStatus(design, [lib]).map((l) => l.state)).toEqual(['same']);
  });

  it('saves the link in the design file and reads it back', () => {
    const { design } = linked();
    const text = serializeDesign(design);
    if (!text.ok) throw new Error('not serialisable');
    const back = parseDesignText(text.text);
    expect(back.ok && back.design.sources).toEqual(design.sources);
  });

  it('opens and evaluates a design whose library is gone, and says the library is not open', () => {
    const { design } = linked();
    const text = serializeDesign(design);
    if (!text.ok) throw new Error('not serialisable');
    const back = parseDesignText(text.text);
    if (!back.ok) throw new Error(back.problems.map((p) => p.message).join(' '));
    const links = linkStatus(back.design, []);
    expect(links).toEqual([expect.objectContaining({ role: 'switch', state: 'library-missing' })]);
    expect(links[0]?.message).toBe('The library "Team approved parts (invented)" is not open; the design uses its own copy of nfet-30v-8m.');
    const result = evaluate(back.design);
    expect(result.converged).toBe(true);
    expect(result.inputPower).toBeCloseTo(result.outputPower + result.totalLoss, 6); // energy balance (first law)
  });

  it('reports a changed library entry by field, with both values, and updates it in one action', () => {
    const { design, lib } = linked();
    const changed: PartsLibrary = {
      ...lib,
      parts: lib.parts.map((p) => (p.id === 'nfet-30v-8m' && p.kind === 'mosfet' ? { ...p, rdsOn25Ohm: 0.0075, rdsTemperatureLaw: { law: 'linear', alphaPerK: 0.005 } } : p)),
    };
    const [link] = linkStatus(design, [changed]);
    expect(link?.state).toBe('differs');
    expect(link?.differences).toEqual([
      { path: 'rdsOn25Ohm', label: 'RDS(on) at 25 °C', design: 0.008, library: 0.0075 },
      { path: 'rdsTemperatureLaw.alphaPerK', label: 'RDS(on) coefficient α', design: 0.0045, library: 0.005 },
    ]);
    expect(link?.message).toContain('differs in RDS(on) at 25 °C, RDS(on) coefficient α');
    const updated = updateFromLibrary(design, 'switch', changed);
    expect(updated && linkStatus(updated, [changed]).map((l) => l.state)).toEqual(['same']);
    expect(updated?.parts.switch).toMatchObject({ rdsOn25Ohm: 0.0075 });
    expect(design.parts.switch).toMatchObject({ rdsOn25Ohm: 0.008 }); // the input record is untouched
  });

  it('says when the library no longer has the part, and unlinks without changing values', () => {
    const { design, lib } = linked();
    const without = { ...lib, parts: lib.parts.filter((p) => p.id !== 'nfet-30v-8m') };
    expect(linkStatus(design, [without]).map((l) => l.state)).toEqual(['part-missing']);
    expect(updateFromLibrary(design, 'switch', without)).toBeUndefined();
    const plain = unlinkPart(design, 'switch');
    expect(plain.sources).toBeUndefined();
    expect(plain.parts.switch).toEqual(design.parts.switch);
  });

  it('links a capacitor bank by its part, keeping the count', () => {
    const lib = library();
    const cap = lib.parts.find((p) => p.kind === 'capacitor');
    const base = demoDesign('synchronous-buck');
    const design = cap ? takeLibraryPart(base, 'outputCapacitor', lib, cap.id) : undefined;
    expect(design?.parts.outputCapacitor.count).toBe(base.parts.outputCapacitor.count);
    expect(design?.parts.outputCapacitor.part).toEqual(cap);
  });

  it('lists no difference between a part and its copy', () => {
    const lib = library();
    const part = lib.parts[0];
    if (!part) throw new Error('empty library');
    expect(partDifferences(part, JSON.parse(JSON.stringify(part)))).toEqual([]);
  });
});
