import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { editReport, evaluate, type Finding, type Report } from '../../src/engine';
import { placedDesign } from '../../src/geometry/placedIndex';
import type { Block } from '../../src/model/block';
import { gridFloorplan } from '../../src/designs/gridFloorplan';
import { DEMO_PROCESS, FOLDED_8F2_CELL } from '../../src/model/builtins';
import type { Design } from '../../src/model/design';
import { blocksEditedInPlace } from '../../src/model/designEdit';
import { designWith, mat, strip } from '../support/designs';
import { expectSameReport } from '../support/sameReport';
import { DEMO_STRIPS } from '../../src/designs/demoSizes';

/** 64 folded-cell pitches (2F at F = 18 nm): mats of 128 or 256 cells per line span 2 or 4 units (arithmetic). */
const UNIT = 64 * 2 * 18e-9;
const TYPES = ['mat', 'senseAmpStrip', 'wordlineDriverStrip', 'rowDecoder', 'columnDecoder'] as const;
const LAYOUT_KINDS: readonly Finding['kind'][] = ['noRowDecoder', 'noColumnDecoder', 'backToBackStrips'];

/** A block on a coarse grid so that edges meet often: mats, strips and decoders of random size. */
const blockArb = fc.record({
  type: fc.constantFrom(...TYPES),
  gx: fc.integer({ min: 0, max: 10 }),
  gy: fc.integer({ min: 0, max: 10 }),
  w: fc.integer({ min: 1, max: 8 }),
  h: fc.integer({ min: 1, max: 8 }),
  cells: fc.constantFrom(128, 256),
  vertical: fc.boolean(),
});

/** One edit: up to three blocks (picked by number) put somewhere else on the grid, strips also resized. */
const editArb = fc.array(
  fc.record({
    pick: fc.nat(),
    gx: fc.integer({ min: 0, max: 10 }),
    gy: fc.integer({ min: 0, max: 10 }),
    w: fc.integer({ min: 1, max: 8 }),
    h: fc.integer({ min: 1, max: 8 }),
    rename: fc.boolean(),
  }),
  { minLength: 1, maxLength: 3 },
);

function moved(block: Block, e: { gx: number; gy: number; w: number; h: number; rename: boolean }): Block {
  const name = e.rename ? `${block.name}′` : block.name;
  if (block.type === 'mat') return { ...block, name, x: e.gx * UNIT, y: e.gy * UNIT };
  return { ...block, name, x: e.gx * UNIT, y: e.gy * UNIT, width: e.w * UNIT, height: e.h * UNIT };
}

const layoutOf = (report: Report) => report.findings.filter((f) => LAYOUT_KINDS.includes(f.kind));

/** Evaluates each design of the chain from the one before it and checks it against a full evaluation. */
function followChain(start: Design, step: (design: Design) => Design, steps: number): void {
  let design = start;
  let report = evaluate(design);
  for (let n = 0; n < steps; n++) {
    const next = step(design);
    const changed = blocksEditedInPlace(design, next, 64) ?? [];
    placedDesign(design);
    report = editReport(design, report, next, changed);
    const full = evaluate(next);
    expect(layoutOf(report)).toEqual(layoutOf(full));
    expectSameReport(report, full);
    design = next;
  }
}

/** A tiled 3 × 3 array with its strips and decoders: chains of strips for the decoders to reach along. */
function tiledArray(): Design {
  return designWith(
    gridFloorplan({
      cell: FOLDED_8F2_CELL,
      featureSize: DEMO_PROCESS.featureSize,
      matRows: 3,
      matColumns: 3,
      cellsPerBitline: 256,
      cellsPerWordline: 256,
      ...DEMO_STRIPS,
    }),
  );
}

type Side = 'left' | 'right' | 'top' | 'bottom';

/** Block `pick` put against a side of block `target` (its top or left edges lined up): abutments made and broken. */
function putAgainst(design: Design, pick: number, target: number, side: Side, rename: boolean): Design {
  const { placed } = placedDesign(design);
  const at = pick % design.blocks.length;
  const to = target % design.blocks.length;
  const a = placed[at]?.rect;
  const b = placed[to]?.rect;
  const block = design.blocks[at];
  if (!a || !b || !block || at === to) return design;
  const x = side === 'left' ? b.x - a.width : side === 'right' ? b.x + b.width : b.x;
  const y = side === 'top' ? b.y - a.height : side === 'bottom' ? b.y + b.height : b.y;
  const blocks = design.blocks.slice();
  blocks[at] = { ...block, x, y, name: rename ? `${block.name}′` : block.name };
  return { ...design, blocks };
}

describe('layout checks after an edit, against checking the whole design again', () => {
  it('give the same findings along random chains of edits', () => {
    fc.assert(
      fc.property(
        fc.array(blockArb, { minLength: 2, maxLength: 30 }),
        fc.array(editArb, { minLength: 1, maxLength: 8 }),
        (specs, edits) => {
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
          let design: Design = designWith(blocks);
          let report = evaluate(design);
          for (const edit of edits) {
            const next = { ...design, blocks: design.blocks.slice() };
            for (const e of edit) {
              const at = e.pick % next.blocks.length;
              next.blocks[at] = moved(next.blocks[at] as Block, e);
            }
            const changed = blocksEditedInPlace(design, next, 64) ?? [];
            placedDesign(design);
            report = editReport(design, report, next, changed);
            const full = evaluate(next);
            expect(layoutOf(report)).toEqual(layoutOf(full));
            expectSameReport(report, full);
            design = next;
          }
        },
      ),
      { numRuns: 300 },
    );
  }, 120_000);

  it('give the same findings when blocks of a tiled array are put against others', () => {
    const moveArb = fc.record({
      pick: fc.nat(),
      target: fc.nat(),
      side: fc.constantFrom<Side>('left', 'right', 'top', 'bottom'),
      rename: fc.boolean(),
    });
    fc.assert(
      fc.property(
        fc.array(fc.array(moveArb, { minLength: 1, maxLength: 3 }), { minLength: 1, maxLength: 8 }),
        (edits) => {
          let n = 0;
          followChain(
            tiledArray(),
            (design) => {
              let next = design;
              for (const m of edits[n++] ?? []) next = putAgainst(next, m.pick, m.target, m.side, m.rename);
              return next;
            },
            edits.length,
          );
        },
      ),
      { numRuns: 200 },
    );
  }, 120_000);
});
