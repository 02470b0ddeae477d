/**
 * Where a chart's marker labels go, in pixels, pure: each label has candidate boxes in the order we
 * prefer them (beside its line, row by row), and takes the first that overlaps neither a label placed
 * before it nor an obstacle (a marked point), and stays inside the plot. Greedy first fit, the way
 * interval scheduling places intervals; labels that fit nowhere take the candidate with the least
 * overlap, so the caller still draws them (and a test can see that they collide).
 */

export interface Box {
  left: number;
  top: number;
  width: number;
  height: number;
}

/** A label of a vertical (axis "x", at pixel `at` along x) or horizontal (axis "y", at pixel `at` along y) line. */
export interface LabelToPlace {
  axis: 'x' | 'y';
  at: number;
  width: number;
  height: number;
}

const GAP = 3;

/** The overlap area of two boxes (0 when they only touch). */
export function overlapArea(a: Box, b: Box): number {
  const w = Math.min(a.left + a.width, b.left + b.width) - Math.max(a.left, b.left);
  const h = Math.min(a.top + a.height, b.top + b.height) - Math.max(a.top, b.top);
  return w > 0 && h > 0 ? w * h : 0;
}

function inside(box: Box, area: Box): boolean {
  return box.left >= area.left - 0.5 && box.top >= area.top - 0.5 && box.left + box.width <= area.left + area.width + 0.5 && box.top + box.height <= area.top + area.height + 0.5;
}

/**
 * Candidate boxes of one label, best first. A vertical line's label sits at the top of the plot, to
 * the right of its line (left of it near the right edge), one row lower each time; a horizontal
 * line's label sits just above its line at the right end, then the left end, then the middle and the
 * eighths between, then below the line, then up to six rows further above and below (the caller draws a leader from
 * such a label to its line).
 */
export function candidates(label: LabelToPlace, area: Box): Box[] {
  const out: Box[] = [];
  const { width, height } = label;
  if (label.axis === 'x') {
    const right = label.at + GAP;
    const left = label.at - GAP - width;
    const sides = right + width <= area.left + area.width ? [right, left] : [left, right];
    const rows = Math.max(1, Math.floor((area.height - GAP) / (height + 2)));
    for (let row = 0; row < rows; row++) {
      const top = area.top + GAP + row * (height + 2);
      for (const x of sides) out.push({ left: x, top, width, height });
    }
    return out;
  }
  const free = area.width - 2 * GAP - width;
  const xs = [1, 0, 0.5, 0.25, 0.75, 0.125, 0.375, 0.625, 0.875].map((f) => area.left + GAP + f * Math.max(0, free));
  const tops = [label.at - height - 1, label.at + 1];
  for (let k = 1; k <= 6; k++) tops.push(label.at - (k + 1) * (height + 1), label.at + 1 + k * (height + 1));
  for (const top of tops) for (const x of xs) out.push({ left: x, top, width, height });
  return out;
}

/** Places every label; returns one box per label, in the order given. */
export function placeLabels(labels: readonly LabelToPlace[], area: Box, obstacles: readonly Box[] = []): Box[] {
  const placed: Box[] = [];
  for (const label of labels) {
    const options = candidates(label, area);
    const cost = (box: Box) => [...placed, ...obstacles].reduce((s, other) => s + overlapArea(box, other), 0) + (inside(box, area) ? 0 : 1e6);
    let best = options[0];
    let bestCost = Infinity;
    for (const box of options) {
      const c = cost(box);
      if (c < bestCost) {
        best = box;
        bestCost = c;
      }
      if (c === 0) break;
    }
    placed.push(best);
  }
  return placed;
}
