/**
 * Declarative description of editable fields, so one set of components edits every part kind, the
 * specification, the thermal paths and the margins. `key` is relative to the object being edited.
 * `unit` is the SI symbol shown after the value and passed to parseEngineering; "%" marks a fraction
 * entered and shown in percent (editor/percent-entry.ts), stored as the fraction.
 */
export interface NumberSpec {
  type: 'number';
  key: string;
  label: string;
  unit: string;
  optional?: boolean;
  integer?: boolean;
  help?: string;
}

export interface TextSpec {
  type: 'text';
  key: string;
  label: string;
  optional?: boolean;
  multiline?: boolean;
}

export interface ChoiceSpec {
  type: 'choice';
  key: string;
  label: string;
  options: readonly { value: string; label: string }[];
}

export interface BooleanSpec {
  type: 'boolean';
  key: string;
  label: string;
  optional?: boolean;
}

/** Starting values for a new variant or group, given the object that holds it (e.g. the part). */
export type Defaults = (container: Record<string, unknown>) => Record<string, unknown>;

export interface VariantSpec {
  value: string;
  label: string;
  fields: readonly FieldSpec[];
  defaults: Defaults;
}

/** A discriminated union (e.g. the RDS(on) temperature law): pick a variant, then edit its fields. */
export interface UnionSpec {
  type: 'union';
  key: string;
  label: string;
  tag: string;
  variants: readonly VariantSpec[];
}

/** An optional nested object (e.g. inductance roll-off): a check box adds or removes it. */
export interface GroupSpec {
  type: 'group';
  key: string;
  label: string;
  fields: readonly FieldSpec[];
  defaults: Defaults;
}

/** A curve digitised from a datasheet: rows of numbers, typed or pasted, with a small preview plot. */
export interface TableSpec {
  type: 'table';
  key: string;
  label: string;
  columns: readonly { key: string; label: string; unit: string }[];
  minRows: number;
  maxRows: number;
  /** Plot the second column on a log scale (capacitance curves span decades). */
  logY?: boolean;
  /** Plot the first column on a log scale (frequencies span decades). */
  logX?: boolean;
  /**
   * A column whose value names the curve a row belongs to (a family of curves, e.g. VF(IF) at each Tj):
   * the preview draws one line per value, against the other two columns.
   */
  series?: string;
  help?: string;
}

export type FieldSpec = NumberSpec | TextSpec | ChoiceSpec | BooleanSpec | UnionSpec | GroupSpec | TableSpec;

export const num = (key: string, label: string, unit: string, extra: Partial<NumberSpec> = {}): NumberSpec => ({
  type: 'number',
  key,
  label,
  unit,
  ...extra,
});

/** Switching variant: keeps values whose keys the new variant shares, fills the rest from defaults. */
export function switchVariant(
  spec: UnionSpec,
  container: Record<string, unknown>,
  next: string,
): Record<string, unknown> {
  const variant = spec.variants.find((v) => v.value === next);
  if (!variant) throw new Error(`unknown variant ${next} of ${spec.key}`);
  const current = (container[spec.key] ?? {}) as Record<string, unknown>;
  const result: Record<string, unknown> = { ...variant.defaults(container), [spec.tag]: next };
  for (const field of variant.fields) {
    if (current[field.key] !== undefined) result[field.key] = current[field.key];
  }
  return result;
}
