import { describe, expect, it } from 'vitest';
import { windowTitle } from '../../../src-main/window/title.ts';

describe('windowTitle()', () => {
  it('shows the file name, then the app name', () => {
    expect(windowTitle({ name: 'buck-12v.json', dirty: false })).toBe('buck-12v.json — WattLedger');
  });
  it('marks unsaved changes in front, as the browser version does', () => {
    expect(windowTitle({ name: 'buck-12v.json', dirty: true })).toBe('● buck-12v.json — WattLedger');
  });
  it('names an unnamed document "Untitled"', () => {
    expect(windowTitle({ name: '  ', dirty: true })).toBe('● Untitled — WattLedger');
  });
});
