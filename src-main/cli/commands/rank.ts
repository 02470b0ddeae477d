/**
 * `wattledger rank DESIGN.json --role ROLE [--library FILE] [--by loss-at-rated|weighted-efficiency|energy]
 * [--workers N] [--json]`: every library part that fits the role, judged in the design (ratings with
 * derating, temperature and touch limits, regulation, over the design's mission profile or its rated point)
 * and ranked best first, on a pool of worker threads using every core (src-main/pool); the result equals
 * the one-thread ranking. Without --library the shipped invented parts library is used.
 */
import { DEFAULT_RANK_SCORE, DEMO_PARTS_LIBRARY, parsePartsLibraryText, RANK_SCORES, ROLES, validatePartsLibrary } from '../../../shared-model/index.ts';
import type { Part, RankScore, Role } from '../../../shared-model/index.ts';
import type { Command } from '../command.ts';
import { formatProblem, loadDesign } from '../design-file.ts';
import { EXIT, type CliIo } from '../io.ts';
import { OPTION_RANGES } from '../number-option.ts';
import { rankOnPool } from '../../pool/rank-pool.ts';
import { threadsUsed } from '../../pool/worker-pool.ts';
import { renderRanking, rankingJson } from './rank-view.ts';

async function libraryOf(path: string | undefined, io: CliIo): Promise<Part[] | null> {
  if (path === undefined) {
    const shipped = validatePartsLibrary(DEMO_PARTS_LIBRARY);
    return shipped.ok ? shipped.library.parts : [];
  }
  const read = await io.readText(path);
  if (!read.ok) {
    io.err(`wattledger rank: ${read.message}`);
    return null;
  }
  const parsed = parsePartsLibraryText(read.text);
  if (!parsed.ok) {
    io.err(`wattledger rank: "${path}" is not a usable parts library (${parsed.problems.length} problems):\n${parsed.problems.map(formatProblem).join('\n')}`);
    return null;
  }
  return parsed.library.parts;
}

export const rankCommand: Command = {
  name: 'rank',
  summary: 'Every library part that fits one role, judged in the design and ranked best first (all cores).',
  positionals: ['DESIGN.json'],
  flags: [
    {
      name: 'role', kind: 'text', placeholder: 'ROLE', help: `The role to fill: ${ROLES.join(', ')}.`,
      check: (v) => ((ROLES as readonly string[]).includes(v) ? null : `must be one of ${ROLES.join(', ')}; got "${v}".`),
    },
    { name: 'library', kind: 'text', placeholder: 'FILE', help: 'A parts library file (default: the shipped invented library).' },
    {
      name: 'by', kind: 'text', placeholder: 'SCORE', help: `What to rank by: ${RANK_SCORES.join(', ')} (default ${DEFAULT_RANK_SCORE}).`,
      check: (v) => ((RANK_SCORES as readonly string[]).includes(v) ? null : `must be one of ${RANK_SCORES.join(', ')}; got "${v}".`),
    },
    { name: 'workers', kind: 'number', unit: '', placeholder: 'N', help: 'Worker threads (default: every core).', range: OPTION_RANGES.workers },
    { name: 'json', kind: 'switch', help: 'Print JSON (SI units: W, Wh, °C, K) instead of tables.' },
  ],
  details: [
    'Scores: loss-at-rated (W at nominal Vin and rated load), weighted-efficiency (Σ fraction·η over the',
    'mission profile), energy (Wh lost per day over the mission profile); without a mission profile the rated',
    'point stands in. A part is admissible when every rating holds with derating, every point regulates with a',
    'steady state and every temperature and touch limit holds. JSON: ranking (best first; score, figures,',
    'binding constraint, pareto), inadmissible (reasons), notFitting (parts of other kinds).',
  ],
  async run(args, io) {
    const role = args.texts.role as Role | undefined;
    if (!role) {
      io.err('wattledger rank: give --role ROLE, e.g. --role switch.');
      return EXIT.usage;
    }
    const loaded = await loadDesign(args.positionals[0] ?? '', io, 'wattledger rank');
    if (!loaded.ok) return EXIT.invalidDesign;
    const library = await libraryOf(args.texts.library, io);
    if (library === null) return EXIT.usage;
    const options = { role, library, by: (args.texts.by ?? DEFAULT_RANK_SCORE) as RankScore };
    let ranking;
    try {
      ranking = await rankOnPool(loaded.design, options, { workers: args.numbers.workers });
    } catch (error) {
      io.err(`wattledger rank: ${error instanceof Error ? error.message : String(error)}`);
      return error instanceof RangeError ? EXIT.usage : EXIT.internal;
    }
    const threads = threadsUsed(args.numbers.workers, library.length);
    if (args.switches.has('json')) io.out(JSON.stringify(rankingJson(loaded.design, ranking, threads), null, 2));
    else io.out(renderRanking(loaded.design, ranking, threads));
    return EXIT.ok;
  },
};
