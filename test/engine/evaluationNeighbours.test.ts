import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { gridFloorplan } from '../../src/designs/gridFloorplan';
import { evaluationNeighbours } from '../../src/engine/evaluation/evaluate';
import { findPositionedOverlaps } from '../../src/engine/evaluation/overlaps';
import { blockTable, MAT_CODE, type BlockTable } from '../../src/geometry/blockTable';
import { groupedGridTable } from '../../src/geometry/neighbourGrid';
import { neighboursOf, type NeighbourTable } from '../../src/geometry/neighbourRows';
import { ABUTMENT_TOLERANCE } from '../../src/geometry/rect';
import { DEMO_PROCESS, FOLDED_8F2_CELL } from '../../src/model/builtins';
import type { Block } from '../../src/model/block';
import { benchGridSpec } from '../bench/benchGrid';
import { designWith } from '../support/designs';

/** The grid pass with evaluation's groups: the oracle for the banded pass evaluation takes first. */
function byGrid(table: BlockTable): NeighbourTable {
  const isMat = Uint8Array.from(table.type, (code) => (code === MAT_CODE ? 1 : 0));
  return groupedGridTable(table, ABUTMENT_TOLERANCE, isMat);
}

function rows(table: NeighbourTable, n: number): number[][] {
  return Array.from({ length: n }, (_, i) => neighboursOf(table, i));
}

/** Moves that keep a tiled array nearly tiled: on and around the tolerance, rounding-sized, a micron. */
const shift = fc.constantFrom(
  ABUTMENT_TOLERANCE,
  -ABUTMENT_TOLERANCE,
  ABUTMENT_TOLERANCE / 2,
  3 * ABUTMENT_TOLERANCE,
  1e-20,
  -1e-6,
  2e-6,
  -20e-6,
);

/** Tiled arrays of a few sizes, some blocks moved, resized or copied onto others. */
const tiled = fc
  .record({
    rows: fc.integer({ min: 1, max: 9 }),
    columns: fc.integer({ min: 3, max: 9 }),
    cellsPerBitline: fc.constantFrom(64, 128, 512),
    edits: fc.array(
      fc.record({
        at: fc.nat(),
        kind: fc.constantFrom('x', 'y', 'width', 'height', 'copy'),
        by: shift,
      }),
      { maxLength: 5 },
    ),
  })
  .map(({ rows: matRows, columns, cellsPerBitline, edits }) => {
    const blocks: Block[] = gridFloorplan({
      cell: FOLDED_8F2_CELL,
      featureSize: DEMO_PROCESS.featureSize,
      ...benchGridSpec(1, cellsPerBitline),
      matRows,
      matColumns: columns,
    });
    for (const { at, kind, by } of edits) {
      const k = at % blocks.length;
      const block = blocks[k] as Block;
      if (kind === 'copy') blocks.splice(k, 0, { ...block, id: `${block.id}-copy`, x: block.x + by });
      else if (kind === 'x' || kind === 'y') blocks[k] = { ...block, [kind]: block[kind] + by };
      else if (block.type !== 'mat') blocks[k] = { ...block, [kind]: Math.max(1e-7, block[kind] + by) };
    }
    return designWith(blocks);
  });

describe('evaluationNeighbours: banded where the floorplan is written in rows, the grid elsewhere', () => {
  it('gives the grid pass rows and the same overlaps on tiled arrays, edited ones included', () => {
    fc.assert(
      fc.property(tiled, (design) => {
        const table = blockTable(design);
        const neighbours = evaluationNeighbours(table);
        const grid = byGrid(table);
        expect(rows(neighbours, table.count)).toEqual(rows(grid, table.count));
        expect(findPositionedOverlaps(table, neighbours)).toEqual(findPositionedOverlaps(table, grid));
      }),
      { numRuns: 150 },
    );
  }, 60_000);

  it('takes the banded pass on the benches’ 64 × 64 array, with the grid’s rows and no overlaps', () => {
    const design = designWith(
      gridFloorplan({ cell: FOLDED_8F2_CELL, featureSize: DEMO_PROCESS.featureSize, ...benchGridSpec(64) }),
    );
    const table = blockTable(design);
    const neighbours = evaluationNeighbours(table);
    expect(neighbours.shared?.count).toBe(0);
    const grid = byGrid(table);
    expect(Array.from(neighbours.start)).toEqual(Array.from(grid.start));
    expect(Array.from(neighbours.end.subarray(0, table.count))).toEqual(
      Array.from(grid.end.subarray(0, table.count)),
    );
    expect(Array.from(neighbours.list)).toEqual(Array.from(grid.list));
  }, 60_000);
});
