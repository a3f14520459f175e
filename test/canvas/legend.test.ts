import { describe, expect, it } from 'vitest';
import { BLOCK_STYLE, LEGEND_ROWS } from '../../src/canvas/blockStyle';
import { BLOCK_TYPES } from '../../src/model/block';

describe('the legend (status bar and exported image read the same rows)', () => {
  it('shows every block colour once, in block-type order, then the two check markers', () => {
    const colours = LEGEND_ROWS.filter((r) => !r.marker).map((r) => r.fill);
    expect(new Set(colours).size).toBe(colours.length);
    for (const type of BLOCK_TYPES) expect(colours).toContain(BLOCK_STYLE[type].fill);
    expect(colours[0]).toBe(BLOCK_STYLE.mat.fill);
    expect(LEGEND_ROWS.filter((r) => r.marker).map((r) => r.label)).toEqual(['error', 'warning']);
    expect(LEGEND_ROWS.find((r) => r.fill === BLOCK_STYLE.rowDecoder.fill)?.title).toBe(
      'row decoder, column decoder',
    );
  });
});
