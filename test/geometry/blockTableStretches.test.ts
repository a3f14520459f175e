import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { blockTable, type BlockTable } from '../../src/geometry/blockTable';
import type { Block } from '../../src/model/block';
import { BUILTIN_CELLS } from '../../src/model/builtins';
import { blockTable as blockTableBefore } from '../support/blockTableBefore';
import { designWith, mat, strip } from '../support/designs';
import { firstDifference } from '../support/identical';
import { editedGridFloorplan, irregularFloorplan, stripChainFloorplan } from '../support/randomFloorplans';

/*
 * writeRows takes the rest of a stretch (mats of one kind, or strips of one type and size, at one top
 * edge, left to right) in loops of their own that read only what tells such blocks apart
 * (tableStretches.ts). The table (rows, sums and stretches) must be what the block-by-block writer
 * gave, bit for bit (test/support/blockTableBefore.ts keeps it).
 */

const MICRON = 1e-6;

function facts(table: BlockTable) {
  const { count, x, y, width, height, type, kindOf, featureSize, sums, stretches, kinds } = table;
  return {
    count,
    x,
    y,
    width,
    height,
    type,
    kindOf,
    featureSize,
    sums: { ...sums },
    stretches: stretches ?? null,
    kinds: kinds.map((k) => ({ cell: k.cell.id, geometry: k.geometry })),
  };
}

function sameAsBefore(blocks: Block[]): void {
  const design = designWith(blocks);
  expect(firstDifference(facts(blockTable(design)), facts(blockTableBefore(design)))).toBeNull();
}

/**
 * Rows of blocks that mostly continue a stretch: each row is one block kind (a mat of one of a few
 * kinds, some with a footprint, or a strip of one of a few types and sizes, zero and −0 included) at one
 * top edge (0 and −0 among them), left edges mostly rising, sometimes equal or falling back; now and then
 * a block of another kind or top edge inside the row, and rows of different lengths one after another.
 */
const rowsFloorplan = fc
  .array(
    fc.record({
      isMat: fc.boolean(),
      cell: fc.constantFrom(...BUILTIN_CELLS.map((c) => c.id).slice(0, 2)),
      perBitline: fc.constantFrom(128, 256),
      footprint: fc.constantFrom(false, false, false, true),
      stripType: fc.constantFrom('senseAmpStrip', 'wordlineDriverStrip', 'spacer'),
      width: fc.constantFrom(2 * MICRON, 2 * MICRON, 0, -0, 3 * MICRON),
      height: fc.constantFrom(MICRON, MICRON, 0, -0),
      y: fc.constantFrom(5 * MICRON, 5 * MICRON, 7 * MICRON, 0, -0),
      steps: fc.array(fc.constantFrom(3, 3, 3, 0, -1, 2.5), { minLength: 0, maxLength: 9 }),
      odd: fc.array(
        fc.record({
          at: fc.nat(),
          what: fc.constantFrom('y', 'zero', 'kind', 'type', 'width', 'height', 'axis', 'cell', 'footprint'),
        }),
        { maxLength: 2 },
      ),
    }),
    { minLength: 1, maxLength: 7 },
  )
  .map((rows) => {
    const blocks: Block[] = [];
    rows.forEach((row, r) => {
      let x = -2 * MICRON;
      const placed: Block[] = [];
      for (const [k, step] of [0, ...row.steps].entries()) {
        x += step * MICRON;
        const id = `r${r}b${k}`;
        placed.push(
          row.isMat
            ? mat({
                id,
                x,
                y: row.y,
                cellId: row.cell,
                cellsPerBitline: row.perBitline,
                ...(row.footprint ? { footprint: { width: 9 * MICRON, height: 9 * MICRON } } : {}),
              })
            : strip(id, row.stripType, x, row.y, row.width, row.height),
        );
      }
      for (const { at, what } of row.odd) {
        const i = at % placed.length;
        const b = placed[i] as Block;
        if (what === 'y') placed[i] = { ...b, y: b.y + MICRON };
        // A top edge of 0 beside −0 (or the other way round) in one row.
        else if (what === 'zero') placed[i] = { ...b, y: b.y === 0 ? (Object.is(b.y, 0) ? -0 : 0) : b.y };
        else if (b.type === 'mat') {
          if (what === 'kind') placed[i] = { ...b, cellsPerWordline: 128 };
          else if (what === 'axis') placed[i] = { ...b, bitlineAxis: 'horizontal' };
          else if (what === 'cell') placed[i] = { ...b, cellId: BUILTIN_CELLS[2]?.id ?? b.cellId };
          else if (what === 'footprint')
            placed[i] = { ...b, footprint: { width: 9 * MICRON, height: 9 * MICRON } };
          else placed[i] = strip(b.id, 'spacer', b.x, b.y, MICRON, MICRON);
        } else if (what === 'type') placed[i] = { ...b, type: 'rowDecoder' };
        else if (what === 'width') placed[i] = { ...b, width: b.width + MICRON };
        else if (what === 'height') placed[i] = { ...b, height: b.height + MICRON };
        else placed[i] = mat({ id: b.id, x: b.x, y: b.y });
      }
      blocks.push(...placed);
    });
    return blocks;
  });

describe('blockTable stretch by stretch, against the block-by-block writer', () => {
  it('on rows that continue, break and restart stretches (kinds, footprints, zero and −0)', () => {
    fc.assert(fc.property(rowsFloorplan, sameAsBefore), { numRuns: 1500 });
  }, 60_000);

  it('on random irregular, strip-chain and edited grid floorplans', () => {
    fc.assert(fc.property(irregularFloorplan, sameAsBefore), { numRuns: 300 });
    fc.assert(fc.property(stripChainFloorplan, sameAsBefore), { numRuns: 300 });
    fc.assert(fc.property(editedGridFloorplan, sameAsBefore), { numRuns: 300 });
  }, 60_000);
});
