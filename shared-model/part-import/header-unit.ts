/**
 * A column header split into its name and its unit: "Rds(on) (mOhm)" → name "Rds(on)", unit "mOhm";
 * "Qg [nC]" → "Qg", "nC"; "Capacitance, µF" → "Capacitance", "µF"; "Isat A" → "Isat", "A".
 * A trailing bracketed group, the text after the last comma, or the last word counts as the unit only
 * when engineering entry reads "1 <unit>" as a prefixed unit (units/engineering.ts); otherwise it stays
 * part of the name ("Rds(on)" keeps "(on)"). `normaliseHeader` turns a name into the form aliases are
 * compared in: lower case, Greek and symbol letters spelled out, everything but letters and digits dropped.
 */
import { parseEngineering } from '../units/engineering.ts';
import { UNITS } from '../units/engineering-units.ts';

export interface HeaderParts {
  name: string;
  /** The unit as written ("mOhm", "%", "°C"); "" when the header names none. */
  unit: string;
}

const CANDIDATES: readonly RegExp[] = [/^(.*\S)\s*\(([^()]+)\)$/, /^(.*\S)\s*\[([^[\]]+)\]$/, /^(.*\S)\s*,\s*([^,]+)$/, /^(.*\S)\s+in\s+(\S+)$/i, /^(.*\S)\s+(\S+)$/];

/**
 * True when `unit` reads as a unit (with or without prefix) in engineering entry: by itself, or in a field
 * of some unit (lengths, and "K" that alone could also be kilo). A bare prefix ("m", "k") is not a unit.
 */
export function isUnitText(unit: string): boolean {
  if (unit.trim() === '%') return true;
  const plain = parseEngineering(`1 ${unit}`);
  if (plain.ok) return plain.unit !== '';
  return Object.keys(UNITS).some((expected) => parseEngineering(`1 ${unit}`, expected).ok);
}

/**
 * The ways to read a header, most likely first: with its unit split off (bracketed, after a comma, after
 * "in", the last word), then the whole header as a name. A guess takes the first reading whose name is
 * known and whose unit fits the field ("ESR at fs" is a name, not "ESR at" in femtoseconds).
 */
export function headerReadings(header: string): HeaderParts[] {
  const text = header.replace(/\s+/g, ' ').trim();
  const out: HeaderParts[] = [];
  for (const pattern of CANDIDATES) {
    const m = pattern.exec(text);
    if (m && isUnitText(m[2] ?? '')) out.push({ name: (m[1] ?? '').trim(), unit: (m[2] ?? '').trim() });
  }
  out.push({ name: text, unit: '' });
  return out;
}

/** "RDS(on) at 25 °C" → "rdsonat25c"; "θJC" → "thetajc"; "Rac / Rdc" → "racrdc". */
export function normaliseHeader(name: string): string {
  return name
    .toLowerCase()
    .replace(/θ/g, 'theta')
    .replace(/α/g, 'alpha')
    .replace(/β/g, 'beta')
    .replace(/[µμ]/g, 'u')
    .replace(/[ωΩ\u2126]/g, 'ohm')
    .normalize('NFKD')
    .replace(/[^a-z0-9]/g, '');
}
