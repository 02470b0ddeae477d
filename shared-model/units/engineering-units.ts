/**
 * The units and SI prefixes that engineering entry (units/engineering.ts) understands.
 *
 * Canonical unit strings are the ones the engine's keys imply (design/key-units.ts): "V", "A", "Ω", "H",
 * "F", "Hz", "W", "s", "C" (coulomb), "J", "T", "W/m³", "V/K", "°C", "K", "K/W", "/K", "h", "m", "m²",
 * "m³" and "" (a plain number or ratio). Each has spellings a person may type; a spelling may carry its
 * own factor ("mm²" = 1e-6 m², "%/K" = 0.01 /K). Prefixes follow the SI Brochure (BIPM, 9th ed. 2019,
 * Table 7); "meg" is the circuit-simulator spelling of mega and "K" a common shorthand for kilo.
 */

export interface UnitInfo {
  /** What the unit measures, for messages ("inductance"). */
  quantity: string;
  /** Spellings with their factor to the canonical unit. */
  spellings: readonly (readonly [string, number])[];
  /** Whether SI prefixes may be put in front of it (no prefixes on °C, K, K/W, h, lengths...). */
  prefixes: boolean;
  /** Whether an upper-case "M" (mega) is a normal thing to write for it (see engineering.ts). */
  megaIsNormal: boolean;
}

const same = (...names: string[]): (readonly [string, number])[] => names.map((n) => [n, 1] as const);

export const UNITS: Readonly<Record<string, UnitInfo>> = {
  V: { quantity: 'voltage', spellings: same('V', 'v', 'volt', 'volts'), prefixes: true, megaIsNormal: false },
  A: { quantity: 'current', spellings: same('A', 'amp', 'amps'), prefixes: true, megaIsNormal: false },
  Ω: {
    quantity: 'resistance',
    spellings: same('Ω', '\u2126', 'ohm', 'Ohm', 'ohms', 'Ohms', 'OHM'),
    prefixes: true,
    megaIsNormal: true,
  },
  H: { quantity: 'inductance', spellings: same('H'), prefixes: true, megaIsNormal: false },
  F: { quantity: 'capacitance', spellings: same('F'), prefixes: true, megaIsNormal: false },
  Hz: { quantity: 'frequency', spellings: same('Hz', 'hz', 'HZ'), prefixes: true, megaIsNormal: true },
  W: { quantity: 'power', spellings: same('W'), prefixes: true, megaIsNormal: false },
  s: { quantity: 'time', spellings: same('s', 'sec'), prefixes: true, megaIsNormal: false },
  C: { quantity: 'charge', spellings: same('C'), prefixes: true, megaIsNormal: false },
  J: { quantity: 'energy', spellings: same('J'), prefixes: true, megaIsNormal: false },
  Wh: { quantity: 'energy in watt-hours', spellings: same('Wh'), prefixes: true, megaIsNormal: true },
  T: { quantity: 'flux density', spellings: same('T'), prefixes: true, megaIsNormal: false },
  'W/m³': {
    quantity: 'loss density',
    spellings: [...same('W/m³', 'W/m3', 'W/m^3'), ['W/cm³', 1e6], ['W/cm3', 1e6], ['W/cm^3', 1e6]],
    prefixes: true,
    megaIsNormal: true,
  },
  'V/K': { quantity: 'voltage temperature coefficient', spellings: same('V/K', 'V/°C'), prefixes: true, megaIsNormal: false },
  '°C': { quantity: 'temperature', spellings: same('°C', '℃', 'C', 'degC'), prefixes: false, megaIsNormal: false },
  K: { quantity: 'temperature difference', spellings: same('K'), prefixes: false, megaIsNormal: false },
  'K/W': { quantity: 'thermal resistance', spellings: same('K/W', '°C/W', 'C/W', '℃/W'), prefixes: false, megaIsNormal: false },
  '/K': {
    quantity: 'temperature coefficient',
    spellings: [...same('/K', '1/K', 'K^-1', 'K⁻¹'), ['%/K', 0.01], ['ppm/K', 1e-6]],
    prefixes: false,
    megaIsNormal: false,
  },
  h: { quantity: 'time in hours', spellings: same('h', 'hours', 'hour'), prefixes: false, megaIsNormal: false },
  m: {
    quantity: 'length',
    spellings: [['m', 1], ['cm', 1e-2], ['mm', 1e-3], ['µm', 1e-6], ['μm', 1e-6], ['um', 1e-6]],
    prefixes: false,
    megaIsNormal: false,
  },
  'm²': {
    quantity: 'area',
    spellings: [
      ...same('m²', 'm2', 'm^2'),
      ...(['cm²', 'cm2', 'cm^2'].map((s) => [s, 1e-4] as const)),
      ...(['mm²', 'mm2', 'mm^2'].map((s) => [s, 1e-6] as const)),
    ],
    prefixes: false,
    megaIsNormal: false,
  },
  'm³': {
    quantity: 'volume',
    spellings: [
      ...same('m³', 'm3', 'm^3'),
      ...(['cm³', 'cm3', 'cm^3'].map((s) => [s, 1e-6] as const)),
      ...(['mm³', 'mm3', 'mm^3'].map((s) => [s, 1e-9] as const)),
    ],
    prefixes: false,
    megaIsNormal: false,
  },
  '': { quantity: 'plain number', spellings: [['%', 0.01]], prefixes: true, megaIsNormal: true },
};

/** Units whose spellings are only recognised when the field asks for them (so "mm" is not "milli-milli"). */
export const ONLY_WHEN_ASKED: ReadonlySet<string> = new Set(['m', 'm²', 'm³']);

/** SI prefixes (BIPM SI Brochure 9th ed., Table 7) plus "meg"/"MEG"/"Meg" and the shorthand "K". */
export const PREFIXES: readonly (readonly [string, number])[] = [
  ['meg', 1e6],
  ['MEG', 1e6],
  ['Meg', 1e6],
  ['f', 1e-15],
  ['p', 1e-12],
  ['n', 1e-9],
  ['u', 1e-6],
  ['µ', 1e-6],
  ['μ', 1e-6],
  ['m', 1e-3],
  ['k', 1e3],
  ['K', 1e3],
  ['M', 1e6],
  ['G', 1e9],
];

/** Prefixes used when formatting, smallest to largest. */
export const FORMAT_PREFIXES: readonly (readonly [string, number])[] = [
  ['f', -15],
  ['p', -12],
  ['n', -9],
  ['µ', -6],
  ['m', -3],
  ['', 0],
  ['k', 3],
  ['M', 6],
  ['G', 9],
];
