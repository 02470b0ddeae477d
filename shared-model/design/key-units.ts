/**
 * The unit a design-document key is in, read from its suffix (design/parts.ts explains the suffixes).
 * Used for messages ("> 0 V") and by engineering entry (parseEngineering(text, unitOfKey(key))).
 * Returns a canonical unit of units/engineering-units.ts; "" means a plain number or ratio.
 */

/** Keys that are ratios or plain numbers although their names end like a unit. */
const PLAIN: ReadonlySet<string> = new Set([
  'maxDuty',
  'efficiencyAtRated',
  'efficiencyAtLightLoad',
  'inductorRippleRatio',
  'rippleCurrentDerating',
  'resistorPowerDerating',
  'voltageDerating',
  'currentDerating',
  'porosity',
  'hotRatio',
  'racOverRdc',
  'turns',
  'layers',
  'count',
  'k',
  'alpha',
  'beta',
  'exponent',
  'version',
]);

/** Suffixes checked longest first; charges (q...C, ...QrrC) are told apart from temperatures (...C). */
const SUFFIXES: readonly (readonly [RegExp, string])[] = [
  [/VPerK$/, 'V/K'],
  [/KPerW$/, 'K/W'],
  [/PerK$/, '/K'],
  [/WPerM3$/, 'W/m³'],
  [/M2$/, 'm²'],
  [/M3$/, 'm³'],
  [/Hz$/, 'Hz'],
  [/Ohm$/, 'Ω'],
  [/Hours$/, 'h'],
  [/[a-z0-9]Wh$/, 'Wh'],
  [/^q[a-z0-9]*C$|QrrC$/, 'C'],
  [/C$/, '°C'],
  [/[a-z0-9]K$/, 'K'],
  [/[a-z0-9]V$/, 'V'],
  [/[a-z0-9]A$/, 'A'],
  [/[a-z0-9]H$/, 'H'],
  [/[a-z0-9]F$/, 'F'],
  [/[a-z0-9]W$/, 'W'],
  [/[a-z0-9]S$/, 's'],
  [/[a-z0-9]J$/, 'J'],
  [/[a-z0-9]T$/, 'T'],
  [/[a-z0-9]M$/, 'm'],
];

/** Unit of a key such as "rdsOn25Ohm" (Ω), "qgC" (C), "ambientC" (°C), "maxDuty" (""). */
export function unitOfKey(key: string): string {
  if (PLAIN.has(key)) return '';
  for (const [pattern, unit] of SUFFIXES) if (pattern.test(key)) return unit;
  return '';
}

/** Unit of the last key of a dotted path ("parts.switch.qgC" → "C"; "thermal.heatsinks[0].thetaSaKPerW"). */
export function unitOfPath(path: string): string {
  const last = path.split('.').pop() ?? '';
  return unitOfKey(last.replace(/\[\d+\]$/, ''));
}
