/**
 * The report's number formats: one function per kind of number, so the report view, the CSV files and
 * the tests that read the printed PDF all write a value the same way. Format only: nothing here computes
 * physics. Numbers with SI prefixes go through the one formatter, `formatEngineering` (units/engineering.ts),
 * in its table style, as the results on screen do. Fixed precision keeps the table columns aligned (trailing zeros are kept: "1.10 W").
 * Negative numbers use the minus sign U+2212; a value that is not finite is written "—".
 */

import { formatEngineering } from '../units/engineering.ts';

const MINUS = '\u2212';
const DASH = '—';

const signed = (text: string, negative: boolean): string => (negative ? `${MINUS}${text}` : text);

/** Fixed decimals, U+2212 for negatives, "−0.0" written "0.0". */
export function formatFixed(value: number, decimals: number): string {
  if (!Number.isFinite(value)) return DASH;
  const text = Math.abs(value).toFixed(decimals);
  const zero = Number(text) === 0;
  return signed(text, value < 0 && !zero);
}

/** Significant digits with an SI prefix, trailing zeros kept: the one formatter's table style. */
const si = (value: number, unit: string, significantDigits = 3): string => formatEngineering(value, unit, significantDigits, 'table');

/** Efficiency or any ratio as a percentage with fixed decimals: 0.93728 → "93.73 %". */
export function formatPercent(fraction: number, decimals = 2): string {
  if (!Number.isFinite(fraction)) return DASH;
  return `${formatFixed(fraction * 100, decimals)} %`;
}

/** A figure that may be not available (sweep/figures-of-merit.ts): its percentage, or its reason. */
export function formatFigurePercent(f: { available: true; value: number } | { available: false; reason: string }): string {
  return f.available ? formatPercent(f.value) : f.reason;
}

/** A power in watts, 3 significant digits with prefix ("1.10 W", "42.0 mW"). */
export const formatWatts = (watts: number): string => si(watts, 'W', 3);

/** A temperature in °C with one decimal ("47.3 °C"). */
export const formatCelsius = (celsius: number): string => (Number.isFinite(celsius) ? `${formatFixed(celsius, 1)} °C` : DASH);

/** A temperature difference or margin in K with one decimal ("87.7 K", "−4.2 K"). */
export const formatKelvin = (kelvin: number): string => (Number.isFinite(kelvin) ? `${formatFixed(kelvin, 1)} K` : DASH);

/** A current in amperes, 3 significant digits ("5.00 A", "250 mA"). */
export const formatAmps = (amps: number): string => si(amps, 'A', 3);

/** A voltage, 3 significant digits ("14.4 V"). */
export const formatVolts = (volts: number): string => si(volts, 'V', 3);

/** A frequency, 3 significant digits ("500 kHz"). */
export const formatHertz = (hertz: number): string => si(hertz, 'Hz', 3);

/** A duty cycle or other fraction of a period as a percentage with one decimal ("27.5 %"). */
export const formatDuty = (fraction: number): string => formatPercent(fraction, 1);

/** A margin fraction (limit − value)/limit as a percentage of the limit, one decimal ("34.9 %"). */
export const formatMarginFraction = (fraction: number): string => formatPercent(fraction, 1);

/** Hours, whole numbers with thin grouping ("32 000 h"). */
export function formatHours(hours: number): string {
  if (!Number.isFinite(hours)) return DASH;
  const whole = Math.round(Math.abs(hours)).toString().replace(/\B(?=(\d{3})+(?!\d))/g, '\u2009');
  return `${signed(whole, hours < 0 && Math.round(hours) !== 0)} h`;
}

/** Any value with its SI unit symbol, as the loss terms list their inputs ("7.52 A", "4.00 nC", "0.95"). */
export function formatQuantity(value: number, unit: string): string {
  if (unit === '°C') return formatCelsius(value);
  if (unit === 'K') return formatKelvin(value);
  const bare = unit === '' || unit.startsWith('/') || unit.startsWith('%') || unit === 'h' || unit === 'W/m³' || unit.includes('/');
  if (bare) {
    const text = formatEngineering(value, '', 3, 'table');
    return unit === '' ? text : `${text} ${unit}`;
  }
  return si(value, unit, 3);
}

/**
 * Decimals for the power-balance line: enough that the total loss shows at least four significant
 * digits, so "input = output + losses" can be checked by hand on the printed page.
 */
export function balanceDecimals(totalLossW: number): number {
  if (!(Number.isFinite(totalLossW) && totalLossW > 0)) return 3;
  return Math.min(9, Math.max(3, 3 - Math.floor(Math.log10(totalLossW))));
}

/** Watts with fixed decimals, for the power-balance line ("17.604 W"). */
export const formatWattsFixed = (watts: number, decimals: number): string =>
  Number.isFinite(watts) ? `${formatFixed(watts, decimals)} W` : DASH;
