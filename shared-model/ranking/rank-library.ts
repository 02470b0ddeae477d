/**
 * A part library ranked for one role of a design (issue 11 §3), in pieces a pool of workers can share:
 * - `checkRankOptions`: every problem with the options (role, score, derating, a library with no part
 *   that fits the role), each naming the option, its value and what is allowed;
 * - `judgeChunk`: judges library parts [from, to) (judge-part.ts); parts are independent, so any split
 *   gives the same verdicts;
 * - `assembleRanking`: verdicts from any chunks, in any order, into the ranking — admissible parts
 *   sorted by score (ties: part id, then library position), the Pareto front of score against hottest
 *   temperature marked, inadmissible parts in library order with their reasons;
 * - `rankLibrary`: the one-thread ranking, assembleRanking(judgeChunk(all)).
 * A pool's result therefore equals rankLibrary's exactly (test/src-main/pool/rank-pool.test.ts).
 */
import { ROLES } from '../design/schema.ts';
import type { Design } from '../design/schema.ts';
import { ROLE_KINDS } from '../compare/substitute-part.ts';
import type { OptionProblem } from '../sweep/types.ts';
import { ROLE_LABELS } from '../report/labels.ts';
import { judgePart } from './judge-part.ts';
import { ratedPointProfile } from '../mission/weightings.ts';
import type { InadmissiblePart, LibraryRanking, PartVerdict, RankedPart, RankLibraryOptions, RankScore } from './types.ts';
import { RANK_SCORES } from './types.ts';

export const DEFAULT_RANK_SCORE: RankScore = 'energy';

export function checkRankOptions(design: Design, options: RankLibraryOptions): OptionProblem[] {
  const problems: OptionProblem[] = [];
  const role = options.role;
  if (!(ROLES as readonly string[]).includes(role)) {
    problems.push({ path: 'role', value: role, allowed: ROLES.join(', '), message: `Role "${String(role)}" is not a part role; the roles are ${ROLES.join(', ')}.` });
  } else {
    const kinds = ROLE_KINDS[role];
    if (role === 'senseResistor' && design.topology.senseLocation === 'none') {
      problems.push({ path: 'role', value: role, allowed: 'a role the design has', message: 'The design has no current-sense resistor (topology.senseLocation is "none"), so there is no sense-resistor role to rank.' });
    } else if (!options.library.some((p) => kinds.includes(p.kind))) {
      problems.push({
        path: 'library',
        value: `${options.library.length} parts`,
        allowed: `at least one ${kinds.join(' or ')}`,
        message: `No part in the library fits the ${ROLE_LABELS[role].toLowerCase()} role (it takes a ${kinds.join(' or a ')}; the library has ${options.library.length} parts of other kinds).`,
      });
    }
  }
  const by = options.by ?? DEFAULT_RANK_SCORE;
  if (!RANK_SCORES.includes(by)) problems.push({ path: 'by', value: by, allowed: RANK_SCORES.join(', '), message: `Score "${String(by)}" is not one of ${RANK_SCORES.join(', ')}.` });
  const k = options.currentDerating;
  if (k !== undefined && !(Number.isFinite(k) && k >= 0.1 && k <= 1)) {
    problems.push({ path: 'currentDerating', value: k, allowed: '0.1 … 1', message: `Current derating ${String(k)} is outside 0.1 … 1 (the fraction of a current rating that may be used; common practice 0.5–0.9).` });
  }
  return problems;
}

/**
 * Verdicts on library parts [from, to). `firstIndex` is the library position of `options.library[0]`,
 * for a pool that sends each worker only its slice of the library.
 */
export function judgeChunk(design: Design, options: RankLibraryOptions, from = 0, to = options.library.length, firstIndex = 0): PartVerdict[] {
  const settings = { role: options.role, by: options.by ?? DEFAULT_RANK_SCORE, currentDerating: options.currentDerating, evaluator: options.evaluator };
  const out: PartVerdict[] = [];
  for (let i = from; i < to; i++) out.push(judgePart(design, options.library[i]!, firstIndex + i, settings));
  return out;
}

/** Contiguous [from, to) pieces of a library of `count` parts, at most `pieces` of them, sizes differing by at most one. */
export function libraryChunks(count: number, pieces: number): [number, number][] {
  const n = Math.max(1, Math.min(Math.floor(pieces), count));
  const out: [number, number][] = [];
  for (let k = 0; k < n; k++) {
    const from = Math.floor((k * count) / n);
    const to = Math.floor(((k + 1) * count) / n);
    if (to > from) out.push([from, to]);
  }
  return out;
}

export function assembleRanking(design: Design, options: Pick<RankLibraryOptions, 'role' | 'by'>, verdicts: readonly PartVerdict[]): LibraryRanking {
  const by = options.by ?? DEFAULT_RANK_SCORE;
  const higher = by === 'weighted-efficiency';
  const byPosition = [...verdicts].sort((a, b) => a.libraryIndex - b.libraryIndex);
  const admissible = byPosition.filter((v): v is Extract<PartVerdict, { verdict: 'admissible' }> => v.verdict === 'admissible');
  admissible.sort((a, b) => (higher ? b.score - a.score : a.score - b.score) || (a.partId < b.partId ? -1 : a.partId > b.partId ? 1 : 0) || a.libraryIndex - b.libraryIndex);
  // Pareto front: walking best score first, a part is on it when it runs cooler than every part before it.
  let coolest = Infinity;
  const ranking: RankedPart[] = admissible.map((v, i) => {
    const pareto = v.figures.hottestC < coolest;
    if (pareto) coolest = v.figures.hottestC;
    return { ...v, rank: i + 1, pareto };
  });
  const inadmissible = byPosition.filter((v): v is InadmissiblePart => v.verdict === 'inadmissible');
  const mission = design.missionProfile;
  return {
    role: options.role,
    by,
    unit: by === 'loss-at-rated' ? 'W' : by === 'energy' ? 'Wh' : '',
    better: higher ? 'higher' : 'lower',
    basis: mission ? 'profile' : 'rated-point',
    missionName: (mission ?? ratedPointProfile(design)).name,
    ranking,
    inadmissible,
    notFitting: byPosition.filter((v) => v.verdict === 'not-fitting').length,
  };
}

/** The ranking on this thread (throws for invalid options: check them first with checkRankOptions). */
export function rankLibrary(design: Design, options: RankLibraryOptions): LibraryRanking {
  const problems = checkRankOptions(design, options);
  if (problems.length > 0) throw new RangeError(problems.map((p) => p.message).join(' '));
  return assembleRanking(design, options, judgeChunk(design, options));
}
