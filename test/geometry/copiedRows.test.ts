import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { bandedNeighbourTable } from '../../src/geometry/bandedPairs';
import { ANY_BOXES, MAT_GROUP, NO_REPEATS } from '../support/bandLimits';
import { blockTable, boxesOf } from '../../src/geometry/blockTable';
import type { NeighbourTable } from '../../src/geometry/neighbourRows';
import { ABUTMENT_TOLERANCE } from '../../src/geometry/rect';
import { gridFloorplan } from '../../src/designs/gridFloorplan';
import { DEMO_STRIPS } from '../../src/designs/demoSizes';
import { BUILTIN_CELLS, DEMO_PROCESS } from '../../src/model/builtins';
import { designWith } from '../support/designs';
import { editedGridFloorplan, irregularFloorplan, stripChainFloorplan } from '../support/randomFloorplans';
import { rowsByRun as rowsByRunBefore } from '../support/runRowsBefore';

/*
 * A run's rows written from its model run's by stretches of rows stepping alike (copiedRows.ts) against
 * the neighbour-by-neighbour copy they replaced (test/support/runRowsBefore.ts) and against rows filled
 * from every pair (no walk repeated, so no run copies another): the same start, end and list arrays.
 */

const MICRON = 1e-6;

function arrays(table: NeighbourTable | null) {
  return (
    table && { start: Array.from(table.start), end: Array.from(table.end), list: Array.from(table.list) }
  );
}

/** The three tables of a floorplan: rows copied by stretches, copied the old way, and from every pair. */
function sameRows(table: ReturnType<typeof blockTable>): void {
  const copied = bandedNeighbourTable(table, ABUTMENT_TOLERANCE, table.type, MAT_GROUP, ANY_BOXES);
  const before = bandedNeighbourTable(
    table,
    ABUTMENT_TOLERANCE,
    table.type,
    MAT_GROUP,
    ANY_BOXES,
    rowsByRunBefore,
  );
  const paired = bandedNeighbourTable(table, ABUTMENT_TOLERANCE, table.type, MAT_GROUP, NO_REPEATS);
  expect(arrays(copied)).toEqual(arrays(before));
  expect(arrays(copied)).toEqual(arrays(paired));
}

/** A tiled grid with every row of strips or mats nudged, cut short or left out now and then. */
const tiledGrid = fc
  .record({
    rows: fc.integer({ min: 1, max: 9 }),
    columns: fc.integer({ min: 1, max: 9 }),
    cell: fc.constantFrom(...BUILTIN_CELLS.map((c) => c.id)),
    cellsPerBitline: fc.constantFrom(64, 256),
    edits: fc.array(
      fc.record({
        at: fc.nat(),
        what: fc.constantFrom('nudge', 'shorten', 'remove', 'widen'),
        by: fc.constantFrom(ABUTMENT_TOLERANCE, -ABUTMENT_TOLERANCE, 1e-21, MICRON, -0),
      }),
      { maxLength: 4 },
    ),
  })
  .map(({ rows, columns, cell, cellsPerBitline, edits }) => {
    const blocks = gridFloorplan({
      cell: BUILTIN_CELLS.find((c) => c.id === cell) ?? (BUILTIN_CELLS[0] as (typeof BUILTIN_CELLS)[number]),
      featureSize: DEMO_PROCESS.featureSize,
      matRows: rows,
      matColumns: columns,
      cellsPerBitline,
      cellsPerWordline: 128,
      ...DEMO_STRIPS,
    });
    for (const { at, what, by } of edits) {
      const i = at % blocks.length;
      const b = blocks[i];
      if (!b) continue;
      if (what === 'remove') blocks.splice(i, 1);
      else if (what === 'nudge') blocks[i] = { ...b, x: b.x + by };
      else if (b.type !== 'mat')
        blocks[i] = { ...b, width: b.width + (what === 'widen' ? MICRON : -b.width / 2) };
    }
    return blocks;
  });

describe('rows of a run written from its model run by stretches', () => {
  it('equal the neighbour-by-neighbour copy and rows from every pair on tiled grids, nudged and cut', () => {
    fc.assert(
      fc.property(tiledGrid, (blocks) => sameRows(blockTable(designWith(blocks)))),
      { numRuns: 400 },
    );
  }, 60_000);

  it('on edited grids, irregular floorplans and strip chains', () => {
    const floorplans = fc.oneof(editedGridFloorplan, irregularFloorplan, stripChainFloorplan);
    fc.assert(
      fc.property(floorplans, (blocks) => sameRows(blockTable(designWith(blocks)))),
      { numRuns: 600 },
    );
  }, 60_000);

  it('on rows of boxes whose neighbours do not step alike from row to row', () => {
    // Row pairs whose lower boxes are twice as wide every other place: neighbours step by 1 or 2.
    const rects = [];
    for (let r = 0; r < 4; r++) {
      for (let c = 0; c < 8; c++)
        rects.push({ x: c * 2 * MICRON, y: 2 * r * MICRON, width: 2 * MICRON, height: MICRON });
      for (let c = 0; c < 16; c++)
        rects.push({
          x: c * MICRON,
          y: (2 * r + 1) * MICRON,
          width: (c % 3 === 0 ? 2 : 1) * MICRON,
          height: MICRON,
        });
    }
    const boxes = boxesOf(rects);
    const code = Uint8Array.from(rects, (_, i) => (i % 24 < 8 ? 0 : 1));
    const group = Uint8Array.of(0, 1);
    const copied = bandedNeighbourTable(boxes, ABUTMENT_TOLERANCE, code, group, ANY_BOXES);
    const paired = bandedNeighbourTable(boxes, ABUTMENT_TOLERANCE, code, group, NO_REPEATS);
    expect(copied?.copies && Array.from(copied.copies.model).some((m, r) => m !== r)).toBe(true);
    expect(arrays(copied)).toEqual(arrays(paired));
  });
});
