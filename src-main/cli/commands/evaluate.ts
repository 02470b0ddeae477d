/**
 * `wattledger evaluate DESIGN.json [--json] [--load A] [--vin V] [--fs Hz] [--ambient °C]`: the electro-thermal
 * loss ledger — every watt by part and mechanism, temperatures, heatsinks, burn hazards, rating checks,
 * warnings. JSON: the engine's Evaluation record at the top level (efficiency, inputPower, outputPower,
 * totalLoss, dutyCycle, conductionMode, losses, temperatures, hazards, warnings, converged, ...) except that
 * `checks` holds the design checks of `size` (issue 11: id, value, limit, unit, passed, source, at the
 * design's own corners) and the ledger's rating checks at this point move to `ratingChecks`; `designChecks`
 * stays as an alias of `checks` for older readers; plus command, design, designNotices and cautions
 * (README.md, "evaluate"). A point with no
 * steady state (thermal runaway) exits 0 with converged false and a warning naming the part.
 */
import { evaluateDesign, phaseSummary, reviewDesign } from '../../../shared-model/index.ts';
import { CAUTIONS } from '../cautions.ts';
import type { Command } from '../command.ts';
import { loadDesign } from '../design-file.ts';
import { EXIT } from '../io.ts';
import { CONDITION_FLAGS, conditionOverrides, overridesFit } from './conditions.ts';
import { DERATING_FLAGS, withDerating } from './derating.ts';
import { renderEvaluation } from './evaluate-view.ts';

export const evaluateCommand: Command = {
  name: 'evaluate',
  summary: 'Loss ledger, temperatures and burn hazards at one condition (electro-thermal).',
  positionals: ['DESIGN.json'],
  flags: [...CONDITION_FLAGS, ...DERATING_FLAGS],
  details: [
    'Losses are in W, temperatures in °C, margins in K. A point with no steady state (thermal runaway)',
    'is reported with converged: false and a warning naming the part; its numbers describe no steady state.',
    'A multiphase design: the same keys for the whole converter (each term summed over the phases, each part',
    'at its hottest phase) plus phases: per-phase loads, per-phase ledger rows (phase "shared": a shared part),',
    'per-phase temperatures and the shared banks\' summed currents against one phase alone.',
  ],
  async run(args, io) {
    const loaded = await loadDesign(args.positionals[0] ?? '', io, 'wattledger evaluate');
    if (!loaded.ok) return EXIT.invalidDesign;
    const design = withDerating(loaded.design, args);
    const overrides = conditionOverrides(args);
    if (!overridesFit(design, overrides, io, 'wattledger evaluate')) return EXIT.usage;
    const { evaluation: result, phased } = evaluateDesign(design, overrides);
    if (args.switches.has('json')) {
      // The design checks are the design's own (its corners at rated load), whatever point was asked for.
      const designChecks = reviewDesign(design).checks;
      const { checks: ratingChecks, ...rest } = result;
      const record = {
        command: 'evaluate', design: loaded.design.name, ...rest,
        ...(phased ? { phases: phaseSummary(phased) } : {}),
        checks: designChecks, ratingChecks, designChecks, designNotices: loaded.notices, cautions: CAUTIONS,
      };
      io.out(JSON.stringify(record, null, 2));
    } else io.out(renderEvaluation(design, result, loaded.notices));
    return EXIT.ok;
  },
};
