import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { evaluate } from '../../src/engine';
import { blockTable } from '../../src/geometry/blockTable';
import type { Block } from '../../src/model/block';
import type { Design } from '../../src/model/design';
import { gridFloorplan } from '../../src/designs/gridFloorplan';
import { DEMO_PROCESS, FOLDED_8F2_CELL } from '../../src/model/builtins';
import { layoutState } from '../../src/engine/evaluation/layoutFindings';
import { layoutState as layoutStateBefore } from '../support/layoutBefore/layoutFindings';
import { designWith, mat, strip } from '../support/designs';

/** 64 folded-cell pitches (2F at F = 18 nm): mats of 128 or 256 cells per line span 2 or 4 units (arithmetic). */
const UNIT = 64 * 2 * 18e-9;
const TYPES = ['mat', 'senseAmpStrip', 'wordlineDriverStrip', 'rowDecoder', 'columnDecoder'] as const;

/** The whole layout state of the engine against the code it replaced (test/support/layoutBefore). */
function expectSameLayout(design: Design): void {
  const report = evaluate(design);
  const table = blockTable(design);
  const now = layoutState(table, report.mats);
  const before = layoutStateBefore(table, report.mats);
  expect(now.findings).toEqual(before.findings);
  expect(now.backToBack.facing).toEqual(before.backToBack.facing);
  expect(now.backToBack.pairs).toEqual(before.backToBack.pairs);
  expect(now.backToBack.findings).toEqual(before.backToBack.findings);
  for (let n = 0; n < 2; n++) {
    const a = now.reach.results[n];
    const b = before.reach.results[n];
    expect(a?.finding).toEqual(b?.finding);
    expect(a?.edges?.decoders).toEqual(b?.edges?.decoders);
    expect(a?.reach.part).toBe(b?.reach.part);
    expect(a?.reach.seed).toEqual(b?.reach.seed);
    expect(a?.reach.label).toEqual(b?.reach.label);
    expect(a?.reach.components).toEqual(b?.reach.components);
    expect(a?.reach.built).toBe(b?.reach.built);
    expect(a?.reach.served.start).toEqual(b?.reach.served.start);
    expect(a?.reach.served.list).toEqual(b?.reach.served.list);
  }
}

/** A block on a coarse grid so that edges meet often: mats, strips and decoders of random size. */
const blockArb = fc.record({
  type: fc.constantFrom(...TYPES),
  gx: fc.integer({ min: 0, max: 12 }),
  gy: fc.integer({ min: 0, max: 12 }),
  w: fc.integer({ min: 1, max: 8 }),
  h: fc.integer({ min: 1, max: 8 }),
  cells: fc.constantFrom(128, 256),
  vertical: fc.boolean(),
});

/** What is done to a tiled array: blocks dropped, moved, turned, a strip cut in two along its length or copied over itself. */
const changeArb = fc.record({
  what: fc.constantFrom('drop', 'move', 'turn', 'split', 'split', 'copyOver'),
  pick: fc.nat(),
  dx: fc.integer({ min: -3, max: 3 }),
  dy: fc.integer({ min: -3, max: 3 }),
});

type Change = typeof changeArb extends fc.Arbitrary<infer T> ? T : never;

function changed(blocks: Block[], change: Change, n: number): Block[] {
  if (blocks.length === 0) return blocks;
  const at = change.pick % blocks.length;
  const block = blocks[at] as Block;
  const next = blocks.slice();
  const step = UNIT / 2;
  switch (change.what) {
    case 'drop':
      next.splice(at, 1);
      return next;
    case 'move':
      next[at] = { ...block, x: block.x + change.dx * step, y: block.y + change.dy * step };
      return next;
    case 'turn':
      if (block.type === 'mat')
        next[at] = { ...block, bitlineAxis: block.bitlineAxis === 'vertical' ? 'horizontal' : 'vertical' };
      return next;
    case 'split': {
      if (block.type === 'mat') return next;
      // The strip cut in two along its length: two strips back to back, each against one mat.
      const alongX = block.width >= block.height;
      const half = alongX ? { height: block.height / 2 } : { width: block.width / 2 };
      const second = alongX ? { y: block.y + block.height / 2 } : { x: block.x + block.width / 2 };
      next.splice(
        at,
        1,
        { ...block, ...half },
        { ...block, ...half, ...second, id: `cut${n}`, name: `Cut ${n}` },
      );
      return next;
    }
    default: {
      if (block.type === 'mat') return next;
      next.splice(at + 1, 0, { ...block, id: `copy${n}`, name: `Copy ${n}` });
      return next;
    }
  }
}

const gridArb = fc.record({
  rows: fc.integer({ min: 1, max: 5 }),
  columns: fc.integer({ min: 1, max: 5 }),
  cellsPerBitline: fc.constantFrom(128, 256),
  cellsPerWordline: fc.constantFrom(128, 256),
  rowDecoder: fc.boolean(),
  columnDecoder: fc.boolean(),
  changes: fc.array(changeArb, { maxLength: 6 }),
});

describe('layout checks against the code they replaced (serving forest, back-to-back certificate)', () => {
  it('leave the same state and findings on random small floorplans', () => {
    fc.assert(
      fc.property(fc.array(blockArb, { minLength: 1, maxLength: 30 }), (specs) => {
        const blocks: Block[] = specs.map((s, n) =>
          s.type === 'mat'
            ? mat({
                id: `b${n}`,
                name: `b${n}`,
                x: s.gx * UNIT,
                y: s.gy * UNIT,
                cellsPerBitline: s.cells,
                cellsPerWordline: s.cells,
                bitlineAxis: s.vertical ? 'vertical' : 'horizontal',
              })
            : strip(`b${n}`, s.type, s.gx * UNIT, s.gy * UNIT, s.w * UNIT, s.h * UNIT),
        );
        expectSameLayout(designWith(blocks));
      }),
      { numRuns: 600 },
    );
  }, 60_000);

  it('leave the same state and findings on tiled arrays with blocks dropped, moved, turned, cut or copied', () => {
    fc.assert(
      fc.property(gridArb, (g) => {
        let blocks = gridFloorplan({
          cell: FOLDED_8F2_CELL,
          featureSize: DEMO_PROCESS.featureSize,
          matRows: g.rows,
          matColumns: g.columns,
          cellsPerBitline: g.cellsPerBitline,
          cellsPerWordline: g.cellsPerWordline,
          senseAmpStripHeight: 2 * UNIT,
          wordlineDriverStripWidth: UNIT,
          rowDecoderWidth: g.rowDecoder ? 4 * UNIT : 0,
          columnDecoderHeight: g.columnDecoder ? 3 * UNIT : 0,
        });
        g.changes.forEach((c, n) => (blocks = changed(blocks, c, n)));
        expectSameLayout(designWith(blocks));
      }),
      { numRuns: 300 },
    );
  }, 60_000);
});
