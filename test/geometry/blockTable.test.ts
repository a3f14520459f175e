import { describe, expect, it } from 'vitest';
import { BLOCK_TYPE_CODES, blockTable, kindAt, rectAt } from '../../src/geometry/blockTable';
import { withBlocksReplaced } from '../../src/geometry/replacedBlocks';
import { matGeometry, matRect } from '../../src/geometry/matGeometry';
import { placeBlocks } from '../../src/geometry/placedBlocks';
import type { Block } from '../../src/model/block';
import { GAIN_3T_CELL, OPEN_6F2_CELL } from '../../src/model/builtins';
import { demoDesign } from '../../src/designs/demoDesign';
import { designWith, mat } from '../support/designs';

// The table lays out every block: a strip is its own rectangle, a mat is as large as its cell, counts and F
// make it (matGeometry). Expected values are the layouts themselves (no source needed).

const mixed: Block[] = [
  mat({ id: 'a' }),
  mat({ id: 'b', x: 50e-6 }),
  { id: 's', name: 's', type: 'senseAmpStrip', x: 0, y: -6e-6, width: 40e-6, height: 6e-6 },
  mat({ id: 'c', cellId: OPEN_6F2_CELL.id, bitlineAxis: 'horizontal', x: 0, y: 80e-6 }),
  mat({ id: 'd', x: 100e-6 }),
  mat({ id: 'e', cellId: GAIN_3T_CELL.id, cellsPerBitline: 64, cellsPerWordline: 128, y: 200e-6 }),
  { id: 'sp', name: 'sp', type: 'spacer', x: 300e-6, y: 0, width: 1e-6, height: 1e-6 },
];

describe('blockTable', () => {
  it.each([
    ['the demo design', demoDesign()],
    ['mats of several kinds between strips', designWith(mixed)],
  ])('gives %s the rectangle and type of every block', (_name, design) => {
    const table = blockTable(design);
    expect(table.count).toBe(design.blocks.length);
    design.blocks.forEach((block, i) => {
      expect(BLOCK_TYPE_CODES[table.type[i] ?? -1]).toBe(block.type);
      if (block.type !== 'mat') {
        expect(rectAt(table, i)).toEqual({
          x: block.x,
          y: block.y,
          width: block.width,
          height: block.height,
        });
        expect(table.kindOf[i]).toBe(-1);
        return;
      }
      const cell = design.cells.find((c) => c.id === block.cellId);
      if (!cell) throw new Error(`no cell ${block.cellId}`);
      const geometry = matGeometry(block, cell, design.process.featureSize);
      expect(rectAt(table, i)).toEqual(matRect(block, geometry));
      expect(kindAt(table, i).geometry).toEqual(geometry);
    });
    // The canvas's placed blocks are the same layout as objects.
    expect(
      placeBlocks(design).map(({ rect: r }) => ({ x: r.x, y: r.y, width: r.width, height: r.height })),
    ).toEqual(design.blocks.map((_, i) => rectAt(table, i)));
  });

  it('keeps every strip’s size bit for bit where a row fills in its stretch (0 beside −0 included)', () => {
    const strip = (id: string, x: number, width: number): Block => ({
      id,
      name: id,
      type: 'senseAmpStrip',
      x,
      y: 0,
      width,
      height: 1e-6,
    });
    const blocks = [strip('a', 0, 2e-6), strip('b', 2e-6, 2e-6), strip('c', 4e-6, 0), strip('d', 4e-6, -0)];
    const table = blockTable(designWith(blocks));
    blocks.forEach((block, i) =>
      expect(Object.is(table.width[i], (block as { width: number }).width)).toBe(true),
    );
  });

  it('gives mats of one cell, counts and axis one kind, and others their own', () => {
    const table = blockTable(designWith(mixed));
    const kindOf = (id: string) => table.kindOf[table.blocks.findIndex((b) => b.id === id)];
    expect(kindOf('a')).toBe(kindOf('b'));
    expect(kindOf('d')).toBe(kindOf('a'));
    expect(new Set(['a', 'c', 'e'].map(kindOf)).size).toBe(3);
    expect(table.kinds).toHaveLength(3);
  });

  it('names a block that is not a mat when asked for its kind', () => {
    const table = blockTable(designWith(mixed));
    expect(() => kindAt(table, 2)).toThrow('block s is not a mat');
  });

  it('refuses a mat whose cell the design lacks', () => {
    expect(() => blockTable(designWith([mat({ cellId: 'no-such-cell' })]))).toThrow(
      'unknown cell "no-such-cell"',
    );
  });

  it('replaces blocks in a copy and leaves the original as it was', () => {
    const base = blockTable(designWith(mixed));
    const before = rectAt(base, 1);
    const moved = withBlocksReplaced(
      base,
      new Map([[1, mat({ id: 'b', x: 70e-6, cellId: OPEN_6F2_CELL.id, cellsPerBitline: 256 })]]),
    );
    expect(rectAt(base, 1)).toEqual(before);
    expect(moved.x[1]).toBe(70e-6);
    expect(kindAt(moved, 1).cell.id).toBe(OPEN_6F2_CELL.id);
    expect(kindAt(moved, 1).block.cellsPerBitline).toBe(256);
    expect(base.kinds).toHaveLength(3);
    expect(rectAt(moved, 0)).toEqual(rectAt(base, 0));
  });
});
