/**
 * The words of a calibration: warnings for what the data cannot tell (intervals.ts issues, bounds,
 * convergence), and a summary of where the loss moved at rated load and which parameter moved most.
 */
import type { IdentifiabilityIssue } from './intervals.ts';
import type { CalibrationWarning, FittedParameter, GroupChange } from './types.ts';

const fmt = (v: number, digits = 3): string => String(Number(v.toPrecision(digits)));

export function describeValue(p: Pick<FittedParameter, 'unit' | 'fitted'>): string {
  return p.unit === '×' ? `${fmt(p.fitted)}×` : p.unit === 'A' ? `${fmt(p.fitted * 1000)} mA` : `${fmt(p.fitted)} ${p.unit}`;
}

export function calibrationWarnings(
  params: readonly FittedParameter[],
  issues: readonly IdentifiabilityIssue[],
  converged: boolean,
  modelRunaway: boolean,
): CalibrationWarning[] {
  const out: CalibrationWarning[] = [];
  const label = (j: number) => params[j].label.replace(/ ×$/, '');
  for (const issue of issues) {
    const names = issue.parameters.map((j) => params[j].name);
    const labels = issue.parameters.map(label).join(', ');
    if (issue.kind === 'no-sensitivity')
      out.push({ code: 'no-sensitivity', severity: 'caution', parameters: names,
        message: `Nothing measured depends on ${labels}: the data cannot fix it (no interval). Leave it out of the fit, or measure what it affects.` });
    else if (issue.kind === 'flat-direction')
      out.push({ code: 'not-identifiable', severity: 'caution', parameters: names,
        message: `The data cannot separate ${labels}: different combinations of them explain the measurements equally well, so their fitted values mean nothing on their own (no intervals). Fit fewer of them, or measure where they act differently (another input voltage, light and heavy load, a part temperature).` });
    else
      out.push({ code: 'correlated', severity: 'caution', parameters: names,
        message: `${label(issue.parameters[0])} and ${label(issue.parameters[1])} are hard to separate with these data (correlation ${fmt(issue.correlation, 2)}): their intervals are wide and their errors move together. Identifiability is weak; measure where they act differently, or fit one of them.` });
  }
  params.forEach((p) => {
    if (p.atBound)
      out.push({ code: 'at-bound', severity: 'caution', parameters: [p.name],
        message: `${p.label.replace(/ ×$/, '')} stopped at its ${p.atBound} bound (${describeValue(p)}): the bound may be too tight, or the model lacks a mechanism the prototype has; its interval does not hold at a bound.` });
  });
  if (!converged)
    out.push({ code: 'not-converged', severity: 'caution', parameters: [], message: 'The fit stopped at its iteration limit before converging; the values and intervals are not final.' });
  if (modelRunaway)
    out.push({ code: 'model-not-converged', severity: 'caution', parameters: [], message: 'At some measured point the model found no thermal steady state (runaway); the comparison there describes no steady state.' });
  return out;
}

const GROUP_WORDS: Record<GroupChange['group'], string> = {
  conduction: 'conduction loss',
  switching: 'switching loss',
  core: 'core loss',
  'winding AC': 'AC winding loss',
  controller: 'controller loss',
  leakage: 'leakage loss',
};

/** "At rated load the fitted model loses 1.84 W (1.52 W before); the gap is mostly switching loss (+0.29 W): gate charges of the switch 1.6× the datasheet value." */
export function calibrationSummary(params: readonly FittedParameter[], atRated: { beforeW: number; afterW: number; groups: readonly GroupChange[] }): string {
  const change = [...atRated.groups].sort((a, b) => Math.abs(b.afterW - b.beforeW) - Math.abs(a.afterW - a.beforeW))[0];
  const moved = (p: FittedParameter) =>
    p.unit === '×' ? Math.abs(Math.log(p.fitted / p.initial)) : Math.abs(p.fitted - p.initial) / Math.max(p.initial, p.upper * 0.01);
  const biggest = [...params].sort((a, b) => moved(b) - moved(a))[0];
  const head = `At rated load the fitted model loses ${fmt(atRated.afterW)} W (${fmt(atRated.beforeW)} W before)`;
  if (!change || Math.abs(change.afterW - change.beforeW) < 1e-6 || !biggest) return `${head}; the fit changed nothing that matters there.`;
  const delta = change.afterW - change.beforeW;
  const what =
    biggest.unit === '×'
      ? `${biggest.label.replace(/ ×$/, '').toLowerCase()} ${describeValue(biggest)} the datasheet value`
      : `${biggest.label.toLowerCase()} ${describeValue(biggest)} (design: ${describeValue({ unit: biggest.unit, fitted: biggest.initial })})`;
  return `${head}; the gap is mostly ${GROUP_WORDS[change.group]} (${delta >= 0 ? '+' : '−'}${fmt(Math.abs(delta))} W): ${what}.`;
}
