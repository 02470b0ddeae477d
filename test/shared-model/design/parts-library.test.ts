/** The parts library document: version 2 with its id, migration from version 1, canonical text. */
import { describe, expect, it } from 'vitest';
import { DEMO_PARTS_LIBRARY, parsePartsLibraryText, PARTS_LIBRARY_VERSION, serializePartsLibrary, validatePartsLibrary } from '../../../shared-model/index.ts';
import { migratePartsLibrary } from '../../../shared-model/design/parts-library-migrate.ts';

const v2 = DEMO_PARTS_LIBRARY as { id: string; version: number; name: string };

describe('parts library versions', () => {
  it('reads a version 1 library (no id) as version 2, with an id made from its name and a notice', () => {
    const { id: _id, ...v1 } = { ...v2, version: 1 };
    const read = validatePartsLibrary(v1);
    expect(PARTS_LIBRARY_VERSION).toBe(2);
    expect(read.ok && read.library.id).toBe('wattledger-invented-demo-parts');
    expect(read.ok && read.library.version).toBe(2);
    expect(read.ok && read.notices.map((n) => n.path)).toEqual(['version', 'id']);
  });

  it('reads a bare list of parts (early exports) as a library', () => {
    const parts = (DEMO_PARTS_LIBRARY as { parts: unknown[] }).parts.slice(0, 2);
    const read = validatePartsLibrary(parts);
    expect(read.ok && read.library.parts).toEqual(parts);
    expect(read.ok && read.library.name).toBe('Imported parts');
  });

  it('refuses another format, a newer version and an id with spaces, naming the field', () => {
    expect(migratePartsLibrary({ format: 'wattledger.design', version: 1 })).toMatchObject({ ok: false, problems: [{ path: 'format' }] });
    const newer = validatePartsLibrary({ ...v2, version: 9 });
    expect(newer.ok ? '' : newer.problems[0]?.message).toBe('This parts library was made by a newer WattLedger: version 9, this build reads up to 2.');
    const spaced = validatePartsLibrary({ ...v2, id: 'team parts' });
    expect(spaced.ok ? [] : spaced.problems.map((p) => p.path)).toEqual(['id']);
  });

  it('writes the canonical text and reads it back to the same library', () => {
    const read = validatePartsLibrary(DEMO_PARTS_LIBRARY);
    if (!read.ok) throw new Error('demo invalid');
    const text = serializePartsLibrary(read.library);
    if (!text.ok) throw new Error('not serialisable');
    expect(text.text.endsWith('}\n')).toBe(true);
    expect(text.text.split('\n')[3]).toBe('  "id": "wattledger-invented-demo",'); // keys in schema order: format, version, id
    const back = parsePartsLibraryText(text.text);
    expect(back.ok && back.library).toEqual(read.library);
  });

  it('names the line and column of a JSON syntax error', () => {
    const read = parsePartsLibraryText('{\n  "format": "wattledger.parts",\n  "version": 2,,\n}');
    expect(read.ok ? null : [read.problems[0]?.line, read.problems[0]?.column]).toEqual([3, 16]); // RFC 8259: a value must follow ","
  });
});
