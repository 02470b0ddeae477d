/**
 * Window size and position across sessions. A saved position is used only when enough of the window
 * (a strip of its top edge, where the title bar is) would land on a display that is connected now;
 * otherwise — monitor unplugged, resolution changed — the window opens centred on the primary display.
 * Sizes are clamped to the work area of the display the window lands on.
 */
import { z } from 'zod';

export interface Rectangle {
  x: number;
  y: number;
  width: number;
  height: number;
}

export interface DisplayArea {
  /** The display's work area (screen minus task bar / dock / menu bar). */
  workArea: Rectangle;
}

export interface WindowState {
  bounds: Rectangle;
  maximized: boolean;
}

export const DEFAULT_SIZE = { width: 1280, height: 860 } as const;
export const MIN_SIZE = { width: 800, height: 560 } as const;
/** How much of the top edge must be on a display for the saved position to count as visible. */
export const VISIBLE_STRIP = { width: 120, height: 32 } as const;

const rectangleSchema = z.object({ x: z.number().int(), y: z.number().int(), width: z.number().int().positive(), height: z.number().int().positive() });
export const storedWindowStateSchema = z.object({ format: z.literal('wattledger.window-state'), version: z.literal(1), bounds: rectangleSchema, maximized: z.boolean() });

function overlap(a: Rectangle, b: Rectangle): Rectangle {
  const x = Math.max(a.x, b.x);
  const y = Math.max(a.y, b.y);
  const width = Math.min(a.x + a.width, b.x + b.width) - x;
  const height = Math.min(a.y + a.height, b.y + b.height) - y;
  return { x, y, width: Math.max(0, width), height: Math.max(0, height) };
}

/** The display that shows the most of the window's title strip, or null when none shows enough. */
export function displayShowing(bounds: Rectangle, displays: readonly DisplayArea[]): DisplayArea | null {
  const strip: Rectangle = { x: bounds.x, y: bounds.y, width: bounds.width, height: Math.min(bounds.height, VISIBLE_STRIP.height) };
  let best: DisplayArea | null = null;
  let bestArea = 0;
  for (const display of displays) {
    const shared = overlap(strip, display.workArea);
    const area = shared.width * shared.height;
    if (shared.width >= Math.min(VISIBLE_STRIP.width, bounds.width) && shared.height >= Math.min(VISIBLE_STRIP.height, strip.height) && area > bestArea) {
      best = display;
      bestArea = area;
    }
  }
  return best;
}

function clampSize(width: number, height: number, area: Rectangle): { width: number; height: number } {
  return {
    width: Math.max(Math.min(width, area.width), Math.min(MIN_SIZE.width, area.width)),
    height: Math.max(Math.min(height, area.height), Math.min(MIN_SIZE.height, area.height)),
  };
}

function centred(size: { width: number; height: number }, area: Rectangle): Rectangle {
  return { x: Math.round(area.x + (area.width - size.width) / 2), y: Math.round(area.y + (area.height - size.height) / 2), ...size };
}

/**
 * Where to open the window. `saved` is whatever was stored (validated here); `displays[0]` must be the
 * primary display.
 */
export function restoreWindowState(saved: unknown, displays: readonly DisplayArea[]): WindowState {
  const primary = displays[0]?.workArea ?? { x: 0, y: 0, ...DEFAULT_SIZE };
  const fallback: WindowState = { bounds: centred(clampSize(DEFAULT_SIZE.width, DEFAULT_SIZE.height, primary), primary), maximized: false };
  const parsed = storedWindowStateSchema.safeParse(saved);
  if (!parsed.success) return fallback;
  const { bounds, maximized } = parsed.data;
  const display = displayShowing(bounds, displays);
  if (!display) return { ...fallback, maximized };
  const size = clampSize(bounds.width, bounds.height, display.workArea);
  const area = display.workArea;
  // Keep the whole window inside the work area it mostly sits on.
  const x = Math.min(Math.max(bounds.x, area.x), area.x + area.width - size.width);
  const y = Math.min(Math.max(bounds.y, area.y), area.y + area.height - size.height);
  return { bounds: { x, y, ...size }, maximized };
}

export function storedWindowState(state: WindowState): z.infer<typeof storedWindowStateSchema> {
  const { x, y, width, height } = state.bounds;
  return { format: 'wattledger.window-state', version: 1, bounds: { x: Math.round(x), y: Math.round(y), width: Math.round(width), height: Math.round(height) }, maximized: state.maximized };
}
