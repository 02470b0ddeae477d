/**
 * The canonical text of a design (shared-model/design/canonical.ts): every route that writes a design
 * writes the same bytes, so the report's design hash is reproducible (issue 15 §3).
 */
import { readFileSync } from 'node:fs';
import { createHash } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { DEMO_DESIGNS, parseDesignText, serializeDesign } from '../../../shared-model/index.ts';
import { sha256Hex } from '../../../shared-model/report/sha256.ts';

const demoFile = (id: string): string => readFileSync(new URL(`../../../assets/designs/${id}.json`, import.meta.url), 'utf8');

/** Reverses every object's keys, recursively: the same design with a different key order. */
const reversed = (v: unknown): unknown =>
  Array.isArray(v) ? v.map(reversed) : v !== null && typeof v === 'object' ? Object.fromEntries(Object.entries(v).reverse().map(([k, x]) => [k, reversed(x)])) : v;

/** Writes numbers the way other tools do (2e-08, 1.0) — same values, different text. */
const otherNumberStyle = (text: string): string => text.replace(/(\d)e-(\d)(?=[,\n])/g, '$1e-0$2').replace(/"rgInternalOhm": 1,/, '"rgInternalOhm": 1.0,');

describe('canonical design text', () => {
  for (const demo of DEMO_DESIGNS) {
    it(`${demo.id}: the shipped file is already canonical (its sha256sum is the report's hash)`, () => {
      const text = demoFile(demo.id);
      const read = parseDesignText(text);
      expect(read.ok).toBe(true);
      if (!read.ok) return;
      const written = serializeDesign(read.design);
      expect(written.ok && written.text).toBe(text);
      expect(sha256Hex(text)).toBe(createHash('sha256').update(readFileSync(new URL(`../../../assets/designs/${demo.id}.json`, import.meta.url))).digest('hex')); // Node crypto (OpenSSL) on the file bytes
    });
  }

  it('does not depend on key order, number spelling or indentation in the file it was read from', () => {
    const text = demoFile('synchronous-buck');
    const variants = [JSON.stringify(reversed(JSON.parse(text))), otherNumberStyle(text), JSON.stringify(JSON.parse(text), null, '\t')];
    expect(otherNumberStyle(text)).not.toBe(text); // the variant really differs byte-wise
    for (const variant of variants) {
      const read = parseDesignText(variant);
      expect(read.ok).toBe(true);
      if (read.ok) expect(serializeDesign(read.design)).toEqual({ ok: true, text });
    }
  });

  it('writes a key named "__proto__" of an invalid draft as an ordinary key, sorted after the known ones', () => {
    const draft = JSON.parse('{"zeta": 1, "__proto__": {"polluted": true}, "format": "wattledger.design"}') as unknown;
    const written = serializeDesign(draft);
    expect(written.ok && written.text).toBe('{\n  "format": "wattledger.design",\n  "__proto__": {\n    "polluted": true\n  },\n  "zeta": 1\n}\n'); // RFC 8785 §3.2.3 order (UTF-16 code units) for unknown keys
    expect(({} as Record<string, unknown>)['polluted']).toBeUndefined();
  });
});
