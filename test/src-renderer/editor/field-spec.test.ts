import { describe, expect, it } from 'vitest';
import { partSchema } from '../../../shared-model/index.ts';
import { switchVariant, type UnionSpec } from '../../../src-renderer/editor/field-spec.ts';
import { PART_FIELDS } from '../../../src-renderer/editor/part-fields.ts';
import { demoParts } from '../../helpers/demo.ts';

const unionsOf = (kind: keyof typeof PART_FIELDS) => PART_FIELDS[kind].values.filter((f): f is UnionSpec => f.type === 'union');

describe('alternative forms of a field', () => {
  it('every variant of every part union gives a part the engine schema accepts', () => {
    for (const part of demoParts()) {
      for (const spec of unionsOf(part.kind)) {
        for (const variant of spec.variants) {
          const container = part as unknown as Record<string, unknown>;
          const next = { ...part, [spec.key]: switchVariant(spec, container, variant.value) };
          const check = partSchema.safeParse(next);
          expect(check.success, `${part.id} ${spec.key} → ${variant.value}: ${check.success ? '' : check.error.message}`).toBe(true); // shared-model part schema
        }
      }
    }
  });

  it('keeps values the old and new form share', () => {
    const inductor = demoParts().find((p) => p.kind === 'inductor')!;
    const spec = unionsOf('inductor').find((u) => u.key === 'coreLoss')!;
    const container = { ...inductor, coreLoss: { kind: 'steinmetz', k: 7, alpha: 1.3, beta: 2.6 } } as unknown as Record<string, unknown>;
    const point = switchVariant(spec, container, 'point');
    expect(point).toMatchObject({ kind: 'point', alpha: 1.3, beta: 2.6 });
  });

  it('every part field names a key of its part kind', () => {
    for (const part of demoParts()) {
      const keys = new Set(Object.keys(partSchema.options.find((o) => o.shape.kind.value === part.kind)!.shape));
      for (const field of [...PART_FIELDS[part.kind].identity, ...PART_FIELDS[part.kind].values]) expect(keys.has(field.key), `${part.kind}.${field.key}`).toBe(true); // shared-model/design/parts.ts
    }
  });
});

describe('design-level fields', () => {
  it('name keys of the design schema', async () => {
    const { marginsSchema, specificationSchema, topologySchema } = await import('../../../shared-model/index.ts');
    const fields = await import('../../../src-renderer/editor/design-fields.ts');
    const has = (schema: { shape: object }, key: string) => Object.hasOwn(schema.shape, key);
    for (const f of fields.SPEC_FIELDS) expect(has(specificationSchema, f.key), f.key).toBe(true); // shared-model/design/schema.ts
    for (const f of fields.TARGET_FIELDS) expect(Object.hasOwn(specificationSchema.shape.targets.unwrap().shape, f.key), f.key).toBe(true);
    for (const f of [...fields.DEAD_TIME_FIELDS, fields.KIND_CHOICE, fields.RECTIFIER_CHOICE, fields.LIGHT_LOAD_CHOICE, fields.SENSE_CHOICE]) expect(has(topologySchema, f.key), f.key).toBe(true);
    for (const f of fields.MARGIN_FIELDS) expect(has(marginsSchema, f.key), f.key).toBe(true);
  });
});
