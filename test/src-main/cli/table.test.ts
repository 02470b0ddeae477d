import { describe, expect, it } from 'vitest';
import { renderTable, section } from '../../../src-main/cli/table.ts';

describe('renderTable aligns columns for a terminal', () => {
  it('pads text left and numbers right, two spaces apart, without trailing spaces', () => {
    const text = renderTable([{ title: 'Part' }, { title: 'Loss', align: 'right' }], [['switch', '53 mW'], ['inductor', '1.2 W']]);
    expect(text.split('\n')).toEqual(['Part       Loss', 'switch    53 mW', 'inductor  1.2 W']);
  });

  it('counts µ and ° as one column each', () => {
    const text = renderTable([{ title: 'a' }, { title: 'b', align: 'right' }], [['x', '4.7 µH'], ['y', '25 °C']]);
    expect(text.split('\n').map((l) => [...l].length)).toEqual([9, 9, 9]); // 1 + 2 + width of "4.7 µH" (6)
  });

  it('underlines a section title', () => {
    expect(section('Losses', 'x')).toBe('Losses\n------\nx\n');
  });
});
