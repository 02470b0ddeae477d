/**
 * `wattledger size DESIGN.json [--json] [--current-derating F] [--voltage-derating F]`: sizing from the specification (inductance, capacitance, ESR,
 * ratings, duty range, slope compensation, loop limits), each result with the corner that drives it, and
 * the design checks of the chosen parts against it (pass / warn / fail). JSON: { command, design, sizing,
 * checks, designChecks (the same list, an alias kept for older readers), checkCounts, checkNotes, designNotices, cautions } — the engine's records unchanged
 * (README.md, "size"). Exits 0 whatever the checks say (a check is a finding, not an error).
 */
import { reviewDesign } from '../../../shared-model/index.ts';
import { CAUTIONS } from '../cautions.ts';
import type { Command } from '../command.ts';
import { loadDesign } from '../design-file.ts';
import { EXIT } from '../io.ts';
import { DERATING_FLAGS, withDerating } from './derating.ts';
import { renderSizing } from './size-view.ts';

export const sizeCommand: Command = {
  name: 'size',
  summary: 'What the specification asks of each part, and the chosen parts checked against it.',
  positionals: ['DESIGN.json'],
  flags: [{ name: 'json', kind: 'switch', help: 'Print JSON (SI units: V, A, Ω, H, F, Hz, W, s, °C) instead of tables.' }, ...DERATING_FLAGS],
  details: [
    'Every result is solved at rated load at Vin min, nominal, max (and Vout/2 for a boost inside the',
    'range) with the design\'s own losses, and names the corner that drives it (docs/methods.md §23).',
    'The checks read the regulated corners only; each is pass, warn or fail (docs/methods.md §24).',
  ],
  async run(args, io) {
    const loaded = await loadDesign(args.positionals[0] ?? '', io, 'wattledger size');
    if (!loaded.ok) return EXIT.invalidDesign;
    const review = reviewDesign(withDerating(loaded.design, args));
    if (args.switches.has('json')) {
      const record = {
        command: 'size',
        design: loaded.design.name,
        sizing: review.sizing,
        checks: review.checks,
        designChecks: review.checks,
        checkCounts: review.counts,
        checkNotes: review.notes,
        designNotices: loaded.notices,
        cautions: CAUTIONS,
      };
      io.out(JSON.stringify(record, null, 2));
    } else io.out(renderSizing(review, loaded.notices));
    return EXIT.ok;
  },
};
