import { describe, expect, it } from 'vitest';
import { DESIGN_VERSION } from '../../../shared-model/index.ts';
import { designText, readDesignText, readRecoveryText, recoveryText, suggestFileName } from '../../../src-renderer/state/design-file.ts';
import { demoDesign, demoText } from '../../helpers/demo.ts';

describe('reading design files', () => {
  it('accepts the shipped demo unchanged', () => {
    const read = readDesignText(demoText(), 'demo.json');
    expect(read.ok).toBe(true);
    if (read.ok) expect(read.design).toEqual(demoDesign()); // engine's validateDesign on the same file
  });

  it('refuses text that is not JSON, naming the file and saying nothing changed', () => {
    const read = readDesignText(demoText().slice(0, 200), 'cut.json');
    expect(read.ok).toBe(false);
    if (!read.ok) {
      expect(read.message).toMatch(/^cut\.json could not be opened: it is not a readable design file/); // rule 6: clear message naming the file
      expect(read.message).toContain('unchanged');
      expect(read.details.join(' ')).toMatch(/line \d+, column \d+/); // shared-model parseDesignText gives the position
    }
  });

  it('refuses a newer version with its own sentence', () => {
    const newer = JSON.stringify({ ...JSON.parse(demoText()), version: DESIGN_VERSION + 1 });
    const read = readDesignText(newer, 'new.json');
    expect(read.ok).toBe(false);
    if (!read.ok) expect(read.message).toContain('newer version of WattLedger'); // issue 2 §2: a newer one is refused with a clear message
  });

  it('refuses a file of another kind', () => {
    const read = readDesignText(JSON.stringify({ format: 'something.else', version: 1 }), 'other.json');
    expect(read.ok).toBe(false);
    if (!read.ok) expect(read.message).toContain('not a WattLedger design');
  });

  it('lists every invalid field with the engine sentence', () => {
    const json = JSON.parse(demoText());
    json.spec.switchingFrequencyHz = -1;
    json.parts.inductor.dcr20Ohm = 0;
    const read = readDesignText(JSON.stringify(json), 'bad.json');
    expect(read.ok).toBe(false);
    if (!read.ok) {
      expect(read.message).toContain('2 fields are invalid');
      expect(read.details.some((d) => d.includes('spec.switchingFrequencyHz'))).toBe(true); // rule 6: names the field
      expect(read.details.some((d) => d.includes('parts.inductor.dcr20Ohm'))).toBe(true);
    }
  });
});

describe('writing design files', () => {
  it('writes text that reads back as the same design', () => {
    const written = designText(demoDesign());
    expect(written.ok).toBe(true);
    if (written.ok) {
      const read = readDesignText(written.text, 'x.json');
      expect(read.ok && read.design).toEqual(demoDesign());
    }
  });

  it('refuses to write a non-finite number', () => {
    const design = demoDesign();
    const written = designText({ ...design, spec: { ...design.spec, voutV: Number.NaN } });
    expect(written.ok).toBe(false); // issue 2 §2: non-finite numbers are refused on save
  });

  it('suggests a safe file name', () => {
    expect(suggestFileName('Untitled design', 'Rail 3V3: main/aux')).toBe('Rail 3V3 main aux.json');
    expect(suggestFileName('kept.json', 'anything')).toBe('kept.json');
  });
});

describe('recovery snapshots', () => {
  it('round-trips the draft with its file name, even when the draft is invalid', () => {
    const design = demoDesign();
    const draft = { ...design, spec: { ...design.spec, voutV: -1 } };
    const back = readRecoveryText(recoveryText({ fileName: 'a.json', filePath: '/tmp/a.json', design: draft }));
    expect(back).toEqual({ fileName: 'a.json', filePath: '/tmp/a.json', design: draft });
  });

  it('ignores anything that is not a snapshot', () => {
    expect(readRecoveryText('not json')).toBeNull();
    expect(readRecoveryText(demoText())).toBeNull();
  });
});

describe('the app writes the canonical text (issue 15 §3: the same design hashes the same by every route)', () => {
  it('opening a shipped demo and saving it unchanged writes the file byte for byte', async () => {
    const { readFileSync } = await import('node:fs');
    for (const id of ['synchronous-buck', 'diode-boost', 'hot-fin-buck']) {
      const file = readFileSync(new URL(`../../../assets/designs/${id}.json`, import.meta.url), 'utf8');
      const opened = readDesignText(file, `${id}.json`);
      expect(opened.ok).toBe(true);
      if (opened.ok) expect(designText(opened.design)).toEqual({ ok: true, text: file });
    }
  });
});
