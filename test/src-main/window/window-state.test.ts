import { describe, expect, it } from 'vitest';
import { DEFAULT_SIZE, MIN_SIZE, restoreWindowState, storedWindowState, type DisplayArea } from '../../../src-main/window/window-state.ts';

const laptop: DisplayArea = { workArea: { x: 0, y: 0, width: 1920, height: 1040 } };
const rightMonitor: DisplayArea = { workArea: { x: 1920, y: 0, width: 2560, height: 1400 } };
const stored = (x: number, y: number, width = 1200, height = 800, maximized = false): unknown => storedWindowState({ bounds: { x, y, width, height }, maximized });

describe('restoreWindowState()', () => {
  it('restores a saved window that is on a connected display', () => {
    expect(restoreWindowState(stored(100, 80), [laptop])).toEqual({ bounds: { x: 100, y: 80, width: 1200, height: 800 }, maximized: false });
    expect(restoreWindowState(stored(2100, 200), [laptop, rightMonitor]).bounds).toEqual({ x: 2100, y: 200, width: 1200, height: 800 });
  });

  it('centres the window on the primary display when its monitor is gone', () => {
    const restored = restoreWindowState(stored(2100, 200), [laptop]);
    // Centre = area origin + (area size − window size) / 2, plain geometry.
    expect(restored.bounds).toEqual({ x: (1920 - DEFAULT_SIZE.width) / 2, y: (1040 - DEFAULT_SIZE.height) / 2, width: DEFAULT_SIZE.width, height: DEFAULT_SIZE.height });
  });

  it('does not trust a window whose title strip is off screen (only a sliver visible)', () => {
    expect(restoreWindowState(stored(1900, 100), [laptop]).bounds.x).toBe((1920 - DEFAULT_SIZE.width) / 2); // 20 px visible < strip width
    expect(restoreWindowState(stored(100, -790), [laptop]).bounds.y).toBe((1040 - DEFAULT_SIZE.height) / 2); // title bar above the screen
  });

  it('pulls a partly visible window fully onto its display and shrinks it to fit', () => {
    expect(restoreWindowState(stored(1000, 500), [laptop]).bounds).toEqual({ x: 720, y: 240, width: 1200, height: 800 }); // 1920−1200, 1040−800
    expect(restoreWindowState(stored(0, 0, 4000, 3000), [laptop]).bounds).toEqual({ x: 0, y: 0, width: 1920, height: 1040 });
  });

  it('never opens smaller than the minimum size when the display allows it', () => {
    expect(restoreWindowState(stored(10, 10, 200, 100), [laptop]).bounds).toMatchObject({ width: MIN_SIZE.width, height: MIN_SIZE.height });
  });

  it('keeps the maximized flag and ignores stored junk', () => {
    expect(restoreWindowState(stored(100, 80, 1200, 800, true), [laptop]).maximized).toBe(true);
    for (const junk of [null, 'x', { bounds: { x: 'a' } }, { format: 'wattledger.window-state', version: 1, bounds: { x: 0, y: 0, width: -5, height: 10 }, maximized: false }]) {
      expect(restoreWindowState(junk, [laptop]).bounds.width).toBe(DEFAULT_SIZE.width);
    }
  });
});
