/**
 * `wattledger compare DESIGN.json --role ROLE --parts ID,ID[,ID…] [--json] [--load A] [--vin V]
 * [--fs Hz] [--ambient °C]`: the design with each part in one role — side-by-side ledgers at one load, total loss
 * against load, and the crossover loads where the part with the lower loss changes. Part ids come from the
 * shipped invented parts library (assets/parts/library.json) or name the design's own part in that role.
 */
import { compareParts, DEMO_PARTS_LIBRARY, partInRole, ROLE_KINDS, ROLES, validatePartsLibrary } from '../../../shared-model/index.ts';
import type { Part, Role } from '../../../shared-model/index.ts';
import type { Command } from '../command.ts';
import { loadDesign } from '../design-file.ts';
import { EXIT } from '../io.ts';
import { CONDITION_FLAGS, conditionOverrides, overridesFit } from './conditions.ts';
import { compareJson, renderComparison } from './compare-view.ts';

function libraryParts(): Part[] {
  const checked = validatePartsLibrary(DEMO_PARTS_LIBRARY);
  return checked.ok ? checked.library.parts : [];
}

export const compareCommand: Command = {
  name: 'compare',
  summary: 'The design with alternative parts in one role: ledgers side by side and crossover loads.',
  positionals: ['DESIGN.json'],
  flags: [
    {
      name: 'role', kind: 'text', placeholder: 'ROLE', help: `The role to fill: ${ROLES.join(', ')}.`,
      check: (v) => ((ROLES as readonly string[]).includes(v) ? null : `must be one of ${ROLES.join(', ')}; got "${v}".`),
    },
    { name: 'parts', kind: 'text', placeholder: 'ID,ID[,ID…]', help: 'Two or more part ids from the parts library or the design.' },
    ...CONDITION_FLAGS,
  ],
  details: [
    'The ledgers are at --load (default: rated load); total loss is swept from 1 % to 120 % of rated load.',
    'JSON: alternatives (ledger and temperatures at the load), sweep (loads A, totalLoss W per part,',
    'differences from the first part, winners) and crossovers (load A, the part below and the part above).',
  ],
  async run(args, io) {
    const role = args.texts.role as Role | undefined;
    const ids = (args.texts.parts ?? '').split(',').map((s) => s.trim()).filter((s) => s.length > 0);
    if (!role || ids.length < 2) {
      io.err('wattledger compare: give --role ROLE and --parts with two or more part ids, e.g. --role switch --parts nfet-30v-8m,nfet-30v-4m5.');
      return EXIT.usage;
    }
    const loaded = await loadDesign(args.positionals[0] ?? '', io, 'wattledger compare');
    if (!loaded.ok) return EXIT.invalidDesign;
    const design = loaded.design;
    const own = partInRole(design, role);
    const candidates = [...(own ? [own] : []), ...libraryParts()];
    const parts: Part[] = [];
    for (const id of ids) {
      const part = candidates.find((p) => p.id === id);
      if (!part) {
        const fitting = candidates.filter((p) => ROLE_KINDS[role].includes(p.kind)).map((p) => p.id);
        io.err(`wattledger compare: no part "${id}" in the parts library or the design's ${role}; parts that fit the ${role} role: ${[...new Set(fitting)].join(', ')}.`);
        return EXIT.usage;
      }
      parts.push(part);
    }
    const overrides = conditionOverrides(args);
    if (!overridesFit(design, overrides, io, 'wattledger compare')) return EXIT.usage;
    const { vinV, switchingFrequencyHz, ambientC } = overrides;
    const outcome = compareParts(design, { role, parts, loadA: overrides.loadA, sweep: { conditions: { vinV, switchingFrequencyHz, ambientC } } });
    if (!outcome.ok) {
      io.err(`wattledger compare: ${outcome.problems.map((p) => `${p.message} (path: ${p.path}; allowed: ${p.allowed})`).join(' ')}`);
      return EXIT.usage;
    }
    if (args.switches.has('json')) io.out(JSON.stringify(compareJson(design, outcome.comparison), null, 2));
    else io.out(renderComparison(design, outcome.comparison));
    return EXIT.ok;
  },
};
