/**
 * What `wattledger rank` prints: the ranking as JSON (the engine's records, nothing recomputed) or as
 * tables — admissible parts best first with score, hottest part, worst margin and binding constraint,
 * then the parts turned down with their reasons — followed by the cautions.
 */
import { ROLE_LABELS } from '../../../shared-model/index.ts';
import type { Design, LibraryRanking } from '../../../shared-model/index.ts';
import { CAUTION_LINE, CAUTIONS } from '../cautions.ts';
import { renderTable, section } from '../table.ts';

const SCORE_WORDS = { 'loss-at-rated': 'loss at rated load', 'weighted-efficiency': 'weighted efficiency', energy: 'energy lost per day' } as const;

export function rankingJson(design: Design, r: LibraryRanking, workers: number): Record<string, unknown> {
  return { design: design.name, ...r, workers, cautions: CAUTIONS };
}

const num = (x: number, digits = 4): string => Number(x.toPrecision(digits)).toString();

function scoreText(r: LibraryRanking, score: number): string {
  if (r.by === 'weighted-efficiency') return `${(score * 100).toFixed(2)} %`;
  return `${num(score)} ${r.unit}`;
}

export function renderRanking(design: Design, r: LibraryRanking, workers: number): string {
  const role = ROLE_LABELS[r.role];
  const head = [
    `${design.name}: ${role.toLowerCase()} ranked by ${SCORE_WORDS[r.by]} (${r.better} is better) over ${r.basis === 'profile' ? `the mission profile "${r.missionName}"` : 'the rated point (the design has no mission profile)'}.`,
    `${r.ranking.length} admissible, ${r.inadmissible.length} turned down, ${r.notFitting} of other kinds; ${workers} worker thread${workers === 1 ? '' : 's'}.`,
    '',
  ].join('\n');
  const rows = r.ranking.map((p) => [
    String(p.rank),
    p.partId,
    scoreText(r, p.score),
    `${ROLE_LABELS[p.figures.hottestPart]} ${num(p.figures.hottestC)} °C`,
    `${num(p.figures.worstMarginK, 3)} K`,
    `${p.binding.what} (${(p.binding.headroom * 100).toFixed(1)} % left)`,
    p.pareto ? 'yes' : '',
  ]);
  const table = rows.length > 0
    ? renderTable([{ title: 'Rank', align: 'right' }, { title: 'Part' }, { title: 'Score', align: 'right' }, { title: 'Hottest' }, { title: 'Margin', align: 'right' }, { title: 'Closest limit' }, { title: 'Front' }], rows)
    : 'No part of the library is admissible in this role.';
  const down = r.inadmissible.length > 0 ? section('Turned down', r.inadmissible.map((p) => `${p.partId}: ${p.reasons.join(' ')}`).join('\n')) : '';
  const front = 'Front: no other admissible part has both a better score and a cooler hottest part.';
  return `${head}${section('Ranking', table)}${down}${front}\n${CAUTION_LINE}`;
}
