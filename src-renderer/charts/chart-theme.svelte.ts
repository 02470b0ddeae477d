/**
 * Chart colours come from CSS variables (app.css for the surface and text, chart-palette.css for the
 * series), read when a chart is drawn. `themeClock.version` changes when the theme attribute on <html>
 * changes, so every chart re-reads its colours and redraws in place.
 */
import './chart-palette.css';
import type { Tone } from './chart-data.ts';

export const SERIES_SLOTS = 12;

export interface ChartPalette {
  surface: string;
  text: string;
  muted: string;
  grid: string;
  series: string[];
  named: Record<Exclude<Tone, number>, string>;
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
  return typeof tone === 'number' ? palette.series[((tone % SERIES_SLOTS) + SERIES_SLOTS) % SERIES_SLOTS] : palette.named[tone];
}

/** The colour with an alpha (for fills), from #rrggbb. */
export function withAlpha(colour: string, alpha: number): string {
  const m = /^#([0-9a-f]{6})$/i.exec(colour);
  if (!m) return colour;
  const n = parseInt(m[1], 16);
  return `rgba(${(n >> 16) & 255}, ${(n >> 8) & 255}, ${n & 255}, ${alpha})`;
}
