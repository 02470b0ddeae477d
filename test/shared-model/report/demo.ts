/** The shipped demo designs, validated, for the report tests. */
import { DEMO_DESIGNS, serializeDesign, validateDesign } from '../../../shared-model/index.ts';
import type { Design } from '../../../shared-model/index.ts';

export function demoDesign(id: string): Design {
  const demo = DEMO_DESIGNS.find((d) => d.id === id);
  if (!demo) throw new Error(`no demo design ${id}`);
  const checked = validateDesign(demo.json);
  if (!checked.ok) throw new Error(`demo ${id} is invalid: ${checked.problems.map((p) => p.message).join(' ')}`);
  return checked.design;
}

export function designText(design: Design): string {
  const text = serializeDesign(design);
  if (!text.ok) throw new Error('demo design cannot be serialized');
  return text.text;
}
