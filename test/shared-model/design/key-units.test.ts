import { describe, expect, it } from 'vitest';
import { designJsonSchema, parseEngineering, partsLibraryJsonSchema, unitOfPath } from '../../../shared-model/index.ts';
import { unitOfKey } from '../../../shared-model/design/key-units.ts';

/** Every key whose JSON Schema type is number or integer (walks properties, items and oneOf). */
function numberKeys(schema: unknown, key = '', out = new Set<string>()): Set<string> {
  if (schema === null || typeof schema !== 'object') return out;
  const s = schema as Record<string, unknown>;
  if ((s.type === 'number' || s.type === 'integer') && key !== '') out.add(key);
  for (const [k, v] of Object.entries((s.properties ?? {}) as Record<string, unknown>)) numberKeys(v, k, out);
  if (s.items) numberKeys(s.items, key, out);
  if (s.additionalProperties && typeof s.additionalProperties === 'object') numberKeys(s.additionalProperties, key, out);
  for (const option of (s.oneOf ?? []) as unknown[]) numberKeys(option, key, out);
  return out;
}

describe('unitOfKey reads the unit from a key suffix (design/parts.ts naming rule)', () => {
  it.each([
    ['vinMaxV', 'V'],
    ['ratedLoadA', 'A'],
    ['rdsOn25Ohm', 'Ω'],
    ['inductanceH', 'H'],
    ['cossF', 'F'],
    ['switchingFrequencyHz', 'Hz'],
    ['deadTimeBeforeOnS', 's'],
    ['qgC', 'C'], // a charge: q…C
    ['qgs2C', 'C'],
    ['bodyDiodeQrrC', 'C'],
    ['ambientC', '°C'], // a temperature: …C
    ['tjMaxC', '°C'],
    ['eossJ', 'J'],
    ['atPeakT', 'T'],
    ['lossWPerM3', 'W/m³'],
    ['vfTempCoVPerK', 'V/K'],
    ['thetaJaKPerW', 'K/W'],
    ['alphaPerK', '/K'],
    ['riseK', 'K'],
    ['aeM2', 'm²'],
    ['veM3', 'm³'],
    ['conductorThicknessM', 'm'],
    ['ratedHours', 'h'],
    ['requiredLifeHours', 'h'],
    ['maxDuty', ''],
    ['turns', ''],
  ])('%s → %j', (key, unit) => {
    expect(unitOfKey(key)).toBe(unit);
  });

  it('reads the last key of a path', () => {
    expect(unitOfPath('thermal.heatsinks[0].thetaSaKPerW')).toBe('K/W');
    expect(unitOfPath('parts.inputCapacitor.part.esrOhm')).toBe('Ω');
  });

  it('gives every number field of both documents a unit that engineering entry accepts', () => {
    const keys = new Set([...numberKeys(designJsonSchema()), ...numberKeys(partsLibraryJsonSchema())]);
    expect(keys.size).toBeGreaterThan(80);
    for (const key of keys) {
      const unit = unitOfKey(key);
      const r = parseEngineering(unit === '' ? '1' : `1 ${unit}`, unit);
      expect(r.ok, `${key} → "${unit}"`).toBe(true);
    }
  });
});
