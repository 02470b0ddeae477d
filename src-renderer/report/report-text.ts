/**
 * Sentences and cell texts the report sections share: landmarks, the topology in words, rating checks,
 * loss-term inputs. Formatting only (shared-model/report/format.ts); no physics.
 */
import type { Design, Landmark, LossTerm, RatingCheck, ReportModel, Severity } from '../../shared-model/index.ts';
import {
  formatAmps,
  formatCelsius,
  formatHertz,
  formatHours,
  formatMarginFraction,
  formatPercent,
  formatQuantity,
  formatEngineering,
  roleLabel,
  topologyOf,
} from '../../shared-model/index.ts';

export const SEVERITY_TEXT: Readonly<Record<Severity, string>> = { danger: 'Danger', caution: 'Caution', info: 'Note' };

export function topologySentence(d: Design): string {
  const t = d.topology;
  const kind = topologyOf(d).title;
  const rect = t.rectifier === 'synchronous' ? 'synchronous rectifier (MOSFET)' : 'diode rectifier';
  const light =
    t.lightLoad === 'pulse-skipping'
      ? ', pulse skipping (PFM) at light load (pulses at the minimum peak current with idle time between them)'
      : t.rectifier === 'synchronous'
        ? t.lightLoad === 'forced-pwm'
          ? ', forced PWM at light load (current may reverse, stays in CCM)'
          : ', diode emulation at light load (enters DCM)'
        : '';
  const dead = t.rectifier === 'synchronous' ? `; dead times ${formatEngineering(t.deadTimeBeforeOnS, 's', 3, 'table')} before turn-on and ${formatEngineering(t.deadTimeAfterOffS, 's', 3, 'table')} after turn-off` : '';
  const sense = t.senseLocation === 'none' ? '; no current-sense resistor' : `; current-sense resistor in the ${t.senseLocation} path`;
  return `${kind[0]!.toUpperCase()}${kind.slice(1)} converter with a ${rect}${light}, switching at ${formatHertz(d.spec.switchingFrequencyHz)}${dead}${sense}.`;
}

/** "94.05 % at 3.52 A", or the reason the landmark was not found. */
export function landmarkText(l: Landmark, value: (v: number) => string = (v) => formatPercent(v)): string {
  if (l.load === null || l.value === null) return l.reason ?? 'not found';
  const note = l.note ? ` (${l.note})` : '';
  return `${value(l.value)} at ${formatAmps(l.load)}${note}`;
}

/** "at 596 mA (efficiency there 88.20 %)", or the reason the landmark was not found. */
export function landmarkAt(l: Landmark, valueLabel: string, value: (v: number) => string): string {
  if (l.load === null) return l.reason ?? 'not found';
  const v = l.value === null ? '' : ` (${valueLabel} ${value(l.value)})`;
  return `at ${formatAmps(l.load)}${v}${l.note ? `. ${l.note}` : ''}`;
}

export function ceilingText(model: ReportModel): string {
  const c = model.landmarks.thermalCeiling;
  if (c.load === null) return c.reason ?? 'not found';
  const setBy = c.perPart.find((p) => p.part === c.part && p.limitKind === c.limitKind);
  const what = c.limitKind === 'touch' ? 'the touch limit of its surface' : 'its temperature limit less the margin';
  const threshold = setBy ? ` (${formatCelsius(setBy.thresholdC)})` : '';
  return `${formatAmps(c.load)}: the ${roleLabel(c.part ?? '').toLowerCase()} (${c.partName ?? ''}) reaches ${what}${threshold}.`;
}

/** A rating check's value against its limit, with the margin as a share of the limit. */
export function checkText(c: RatingCheck): { value: string; limit: string; margin: string } {
  const f = (x: number): string => {
    if (c.unit === '°C') return formatCelsius(x);
    if (c.unit === 'h') return formatHours(x);
    return formatEngineering(x, c.unit, 3, 'table');
  };
  return { value: f(c.value), limit: f(c.limit), margin: formatMarginFraction(c.marginFraction) };
}

/** The inputs a loss term used, as "name value; name value". */
export function inputsText(t: LossTerm): string {
  return t.inputs.map((i) => `${i.name} ${formatQuantity(i.value, i.unit)}`).join('; ');
}

export function shareText(watts: number, total: number): string {
  return total > 0 ? formatPercent(watts / total, 1) : '—';
}

