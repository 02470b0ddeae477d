import { describe, expect, it } from 'vitest';
import { validatePartsLibrary } from '../../../shared-model/index.ts';
import { duplicatePart, libraryFileText, mergeParts, readLibraryText, uniqueId } from '../../../src-renderer/state/library-data.ts';
import { demoParts } from '../../helpers/demo.ts';

describe('part library data', () => {
  it('exports a document the engine accepts as a parts library', () => {
    const check = validatePartsLibrary(JSON.parse(libraryFileText(demoParts())));
    expect(check.ok).toBe(true); // shared-model/design/parts-library.ts schema
    if (check.ok) expect(check.library.parts).toEqual(demoParts());
  });

  it('imports an export, and a bare list of parts', () => {
    const read = readLibraryText(libraryFileText(demoParts()), 'lib.json');
    expect(read.ok && read.parts).toEqual(demoParts());
    const bare = readLibraryText(JSON.stringify(demoParts().slice(0, 2)), 'two.json');
    expect(bare.ok && bare.parts.length).toBe(2);
  });

  it('leaves out invalid parts and says which field of which entry is wrong', () => {
    const parts = demoParts().slice(0, 3) as unknown as Record<string, unknown>[];
    const broken = [{ ...parts[0], rdsOn25Ohm: -1 }, parts[1], parts[2]];
    const read = readLibraryText(JSON.stringify(broken), 'x.json');
    expect(read.ok).toBe(true);
    if (read.ok) {
      expect(read.parts).toHaveLength(2);
      expect(read.skipped.join(' ')).toContain('part 1: rdsOn25Ohm is -1'); // rule 6: the engine sentence names field and value
    }
  });

  it('refuses a file that is not JSON or from a newer version', () => {
    const notJson = readLibraryText('{', 'x.json');
    expect(notJson.ok).toBe(false);
    const newer = readLibraryText(JSON.stringify({ format: 'wattledger.parts', version: 99, parts: [] }), 'n.json');
    expect(newer.ok).toBe(false);
    if (!newer.ok) expect(newer.message).toContain('version 99');
  });

  it('gives duplicates and imports fresh ids so nothing is overwritten', () => {
    expect(uniqueId('a', new Set(['a', 'a-2']))).toBe('a-3');
    const parts = demoParts();
    const copy = duplicatePart(parts[0]!, parts);
    expect(copy.id).not.toBe(parts[0]!.id);
    expect(copy.name).toBe(`${parts[0]!.name} (copy)`);
    const merged = mergeParts(parts, [parts[0]!]);
    expect(new Set(merged.map((p) => p.id)).size).toBe(merged.length);
  });
});
