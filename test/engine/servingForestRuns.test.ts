import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { evaluate } from '../../src/engine';
import { evaluationNeighbours } from '../../src/engine/evaluation/evaluate';
import { ServingForest } from '../../src/engine/evaluation/servingForest';
import { ForestParts, joinRegularRun } from '../../src/engine/evaluation/servingForestRuns';
import { gridFloorplan } from '../../src/designs/gridFloorplan';
import { DEMO_STRIPS } from '../../src/designs/demoSizes';
import { blockTable, MAT_CODE } from '../../src/geometry/blockTable';
import type { Block } from '../../src/model/block';
import { DEMO_PROCESS, FOLDED_8F2_CELL } from '../../src/model/builtins';
import { designWith } from '../support/designs';
import { editedGridFloorplan, irregularFloorplan, stripChainFloorplan } from '../support/randomFloorplans';

/** Each position's tree as the index of the first position in it (−1 outside every tree). */
function canonical(forest: ServingForest, part: 0 | 1, count: number): Int32Array {
  const first = new Map<number, number>();
  const out = new Int32Array(count);
  for (let i = 0; i < count; i++) {
    const r = forest.rootOf(part, i);
    if (r < 0) out[i] = -1;
    else {
      if (!first.has(r)) first.set(r, i);
      out[i] = first.get(r) as number;
    }
  }
  return out;
}

/** Whether the first run of mats is joined at once into an empty forest (coverage of the run path). */
function firstRunJoins(blocks: Block[]): boolean {
  const design = designWith(blocks);
  const table = blockTable(design);
  const runs = evaluationNeighbours(table).runs;
  if (!runs) return false;
  const r = runs.code.indexOf(MAT_CODE);
  const { mats } = evaluate(design);
  // Only runs the connection pass found regular are joined at once (MatTable.runLists).
  if (r < 0 || mats.runLists?.regular[r] !== 1 || mats.runLists.firstMat[r] !== 0) return false;
  const n = table.count;
  const parts = new ForestParts(
    [new Int32Array(n).fill(-1), new Int32Array(n).fill(-1)],
    new Int32Array(2),
    new Uint8Array(n),
  );
  const m0 = runs.start[r] as number;
  const length = (runs.start[r + 1] as number) - m0;
  const at = new Int32Array(n).fill(-1);
  return joinRegularRun(parts, mats.servingOffsets, mats.servingPositions, 0, m0, length, 1, 2, at);
}

/** The forest joined run by run equals the forest joined mat by mat: trees, orientations, mat indices. */
function expectSameForest(blocks: Block[]): void {
  const design = designWith(blocks);
  const table = blockTable(design);
  const runs = evaluationNeighbours(table).runs ?? null;
  const { mats } = evaluate(design);
  const atRuns = new Int32Array(table.count).fill(-1);
  const atMats = new Int32Array(table.count).fill(-1);
  const byRuns = ServingForest.of(mats, table, atRuns, runs);
  const byMats = ServingForest.of(mats, table, atMats);
  expect(atRuns).toEqual(atMats);
  expect(byRuns.facing).toEqual(byMats.facing);
  expect([...byRuns.trees]).toEqual([...byMats.trees]);
  for (const part of [0, 1] as const)
    expect(canonical(byRuns, part, table.count)).toEqual(canonical(byMats, part, table.count));
}

/** Tiled grids of folded cells with both bit-line axes, strips and decoders, then edited. */
const gridArb = fc.record({
  rows: fc.integer({ min: 1, max: 7 }),
  columns: fc.integer({ min: 3, max: 9 }),
  cellsPerBitline: fc.constantFrom(128, 256, 512),
  cellsPerWordline: fc.constantFrom(128, 512),
  horizontal: fc.boolean(),
  /** Mat rows whose places in the design swap with the next row's (a row then meets two rows listed before it). */
  swapRows: fc.array(fc.nat(), { maxLength: 2 }),
  edits: fc.array(
    fc.record({ at: fc.nat(), what: fc.constantFrom('remove', 'turn', 'copy', 'move'), other: fc.nat() }),
    { maxLength: 3 },
  ),
});

function grid(g: typeof gridArb extends fc.Arbitrary<infer T> ? T : never): Block[] {
  const blocks = gridFloorplan({
    cell: FOLDED_8F2_CELL,
    featureSize: DEMO_PROCESS.featureSize,
    matRows: g.rows,
    matColumns: g.columns,
    cellsPerBitline: g.cellsPerBitline,
    cellsPerWordline: g.cellsPerWordline,
    ...DEMO_STRIPS,
  }).map((b) => (g.horizontal && b.type === 'mat' ? { ...b, bitlineAxis: 'horizontal' as const } : b));
  // The mats come first, row by row: swapping two rows' stretches keeps each row one run.
  for (const r of g.swapRows) {
    if (g.rows < 2) break;
    const row = r % (g.rows - 1);
    const first = blocks.splice(row * g.columns, g.columns);
    blocks.splice((row + 1) * g.columns, 0, ...first);
  }
  for (const e of g.edits) {
    if (blocks.length < 2) break;
    const i = e.at % blocks.length;
    const b = blocks[i] as Block;
    if (e.what === 'remove') blocks.splice(i, 1);
    else if (e.what === 'turn' && b.type === 'mat')
      blocks[i] = { ...b, bitlineAxis: b.bitlineAxis === 'vertical' ? 'horizontal' : 'vertical' };
    else if (e.what === 'copy') blocks.splice(i + 1, 0, { ...b, id: `copy${i}` });
    else if (e.what === 'move') {
      const j = e.other % blocks.length;
      blocks.splice(i, 1);
      blocks.splice(j, 0, b);
    }
  }
  return blocks;
}

describe('serving forest run by run', () => {
  it('joins tiled grids, edited or not, as the mat-by-mat pass does', () => {
    let joined = 0;
    fc.assert(
      fc.property(gridArb, (g) => {
        const blocks = grid(g);
        if (firstRunJoins(blocks)) joined++;
        expectSameForest(blocks);
      }),
      { numRuns: 400 },
    );
    // Most cases must take the run path (else a path never taken would pass).
    expect(joined).toBeGreaterThan(50);
  }, 60_000);

  it('joins random floorplans as the mat-by-mat pass does', () => {
    for (const arb of [editedGridFloorplan, irregularFloorplan, stripChainFloorplan])
      fc.assert(fc.property(arb, expectSameForest), { numRuns: 200 });
  }, 60_000);
});
