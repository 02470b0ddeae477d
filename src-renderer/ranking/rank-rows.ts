/**
 * The ranking view's table rows: every part that fits the role, admissible parts best first, then the
 * parts turned down in library order with every reason. Plain data for RankingScreen.svelte (and its
 * unit test): the texts the table shows and the numbers behind them.
 */
import { ROLE_LABELS } from '../../shared-model/index.ts';
import type { BindingConstraint, LibraryRanking, PartFigures, RankScore } from '../../shared-model/index.ts';

export interface RankRow {
  partId: string;
  partName: string;
  /** 1… for admissible parts; null for a part turned down. */
  rank: number | null;
  admissible: boolean;
  pareto: boolean;
  /** The score in its unit (W, Wh, or a fraction for weighted efficiency); null where the design did not solve. */
  score: number | null;
  scoreText: string;
  hottestText: string;
  hottestC: number | null;
  marginText: string;
  bindingText: string;
  /** Why a part is turned down (empty when admissible). */
  reasons: string[];
}

const four = (x: number): string => Number(x.toPrecision(4)).toString();

export function scoreOf(by: RankScore, f: PartFigures): number {
  return by === 'loss-at-rated' ? f.lossAtRatedW : by === 'weighted-efficiency' ? f.weightedEfficiency : f.energyPerDayWh;
}

export function scoreText(r: Pick<LibraryRanking, 'by' | 'unit'>, score: number): string {
  if (r.by === 'weighted-efficiency') return `${(score * 100).toFixed(2)} %`;
  return `${four(score)} ${r.unit}`;
}

export function bindingText(b: BindingConstraint | undefined): string {
  if (!b) return '—';
  const left = b.headroom < 0 ? `${(-b.headroom * 100).toFixed(1)} % past it` : `${(b.headroom * 100).toFixed(1)} % left`;
  return `${b.what}: ${four(b.value)} ${b.unit} of ${four(b.limit)} ${b.unit} (${left})`;
}

function figureTexts(f: PartFigures | undefined) {
  if (!f) return { hottestText: '—', hottestC: null, marginText: '—' };
  return { hottestText: `${ROLE_LABELS[f.hottestPart]} ${f.hottestC.toFixed(1)} °C`, hottestC: f.hottestC, marginText: `${f.worstMarginK.toFixed(1)} K` };
}

export function rankRows(r: LibraryRanking): RankRow[] {
  const ranked: RankRow[] = r.ranking.map((p) => ({
    partId: p.partId,
    partName: p.partName,
    rank: p.rank,
    admissible: true,
    pareto: p.pareto,
    score: p.score,
    scoreText: scoreText(r, p.score),
    ...figureTexts(p.figures),
    bindingText: bindingText(p.binding),
    reasons: [],
  }));
  const down: RankRow[] = r.inadmissible.map((p) => {
    const score = p.figures ? scoreOf(r.by, p.figures) : null;
    return {
      partId: p.partId,
      partName: p.partName,
      rank: null,
      admissible: false,
      pareto: false,
      score,
      scoreText: score === null ? '—' : scoreText(r, score),
      ...figureTexts(p.figures),
      bindingText: bindingText(p.binding),
      reasons: p.reasons,
    };
  });
  return [...ranked, ...down];
}
