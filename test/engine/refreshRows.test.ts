import { describe, expect, it } from 'vitest';
import { refreshRows } from '../../src/engine/evaluation/totals';
import { blockTable } from '../../src/geometry/blockTable';
import { matGeometry } from '../../src/geometry/matGeometry';
import type { Block } from '../../src/model/block';
import { DEMO_PROCESS, FOLDED_8F2_CELL } from '../../src/model/builtins';
import { designWith, mat } from '../support/designs';

// Rows to refresh: mats side by side along their word lines, with the same extent across them, form one
// band that one row activation crosses, so a band counts its largest word-line count once. The band rule is
// common practice (no source); the expected counts are arithmetic on the layouts drawn here.

const F = DEMO_PROCESS.featureSize;
const m = mat();
const g = matGeometry(m, FOLDED_8F2_CELL, F); // 512 cells per bit line at half occupancy: 1,024 word lines
const rowsOf = (blocks: Block[]) => refreshRows(blockTable(designWith(blocks)));

describe('refresh rows', () => {
  it('a 2 × 2 grid of mats with vertical bit lines has two bands of 1,024 rows', () => {
    expect(g.wordlineCount).toBe(1024);
    const blocks = [0, 1].flatMap((r) =>
      [0, 1].map((c) => mat({ id: `m${r}${c}`, x: c * (g.width + 3e-6), y: r * (g.height + 6e-6) })),
    );
    expect(rowsOf(blocks)).toBe(2048);
  });

  it('mats of one band need not follow each other in the design', () => {
    const a1 = mat({ id: 'a1', x: 0, y: 0 });
    const b1 = mat({ id: 'b1', x: 0, y: g.height + 6e-6 });
    const a2 = mat({ id: 'a2', x: g.width + 3e-6, y: 0 });
    expect(rowsOf([a1, b1, a2])).toBe(2048);
  });

  it('a shorter mat in the same row is a band of its own', () => {
    const tall = mat({ id: 'tall' });
    const short = mat({ id: 'short', cellsPerBitline: 256, x: g.width + 3e-6 });
    expect(rowsOf([tall, short])).toBe(1024 + 512);
  });

  it('with horizontal bit lines, bands run down the page', () => {
    const blocks = [0, 1, 2].map((r) =>
      mat({ id: `h${r}`, bitlineAxis: 'horizontal', x: 0, y: r * (g.width + 6e-6) }),
    );
    // Three mats stacked, all starting at x = 0 with the same width: one band.
    expect(rowsOf(blocks)).toBe(1024);
  });

  it('counts nothing without mats', () => {
    expect(rowsOf([])).toBe(0);
  });
});
