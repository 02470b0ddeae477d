/** A design's canonical text, for the report tests. */
import { serializeDesign } from '../../../shared-model/index.ts';
import type { Design } from '../../../shared-model/index.ts';

export function designText(design: Design): string {
  const text = serializeDesign(design);
  if (!text.ok) throw new Error('demo design cannot be serialized');
  return text.text;
}
