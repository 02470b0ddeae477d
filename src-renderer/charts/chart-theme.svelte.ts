/**
 * Chart colours come from CSS variables (app.css for the surface and text, chart-palette.css for the
 * series), read when a chart is drawn. `themeClock.version` changes when the theme attribute on <html>
 * changes, so every chart re-reads its colours and redraws in place.
 */
import './chart-palette.css';
import type { PartTone, Tone } from './chart-data.ts';

export const SERIES_SLOTS = 12;

/** The part roles with a hue of their own (chart-palette.css --part-<role>). */
const PART_HUES = ['switch', 'rectifier', 'inductor', 'inputCapacitor', 'outputCapacitor', 'senseResistor', 'controller'] as const;

export interface ChartPalette {
  surface: string;
  text: string;
  muted: string;
  grid: string;
  series: string[];
  named: Record<Exclude<Tone, number | PartTone>, string>;
  parts: Record<string, string>;
  heat: { low: string; mid: string; high: string; missing: string };
}

class ThemeClock {
  version = $state(0);
  #started = false;

  /** Starts watching <html data-theme> (once; charts call it when they mount). */
  watch(): void {
    if (this.#started || typeof MutationObserver === 'undefined') return;
    this.#started = true;
    new MutationObserver(() => this.version++).observe(document.documentElement, { attributes: true, attributeFilter: ['data-theme', 'class'] });
  }
}

export const themeClock = new ThemeClock();

export function readPalette(): ChartPalette {
  const style = getComputedStyle(document.documentElement);
  const v = (name: string, fallback: string) => style.getPropertyValue(name).trim() || fallback;
  return {
    surface: v('--surface', '#ffffff'),
    text: v('--text', '#1b1f24'),
    muted: v('--muted', '#535c66'),
    grid: v('--border', '#c9cfd6'),
    series: Array.from({ length: SERIES_SLOTS }, (_, i) => v(`--series-${i}`, '#1f5fa8')),
    named: {
      accent: v('--accent', '#0a6449'),
      danger: v('--danger', '#a8231b'),
      caution: v('--caution', '#7a4f00'),
      muted: v('--muted', '#535c66'),
      text: v('--text', '#1b1f24'),
      focus: v('--focus', '#1b5fc1'),
    },
    parts: Object.fromEntries(PART_HUES.map((role) => [role, v(`--part-${role}`, '#1f5fa8')])),
    heat: { low: v('--heat-low', '#e9f1f8'), mid: v('--heat-mid', '#6fa6c9'), high: v('--heat-high', '#1b3d6b'), missing: v('--heat-missing', '#c9cfd6') },
  };
}

let cached: { version: number; palette: ChartPalette } | null = null;

/** The palette for the given theme version (read from CSS once per theme change). */
export function currentPalette(version: number): ChartPalette {
  if (!cached || cached.version !== version) cached = { version, palette: readPalette() };
  return cached.palette;
}

export function toneColour(palette: ChartPalette, tone: Tone): string {
  if (typeof tone === 'number') return palette.series[((tone % SERIES_SLOTS) + SERIES_SLOTS) % SERIES_SLOTS];
  if (typeof tone === 'string') return palette.named[tone];
  return mixColours(palette.parts[tone.part] ?? palette.named.muted, palette.surface, tone.shade ?? 0);
}

/** `a` moved towards `b` by t (0…1), per sRGB channel, from #rrggbb; anything else returns `a`. */
export function mixColours(a: string, b: string, t: number): string {
  const pa = /^#([0-9a-f]{6})$/i.exec(a);
  const pb = /^#([0-9a-f]{6})$/i.exec(b);
  if (!pa || !pb || t <= 0) return a;
  const na = parseInt(pa[1], 16);
  const nb = parseInt(pb[1], 16);
  const channel = (shift: number) => Math.round(((na >> shift) & 255) * (1 - t) + ((nb >> shift) & 255) * t);
  return `#${((channel(16) << 16) | (channel(8) << 8) | channel(0)).toString(16).padStart(6, '0')}`;
}

/** The colour with an alpha (for fills), from #rrggbb. */
export function withAlpha(colour: string, alpha: number): string {
  const m = /^#([0-9a-f]{6})$/i.exec(colour);
  if (!m) return colour;
  const n = parseInt(m[1], 16);
  return `rgba(${(n >> 16) & 255}, ${(n >> 8) & 255}, ${n & 255}, ${alpha})`;
}
