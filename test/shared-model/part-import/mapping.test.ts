/** Guessing, checking, saving and reusing a mapping from columns to part fields. */
import { describe, expect, it } from 'vitest';
import { checkMapping, guessMapping, mappingDocument, partMappingSchema, PART_FIELDS, reuseMapping } from '../../../shared-model/index.ts';

describe('guessMapping', () => {
  it('maps every field label back to its own field (an exported header names one field)', () => {
    const labels = PART_FIELDS.map((f) => f.label);
    expect(new Set(labels).size).toBe(labels.length);
    expect(guessMapping(labels).columns.map((c) => c.field)).toEqual(PART_FIELDS.map((f) => f.path));
  });

  it('matches trade spellings whatever their case and punctuation, and keeps the unit', () => {
    const m = guessMapping(['RDS_ON (mΩ)', 'qg total, nC', 'VGS(TH)', 'Rth(j-c) [K/W]', 'Comments'], 'mosfet');
    expect(m.columns.map((c) => [c.field, c.unit])).toEqual([['rdsOn25Ohm', 'mΩ'], ['qgC', 'nC'], ['vthV', ''], ['thetaJcKPerW', 'K/W'], ['notes', '']]);
  });

  it('passes over a reading whose unit does not fit the field, and leaves unknown headers unmapped', () => {
    const m = guessMapping(['Qg (V)', 'Colour', 'DCR (mOhm)'], 'inductor');
    expect(m.columns.map((c) => c.field)).toEqual([null, null, 'dcr20Ohm']);
  });

  it('uses the kind to tell shared spellings apart ("Qrr")', () => {
    expect(guessMapping(['Qrr (nC)'], 'diode').columns[0]?.field).toBe('qrrC');
    expect(guessMapping(['Qrr (nC)'], 'mosfet').columns[0]?.field).toBe('bodyDiodeQrrC');
  });

  it('does not give one field to two columns', () => {
    const m = guessMapping(['ESR', 'ESR max'], 'capacitor');
    expect(m.columns.map((c) => c.field)).toEqual(['esrOhm', null]);
  });
});

describe('checkMapping', () => {
  it('names a field given twice, a unit of another quantity and a required field nothing gives', () => {
    const mapping = mappingDocument({
      kind: 'resistor',
      columns: [
        { header: 'Name', field: 'name', unit: '' },
        { header: 'R', field: 'resistanceOhm', unit: 'mOhm' },
        { header: 'R2', field: 'resistanceOhm', unit: '' },
        { header: 'P', field: 'powerRatingW', unit: 'mA' },
        { header: 'TCR', field: 'tempCoPerK', unit: 'ppm/K' },
        { header: 'Knee', field: 'deratingStartC', unit: '' },
      ],
      fixed: [{ field: 'zeroPowerC', text: '400' }],
    });
    expect(checkMapping(mapping).map((p) => p.message)).toEqual([
      'column "R2" and column "R" both give Resistance; leave one of them out.',
      'column "P": "mA" is not a unit of Power rating (W); allowed: W with an SI prefix where it takes one.',
      'The fixed value of Zero power at: "400" reads as 400 °C; allowed: 40 °C ≤ Zero power at ≤ 300 °C.',
    ]);
    // Without the last four columns: the bad fixed value, then each required resistor field nothing gives.
    expect(checkMapping({ ...mapping, columns: mapping.columns.slice(0, 2) }).map((p) => p.field)).toEqual(['zeroPowerC', 'tempCoPerK', 'powerRatingW', 'deratingStartC']);
  });

  it('asks for a kind when no column gives one', () => {
    expect(checkMapping(mappingDocument({ columns: [], fixed: [] })).map((p) => p.message)).toEqual(['Choose the kind of part, or map a column to Kind.']);
  });
});

describe('saved mappings', () => {
  it('reuses a saved mapping by header and guesses the new headers', () => {
    const saved = partMappingSchema.parse(JSON.parse(JSON.stringify(mappingDocument({
      kind: 'capacitor',
      columns: [{ header: 'Our ESR column', field: 'esrOhm', unit: 'mOhm' }, { header: 'Cap', field: 'capacitanceF', unit: 'uF' }],
      fixed: [{ field: 'dielectric', text: 'ceramic' }],
    }))));
    const reused = reuseMapping(['our esr column', 'Voltage rating [V]', 'Cap'], saved);
    expect(reused.columns).toEqual([
      { header: 'our esr column', field: 'esrOhm', unit: 'mOhm' },
      { header: 'Voltage rating [V]', field: 'voltageRatingV', unit: 'V' },
      { header: 'Cap', field: 'capacitanceF', unit: 'uF' },
    ]);
    expect(reused.fixed).toEqual(saved.fixed);
    expect(reused.kind).toBe('capacitor');
  });
});
