/**
 * What "New" offers (issue 16 §5): a blank design of each topology — the specification's conditions and
 * every part's own numbers left empty, so validation lists what to fill in on each field — and every demo
 * design as a template to start from. A blank keeps the structure of the first one-phase demo of its
 * topology (part kinds, laws, thermal paths, margins): those are choices with sensible starting values,
 * not numbers of a particular product.
 */
import { DEMO_DESIGNS, ROLE_LABELS, TOPOLOGIES, validateDesign } from '../../shared-model/index.ts';
import type { Design, Role } from '../../shared-model/index.ts';

export interface DesignTemplate {
  id: string;
  label: string;
  purpose: string;
  design: Design;
}

/** The specification numbers a blank design leaves empty (ambient and the duty limit keep their values). */
export const BLANK_SPEC_KEYS = ['vinMinV', 'vinNomV', 'vinMaxV', 'voutV', 'ratedLoadA', 'switchingFrequencyHz'] as const;

/** Fresh identity for a design started from a template: its own name, revision A, no author or notes. */
function freshIdentity(design: Design, name: string): Design {
  const { project: _project, ...rest } = design;
  return { ...rest, name, revision: 'A', author: '', notes: '' };
}

/**
 * A copy of `template` with the specification's conditions and each part's plain numbers removed, parts
 * named by their role ("New inductor") and library links dropped. The result is an invalid draft on purpose: the editor marks
 * each missing field with its label and allowed range.
 */
export function blankDesign(template: Design, name: string): Design {
  const copy = structuredClone(template) as unknown as Record<string, unknown>;
  const spec = copy.spec as Record<string, unknown>;
  for (const key of BLANK_SPEC_KEYS) delete spec[key];
  const parts = copy.parts as Record<string, Record<string, unknown> | undefined>;
  for (const [role, part] of Object.entries(parts)) {
    if (!part) continue;
    part.id = `new-${role}`;
    for (const [key, value] of Object.entries(part)) if (typeof value === 'number' && key !== 'count') delete part[key];
    part.name = `New ${ROLE_LABELS[role as Role].toLowerCase()}`;
    part.invented = false;
    delete part.notes;
  }
  delete copy.sources;
  delete copy.measurement;
  return freshIdentity(copy as unknown as Design, name);
}

function demoTemplates(): DesignTemplate[] {
  const out: DesignTemplate[] = [];
  for (const demo of DEMO_DESIGNS) {
    const checked = validateDesign(demo.json);
    if (checked.ok) out.push({ id: `demo-${demo.id}`, label: demo.title, purpose: demo.purpose, design: checked.design });
  }
  return out;
}

/** The blanks (one per topology) and the demos, in the order the dialog lists them. */
export function designTemplates(): { blanks: DesignTemplate[]; demos: DesignTemplate[] } {
  const demos = demoTemplates();
  const blanks: DesignTemplate[] = [];
  for (const topology of Object.values(TOPOLOGIES)) {
    const base = demos.find((d) => d.design.topology.kind === topology.kind && (d.design.topology.phases ?? 1) === 1);
    if (!base) continue;
    blanks.push({
      id: `blank-${topology.kind}`,
      label: `Blank ${topology.title}`,
      purpose: 'Conditions and part values empty; each field says what it needs.',
      design: blankDesign(base.design, `New ${topology.kind} design`),
    });
  }
  return { blanks, demos: demos.map((d) => ({ ...d, design: freshIdentity(d.design, `${d.design.name} (copy)`) })) };
}
